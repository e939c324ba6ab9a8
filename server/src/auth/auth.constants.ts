export const SESSION_COOKIE = 'covalent_sid';
export const SESSION_TTL_MS = 12 * 60 * 60 * 1000; // a school day and then some
export const INVITE_TTL_MS = 7 * 24 * 60 * 60 * 1000;
export const RESET_TTL_MS = 60 * 60 * 1000;
/** The clock the auth code reads; tests override it to expire links. */
export const AUTH_CLOCK = Symbol('AUTH_CLOCK');
export interface Clock {
  now(): number;
}
