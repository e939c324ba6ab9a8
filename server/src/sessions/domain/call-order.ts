import type { PlayerState, RosterEntry, TeamCall } from './types';

/**
 * Fisher–Yates shuffle (Durstenfeld's in-place form) with an injected rng:
 * for i = n−1..1 swap a[i] with a[⌊rng()·(i+1)⌋]. Uses exactly n−1 draws.
 */
export function seededShuffle<T>(items: readonly T[], rng: () => number): T[] {
  const out = items.slice();
  for (let i = out.length - 1; i > 0; i--) {
    // min() guards an rng that (wrongly) returns 1.
    const j = Math.min(i, Math.floor(rng() * (i + 1)));
    [out[i], out[j]] = [out[j], out[i]];
  }
  return out;
}

/** One seeded cycle of the numbers 1..maxNumber: each is called once per cycle, so all are called about equally. */
export function drawCallCycle(maxNumber: number, rng: () => number): { cycle: number[]; draws: number } {
  const n = Math.max(1, Math.floor(maxNumber));
  const numbers = Array.from({ length: n }, (_, i) => i + 1);
  return { cycle: seededShuffle(numbers, rng), draws: n - 1 };
}

/**
 * The member who answers for a team when `calledNumber` is called: the member with
 * that number if present, else the next present member by number, wrapping round.
 */
export function resolveCall(
  teamId: string,
  calledNumber: number,
  roster: readonly RosterEntry[],
  players: readonly PlayerState[],
): TeamCall {
  const status = new Map(players.map((p) => [p.id, p.status]));
  const members = roster.filter((r) => r.teamId === teamId).sort((a, b) => a.number - b.number);
  const ordered = [...members.filter((m) => m.number >= calledNumber), ...members.filter((m) => m.number < calledNumber)];
  const answerer = ordered.find((m) => status.get(m.playerId) === 'connected');
  return { teamId, calledNumber, playerId: answerer?.playerId ?? null };
}
