/** The clock the retention job reads; tests replace it. */
export const RETENTION_CLOCK = Symbol('RETENTION_CLOCK');
export interface RetentionClock {
  now(): number;
}

export const DAY_MS = 24 * 60 * 60 * 1000;
/** How often the job runs. */
export const RETENTION_EVERY_MS = DAY_MS;
