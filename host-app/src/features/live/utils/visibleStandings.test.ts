import type { StandingRow } from '@covalent/shared-types';
import { describe, expect, it } from 'vitest';
import { visibleStandings } from './visibleStandings';

const row = (teamId: string, rank: number): StandingRow => ({ teamId, name: teamId, rank, points: 1000 - rank, correctAnswers: 1 });
const rows = [row('d', 4), row('a', 1), row('c', 3), row('b', 2), row('c2', 3)];

describe('visibleStandings', () => {
  it('shows every team in rank order for full', () => {
    expect(visibleStandings(rows, 'full').map((r) => r.teamId)).toEqual(['a', 'b', 'c', 'c2', 'd']);
  });

  it('shows ranks 1–3 for top3, keeping a tie for third', () => {
    expect(visibleStandings(rows, 'top3').map((r) => r.teamId)).toEqual(['a', 'b', 'c', 'c2']);
  });

  it('shows nothing for none', () => {
    expect(visibleStandings(rows, 'none')).toEqual([]);
  });
});
