/**
 * A computed figure, or null with the reason it could not be computed.
 * The UI shows every null figure as NOT_ENOUGH_DATA_LABEL; the reason is for
 * tooltips, exports and logs. No figure is ever NaN or Infinity.
 */
export type Figure<T = number> = { value: T; reason: null } | { value: null; reason: string };

export const NOT_ENOUGH_DATA_LABEL = 'not enough data';

/** Why a figure is null; kept as constants so callers and tests can match them. */
export const NotComputedReason = {
  noExaminees: 'no examinees were present',
  fewerThanTwoExaminees: 'fewer than 2 examinees',
  nobodyAnswered: 'no examinee answered this item',
  noItems: 'no items were played',
  fewerThanTwoItems: 'fewer than 2 answered items',
  zeroTotalVariance: 'every examinee has the same total score',
  zeroItemVariance: 'every examinee has the same credit on this item',
  zeroRestVariance: 'every examinee has the same score on the other items',
  notChoiceItem: 'not a choice item',
  noGroups: 'no upper and lower groups',
  notDichotomous: 'some items give partial credit',
  reliabilityUnavailable: 'reliability could not be computed',
} as const;

export function computed<T>(value: T): Figure<T> {
  return { value, reason: null };
}

export function notComputed<T = number>(reason: string): Figure<T> {
  return { value: null, reason };
}
