import type { RoundTiming } from '@covalent/shared-types';

/**
 * Milliseconds left in the open round, by the server's clock: `deadlineAt − (clientNow + offset)`.
 * While paused the countdown stands still at what was left when the server sent the timing.
 * Null when no window is open.
 */
export function remainingMs(timing: RoundTiming, clientNow: number, clockOffsetMs: number): number | null {
  if (timing.status !== 'open' || timing.deadlineAt === null) return null;
  const serverNow = timing.paused ? timing.serverNow : clientNow + clockOffsetMs;
  return Math.max(0, timing.deadlineAt - serverNow);
}
