import type { CostBreakdown } from './mixer.types';

const count = (n: number, one: string, many: string): string => `${n} ${n === 1 ? one : many}`;

/**
 * The sentence the teacher reads in the lobby, e.g. "0 same-table pairs, 2 repeat pairs".
 * Broken rules and the performance spread are mentioned only when present.
 */
export function describeCost(c: CostBreakdown): string {
  const parts = [
    count(c.sameTablePairs, 'same-table pair', 'same-table pairs'),
    count(c.repeatPairs, 'repeat pair', 'repeat pairs'),
  ];
  if (c.keepApartViolations > 0) {
    parts.push(count(c.keepApartViolations, 'keep-apart pair together', 'keep-apart pairs together'));
  }
  if (c.keepTogetherViolations > 0) {
    parts.push(count(c.keepTogetherViolations, 'keep-together pair split', 'keep-together pairs split'));
  }
  if (c.performanceSpread > 0) parts.push(describeSpread(c.performanceSpread));
  return parts.join(', ');
}

/** Priors are accuracies in [0, 1], so the spread reads as percentage points. */
function describeSpread(spread: number): string {
  const points = Math.round(spread * 100);
  if (points === 0) return 'team averages under 1 percentage point apart';
  return `team averages ${count(points, 'percentage point', 'percentage points')} apart`;
}
