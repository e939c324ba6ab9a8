import { compareStandings, isStandingTie } from '../../scoring/domain/points';
import type { OwnStanding, RoundState, StandingEntry, StandingsView, TeamState } from './types';

/** Six decimals hide float noise in summed solo shares (1/3 + 1/3 + 1/3) so equal teams tie. */
function tidy(value: number): number {
  return Math.round(value * 1e6) / 1e6;
}

/**
 * Team standings over revealed rounds only, so nothing about an unrevealed round
 * leaks. Order: points, then more correct answers, then lower total response time;
 * teams equal on all three share a rank (1, 2, 2, 4) and are listed by id.
 */
export function teamStandings(teams: readonly TeamState[], rounds: readonly RoundState[]): StandingEntry[] {
  const totals = new Map(teams.map((t) => [t.id, { exact: 0, correct: 0, responseMs: 0 }]));
  for (const round of rounds) {
    if (round.status !== 'revealed' || !round.results) continue;
    for (const r of round.results.teams) {
      const total = totals.get(r.teamId);
      if (!total) continue;
      total.exact += r.exactPoints;
      total.correct += r.correctShare;
      total.responseMs += r.responseMs;
    }
  }
  const entries = teams.map((team) => {
    const total = totals.get(team.id) ?? { exact: 0, correct: 0, responseMs: 0 };
    return {
      id: team.id,
      name: team.name,
      points: Math.round(tidy(total.exact)),
      correctAnswers: tidy(total.correct),
      responseMs: Math.round(total.responseMs),
    };
  });
  entries.sort(compareStandings);
  const ranked: StandingEntry[] = [];
  entries.forEach((entry, i) => {
    const rank = i > 0 && isStandingTie(entries[i - 1], entry) ? ranked[i - 1].rank : i + 1;
    ranked.push({ teamId: entry.id, name: entry.name, rank, points: entry.points, correctAnswers: entry.correctAnswers, responseMs: entry.responseMs });
  });
  return ranked;
}

/** What the class sees: everything, the top three ranks (more on a tie), or nothing. */
export function classView(entries: readonly StandingEntry[], view: StandingsView): StandingEntry[] {
  if (view === 'none') return [];
  if (view === 'top3') return entries.filter((e) => e.rank <= 3);
  return entries.slice();
}

export function ownStanding(entries: readonly StandingEntry[], teamId: string): OwnStanding | null {
  const entry = entries.find((e) => e.teamId === teamId);
  return entry ? { teamId, rank: entry.rank, points: entry.points, teamCount: entries.length } : null;
}
