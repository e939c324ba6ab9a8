import { Figure, NotComputedReason, computed, notComputed } from './figure';
import { isZeroVariance, populationVariance, roundForComparison } from './statistics';

/** Kelley (1939): upper and lower 27% of examinees by total score. */
export const KELLEY_FRACTION = 0.27;

export interface KelleyGroups {
  /** round(0.27 · N), at least 1. */
  size: number;
  upperIds: string[];
  lowerIds: string[];
}

export interface RankedExaminee {
  examineeId: string;
  total: number;
}

export function kelleyGroupSize(examineeCount: number): number {
  return Math.max(1, Math.round(KELLEY_FRACTION * examineeCount));
}

function compareIds(a: string, b: string): number {
  // Code-unit order, not localeCompare: the same on every server whatever its locale.
  if (a < b) return -1;
  return a > b ? 1 : 0;
}

/**
 * One ranking for both groups: total score descending, then examinee id ascending.
 * So among examinees tied at a cut, the smaller ids rank higher: they enter the upper
 * group first, and the larger ids enter the lower group first. Input order never matters.
 */
export function rankByTotal(examinees: readonly RankedExaminee[]): RankedExaminee[] {
  return [...examinees].sort((a, b) => {
    const byTotal = roundForComparison(b.total) - roundForComparison(a.total);
    return byTotal !== 0 ? byTotal : compareIds(a.examineeId, b.examineeId);
  });
}

/**
 * Null with fewer than 2 examinees, or when every total is the same: the groups would
 * then be chosen by id alone and D would mean nothing.
 */
export function kelleyGroups(examinees: readonly RankedExaminee[]): Figure<KelleyGroups> {
  if (examinees.length < 2) return notComputed(NotComputedReason.fewerThanTwoExaminees);
  if (isZeroVariance(populationVariance(examinees.map((e) => e.total)))) {
    return notComputed(NotComputedReason.zeroTotalVariance);
  }
  const ranked = rankByTotal(examinees);
  const size = kelleyGroupSize(examinees.length);
  return computed({
    size,
    upperIds: ranked.slice(0, size).map((e) => e.examineeId),
    lowerIds: ranked.slice(ranked.length - size).map((e) => e.examineeId),
  });
}

/**
 * Highest D an item of difficulty p can reach with 27% groups (Lopez 1998, RMT 12:1):
 * an item everyone in the upper group gets right and as many as possible in the lower wrong.
 */
export function maxPossibleDiscrimination(p: number): number {
  if (p < KELLEY_FRACTION) return p / KELLEY_FRACTION;
  if (p > 1 - KELLEY_FRACTION) return (1 - p) / KELLEY_FRACTION;
  return 1;
}
