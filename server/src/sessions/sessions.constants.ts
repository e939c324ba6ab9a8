import type { Clock } from './domain';

/** The clock the live runtime reads; integration tests replace it to step past deadlines. */
export const SESSION_CLOCK = Symbol('SESSION_CLOCK');
export type SessionClock = Clock;

/** Timings and limits of the live runtime; tests shorten the grace periods. */
export const SESSION_TUNING = Symbol('SESSION_TUNING');
export interface SessionTuning {
  /** A dropped socket is marked away after this long without a reconnect (school Wi-Fi blips). */
  awayGraceMs: number;
  /** After a restart, players have this long to reconnect before they count as away. */
  restoreGraceMs: number;
  /** Engine snapshot written at least this often while a round is open. */
  snapshotEveryMs: number;
  /** An ended session stays in memory this long so players can still read their summary. */
  endedRetentionMs: number;
  /** Socket messages allowed per client per second. */
  messagesPerSecond: number;
}
export const DEFAULT_SESSION_TUNING: SessionTuning = {
  awayGraceMs: 4_000,
  restoreGraceMs: 20_000,
  snapshotEveryMs: 10_000,
  endedRetentionMs: 10 * 60_000,
  messagesPerSecond: 20,
};

/** Limits of the two public play routes, per client address. */
export const PLAY_RATE_LIMIT = Symbol('PLAY_RATE_LIMIT');
export interface PlayRateLimit {
  /** Failed join-code look-ups allowed per window (guessing). */
  failures: number;
  /** All requests allowed per window (a whole class behind one school address joins fine). */
  requests: number;
  windowMs: number;
}
export const DEFAULT_PLAY_RATE_LIMIT: PlayRateLimit = { failures: 20, requests: 300, windowMs: 60_000 };

/** socket.io server options shared by both gateways (the first gateway on a port creates the server). */
export const SOCKET_OPTIONS = {
  maxHttpBufferSize: 16 * 1024,
  perMessageDeflate: false,
  serveClient: false,
  connectTimeout: 10_000,
} as const;

export const NICKNAME_MAX_LENGTH = 20;
export const CLIENT_MESSAGE_ID_MAX_LENGTH = 64;
/** Longest free-text answer accepted (numeric and text items). */
export const ANSWER_TEXT_MAX_LENGTH = 200;
/** Items below this mean credit are listed to revisit after the session (common practice: under 70 %). */
export const REVISIT_BELOW_P = 0.7;
