import type { Clock } from '../sessions/domain';

/** The clock catch-up schedules read; integration tests move it to step past due times. */
export const CATCHUP_CLOCK = Symbol('CATCHUP_CLOCK');
export type CatchupClock = Clock;

/** Attempts at a fresh code before giving up (31^6 codes: a clash is already rare). */
export const CODE_ATTEMPTS = 10;
