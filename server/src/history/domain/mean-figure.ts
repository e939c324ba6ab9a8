import { computed, mean, notComputed, type Figure } from '../../debrief/domain';

export const NO_PERCENT_REASON = 'no session with a computed percent';

/** The mean of the figures that were computed; figures that were not are left out, not counted as 0. */
export function meanOfFigures(figures: readonly Figure[]): Figure {
  const values = figures.flatMap((f) => (f.value === null ? [] : [f.value]));
  return values.length ? computed(mean(values)) : notComputed(NO_PERCENT_REASON);
}
