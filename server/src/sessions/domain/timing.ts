import type { PauseSpan, RoundState, RoundUnit, UnitDeadline } from './types';

/** Milliseconds of pause that overlap [from, to]; an open pause runs until `now`. */
export function pausedWithin(pauses: readonly PauseSpan[], from: number, to: number, now: number): number {
  let total = 0;
  for (const span of pauses) {
    const start = Math.max(span.from, from);
    const end = Math.min(span.to ?? now, to);
    if (end > start) total += end - start;
  }
  return total;
}

/** Active (unpaused) time from the round opening to `at`; never negative. */
export function activeElapsed(round: RoundState, at: number, now: number): number {
  const openedAt = round.openedAt ?? at;
  return Math.max(0, at - openedAt - pausedWithin(round.pauses, openedAt, at, now));
}

/** A unit's answer window: own limit plus time the host added. This is the T of the points formula. */
export function unitWindowMs(round: RoundState, unit: RoundUnit): number {
  return unit.baseLimitMs + round.addedMs;
}

/** What every unit's deadline adds to its own base limit: opening time + added time + all pause time so far. */
export function deadlineOffset(round: RoundState, now: number): number {
  const openedAt = round.openedAt ?? now;
  return openedAt + round.addedMs + pausedWithin(round.pauses, openedAt, Number.POSITIVE_INFINITY, now);
}

/** Wall-clock deadline: opening + window + all pause time so far (so a pause shifts it). */
export function unitDeadlineAt(round: RoundState, unit: RoundUnit, now: number): number {
  return deadlineOffset(round, now) + unit.baseLimitMs;
}

export function unitDeadline(round: RoundState, unit: RoundUnit, now: number): UnitDeadline {
  return { kind: unit.kind, id: unit.id, deadlineAt: unitDeadlineAt(round, unit, now), limitMs: unitWindowMs(round, unit) };
}
