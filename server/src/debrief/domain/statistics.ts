/**
 * Population (÷N) moments, used consistently for every variance in the debrief:
 * KR-20 with Σpq is only equal to alpha when the total variance is also ÷N
 * (REFERENCES.md §1, W10 "bug detector").
 */

/** Variances below this are treated as zero: credits are in [0, 1], so float noise is far smaller. */
export const ZERO_VARIANCE_TOLERANCE = 1e-12;

export function sum(values: readonly number[]): number {
  let total = 0;
  for (const value of values) total += value;
  return total;
}

/** Mean of a non-empty list; the caller guards the empty case. */
export function mean(values: readonly number[]): number {
  return sum(values) / values.length;
}

/** Population variance (÷N), two-pass; the caller guards the empty case. */
export function populationVariance(values: readonly number[]): number {
  const m = mean(values);
  let squares = 0;
  for (const value of values) squares += (value - m) * (value - m);
  return squares / values.length;
}

export function isZeroVariance(variance: number): boolean {
  return variance < ZERO_VARIANCE_TOLERANCE;
}

/**
 * Pearson r, or null when either list has zero variance or fewer than 2 values.
 * The ÷N or ÷(N−1) choice cancels out in r.
 */
export function pearson(x: readonly number[], y: readonly number[]): number | null {
  if (x.length !== y.length) throw new RangeError('pearson: lists differ in length');
  if (x.length < 2) return null;
  const varX = populationVariance(x);
  const varY = populationVariance(y);
  if (isZeroVariance(varX) || isZeroVariance(varY)) return null;
  const mx = mean(x);
  const my = mean(y);
  let products = 0;
  for (let i = 0; i < x.length; i += 1) products += (x[i] - mx) * (y[i] - my);
  const r = products / x.length / Math.sqrt(varX * varY);
  return Math.max(-1, Math.min(1, r));
}

/** Figures are compared with thresholds after this rounding, so 0.6 − 0.4 counts as 0.20. */
const COMPARISON_DECIMALS = 1e9;

export function roundForComparison(value: number): number {
  return Math.round(value * COMPARISON_DECIMALS) / COMPARISON_DECIMALS;
}
