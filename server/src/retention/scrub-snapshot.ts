import type { StoredSnapshot } from '../sessions/live/snapshot-codec';

/**
 * The stored engine snapshot without the given players' answers, votes, per-player results
 * and acceptances: deletion is real (DESIGN.md §9), so nothing they answered survives in the
 * session row either. Team results stay: they are the team's, already summed.
 */
export function scrubSnapshot(snapshot: StoredSnapshot, playerIds: ReadonlySet<string>): StoredSnapshot {
  const keep = <T extends { playerId: string | null }>(list: readonly T[]): T[] =>
    list.filter((x) => x.playerId === null || !playerIds.has(x.playerId));
  const acceptances = Array.isArray(snapshot.acceptances)
    ? keep(snapshot.acceptances)
    : Object.fromEntries(Object.entries(snapshot.acceptances).filter(([, a]) => !playerIds.has(a.playerId)));
  return {
    ...snapshot,
    acceptances,
    rounds: snapshot.rounds.map((round) => ({
      ...round,
      answers: keep(round.answers),
      voteLog: keep(round.voteLog),
      results: round.results ? { ...round.results, players: keep(round.results.players) } : null,
    })),
  };
}
