import { describeCost } from './describe-cost';
import type { CostBreakdown } from './mixer.types';

const breakdown = (overrides: Partial<CostBreakdown> = {}): CostBreakdown => ({
  sameTablePairs: 0,
  repeatPairs: 0,
  keepApartViolations: 0,
  keepTogetherViolations: 0,
  performanceSpread: 0,
  total: 0,
  ...overrides,
});

describe('describeCost', () => {
  it('reads like the lobby example in DESIGN.md §4', () => {
    expect(describeCost(breakdown({ repeatPairs: 2 }))).toBe('0 same-table pairs, 2 repeat pairs');
  });

  it('uses the singular for one', () => {
    expect(describeCost(breakdown({ sameTablePairs: 1, repeatPairs: 1 }))).toBe('1 same-table pair, 1 repeat pair');
  });

  it('names broken keep-apart and keep-together rules only when there are some', () => {
    expect(describeCost(breakdown({ keepApartViolations: 1, keepTogetherViolations: 2 }))).toBe(
      '0 same-table pairs, 0 repeat pairs, 1 keep-apart pair together, 2 keep-together pairs split',
    );
  });

  it('gives the performance spread in whole percentage points', () => {
    expect(describeCost(breakdown({ performanceSpread: 0.123 }))).toBe(
      '0 same-table pairs, 0 repeat pairs, team averages 12 percentage points apart',
    );
    expect(describeCost(breakdown({ performanceSpread: 0.01 }))).toContain('team averages 1 percentage point apart');
    expect(describeCost(breakdown({ performanceSpread: 0.004 }))).toContain('team averages under 1 percentage point apart');
  });
});
