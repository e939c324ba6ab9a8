import type { StandingRow, StandingsView } from '@covalent/shared-types';

/** The standing rows the class may see: all, the top three ranks (ties included), or none. */
export function visibleStandings(rows: readonly StandingRow[], visibility: StandingsView): StandingRow[] {
  if (visibility === 'none') return [];
  const sorted = [...rows].sort((a, b) => a.rank - b.rank);
  return visibility === 'top3' ? sorted.filter((row) => row.rank <= 3) : sorted;
}
