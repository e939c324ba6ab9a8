/** A value already on the 0..100 scale (a student's percent) with one decimal ("66.7%"); shares go through formatShare. */
export function formatPercentValue(percent: number): string {
  return `${percent.toFixed(1)}%`;
}
