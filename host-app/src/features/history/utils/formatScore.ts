/** A score is a sum of credit, so it can be fractional; two decimals as in the debrief. */
export const formatScore = (score: number | null): string => (score === null ? '—' : score.toFixed(2));
