/**
 * Types of the live round engine (DESIGN.md §4). Everything in SessionState is
 * plain JSON so the server can store a snapshot and rebuild after a restart.
 */

export const FORMATS = ['huddle', 'numbered', 'solo'] as const;
export type Format = (typeof FORMATS)[number];

export const STANDINGS_VIEWS = ['full', 'top3', 'none'] as const;
export type StandingsView = (typeof STANDINGS_VIEWS)[number];

/** Roster accommodation: the allowed time multipliers (DESIGN.md §4 "Timing"). */
export const TIME_MULTIPLIERS = [1, 1.25, 1.5, 2] as const;
export type TimeMultiplier = (typeof TIME_MULTIPLIERS)[number];

export type SessionStatus = 'lobby' | 'running' | 'paused' | 'ended';
export type RoundStatus = 'ready' | 'open' | 'closed' | 'revealed';
export type PlayerStatus = 'connected' | 'away' | 'removed';

export const DEFAULT_ROUND_LIMIT_MS = 30_000;
export const DEFAULT_SPEED_WEIGHT = 0.5;
export const DEFAULT_UNITY_BONUS = 0.1;
export const ADD_TIME_MS = 15_000;

export interface SessionConfigInput {
  format: Format;
  items: { id: string }[];
  roundLimitMs?: number;
  speedWeight?: number;
  standings?: StandingsView;
  unityBonus?: number;
}

export interface SessionConfig {
  format: Format;
  items: { id: string }[];
  roundLimitMs: number;
  speedWeight: number;
  standings: StandingsView;
  unityBonus: number;
}

export interface TeamInput {
  id: string;
  name?: string;
}

export interface PlayerInput {
  id: string;
  teamId: string;
  timeMultiplier?: number;
  /** Numbered-heads number within the team, 1-based; the next free one when omitted. */
  number?: number;
}

export interface TeamState {
  id: string;
  name: string;
}

export interface PlayerState {
  id: string;
  teamId: string;
  timeMultiplier: TimeMultiplier;
  number: number;
  status: PlayerStatus;
}

/** Who answers in a round: a player (solo) or a team (huddle, numbered). */
export type UnitKind = 'player' | 'team';

/** A player as fixed when the round opened; late joiners play from the next round. */
export interface RosterEntry {
  playerId: string;
  teamId: string;
  timeMultiplier: TimeMultiplier;
  number: number;
}

/** The answering unit's own base limit (round limit × multiplier). */
export interface RoundUnit {
  id: string;
  kind: UnitKind;
  baseLimitMs: number;
}

/** The number called for a team in `numbered`, after any pass-on. */
export interface TeamCall {
  teamId: string;
  calledNumber: number;
  /** The member who may submit, or null when nobody of the team is present. */
  playerId: string | null;
}

export interface PauseSpan {
  from: number;
  to: number | null;
}

/** A player's current answer (solo, numbered) or vote (huddle) in a round. */
export interface AnswerRecord {
  playerId: string;
  teamId: string;
  response: unknown;
  /** Canonical JSON of the response: two responses are the same choice when this is equal. */
  choice: string;
  /** Clock time of the last change of choice (huddle: the member's elapsed time is taken here). */
  changedAt: number;
  /** Active elapsed ms at the last change of choice. */
  elapsedMs: number;
  locked: boolean;
}

/** One change of a huddle vote, in arrival order, for the "first to reach the count" rule. */
export interface VoteLogEntry {
  seq: number;
  teamId: string;
  playerId: string;
  /** The previous choice (null for a first vote). */
  from: string | null;
  to: string;
  at: number;
}

export type CloseReason = 'all_locked' | 'deadline' | 'host' | 'ended';

export interface PlayerRoundResult {
  roundIndex: number;
  itemId: string;
  playerId: string;
  teamId: string;
  answered: boolean;
  response: unknown | null;
  credit: number;
  correct: boolean;
  points: number;
  /** Active elapsed ms at the (last change of) answer; null when not answered. */
  elapsedMs: number | null;
  /** The T used in the points formula. */
  limitMs: number;
}

export interface TeamRoundResult {
  roundIndex: number;
  itemId: string;
  teamId: string;
  /** huddle: the plurality choice; numbered: the called member's submission; solo: null. */
  answer: unknown | null;
  /** Credit of the team answer; solo: mean credit of the members. */
  credit: number;
  /** Whether the team answer is correct; solo: null (see correctShare). */
  correct: boolean | null;
  /** Contribution to the "more correct answers" tie-break: 0/1, or the share of correct members in solo. */
  correctShare: number;
  /** Integer points shown for the round. */
  points: number;
  /** Unrounded points; standings sum these and round once (solo means). */
  exactPoints: number;
  /** Unity bonus applied (huddle only). */
  unity: boolean;
  /** Team response time for the tie-break: huddle/solo mean of members, numbered the submission; no answer counts T. */
  responseMs: number;
  limitMs: number;
  /** numbered: the member who was called (after pass-on). */
  calledPlayerId: string | null;
  memberCount: number;
}

export interface RoundResults {
  players: PlayerRoundResult[];
  teams: TeamRoundResult[];
}

export interface RoundState {
  index: number;
  itemId: string;
  status: RoundStatus;
  openedAt: number | null;
  closedAt: number | null;
  revealedAt: number | null;
  closeReason: CloseReason | null;
  addedMs: number;
  pauses: PauseSpan[];
  roster: RosterEntry[];
  units: RoundUnit[];
  calls: TeamCall[];
  answers: AnswerRecord[];
  voteLog: VoteLogEntry[];
  results: RoundResults | null;
}

/** What an accepted answer acknowledgement carries; a resend returns the stored copy. */
export interface Acceptance {
  playerId: string;
  clientMessageId: string;
  roundIndex: number;
  acceptedAt: number;
  locked: boolean;
}

export interface SessionState {
  version: 1;
  config: SessionConfig;
  status: SessionStatus;
  startedAt: number | null;
  endedAt: number | null;
  pausedAt: number | null;
  teams: TeamState[];
  players: PlayerState[];
  rounds: RoundState[];
  /** Index of the current round in `rounds`, -1 before start. */
  currentRound: number;
  /** numbered: numbers still to call in the current seeded cycle. */
  callQueue: number[];
  /** How many values were drawn from the rng, so a rebuild can fast-forward a re-seeded one. */
  rngDraws: number;
  /** Accepted answers by `${playerId}\u0000${clientMessageId}`, for resends. */
  acceptances: Record<string, Acceptance>;
  voteSeq: number;
}

export interface StandingEntry {
  teamId: string;
  name: string;
  rank: number;
  points: number;
  correctAnswers: number;
  responseMs: number;
}

export interface OwnStanding {
  teamId: string;
  rank: number;
  points: number;
  teamCount: number;
}

export interface UnitDeadline {
  kind: UnitKind;
  id: string;
  deadlineAt: number;
  /** The unit's current window (own limit + added time), in ms. */
  limitMs: number;
}

export interface CheckResult {
  credit: number;
  correct: boolean;
}

export type AnswerChecker = (itemIndex: number, response: unknown) => CheckResult;

export interface Clock {
  now(): number;
}

export interface EngineDeps {
  clock: Clock;
  /** Uniform in [0, 1), seeded by the caller (e.g. seedrandom with the session seed). */
  rng: () => number;
  check: AnswerChecker;
}

export type Audience =
  | { kind: 'session' }
  | { kind: 'host' }
  | { kind: 'team'; teamId: string }
  | { kind: 'player'; playerId: string };

export interface VoteView {
  playerId: string;
  response: unknown;
  locked: boolean;
}

/** Domain events for the gateway to broadcast; nothing before `round_revealed` says what is right. */
export type EngineEvent =
  | { type: 'session_started'; audience: Audience; at: number }
  | { type: 'session_paused'; audience: Audience; at: number }
  | { type: 'session_resumed'; audience: Audience; at: number; pausedMs: number; deadlines: UnitDeadline[] }
  | { type: 'session_ended'; audience: Audience; at: number }
  | { type: 'round_ready'; audience: Audience; roundIndex: number; itemId: string }
  | {
      type: 'round_opened';
      audience: Audience;
      roundIndex: number;
      itemId: string;
      openedAt: number;
      deadlines: UnitDeadline[];
      calls: TeamCall[];
    }
  | { type: 'call_passed'; audience: Audience; roundIndex: number; call: TeamCall }
  | { type: 'time_added'; audience: Audience; roundIndex: number; addedMs: number; deadlines: UnitDeadline[] }
  | { type: 'answer_accepted'; audience: Audience; acceptance: Acceptance }
  | { type: 'votes_changed'; audience: Audience; roundIndex: number; teamId: string; votes: VoteView[] }
  | { type: 'progress'; audience: Audience; roundIndex: number; lockedIn: number; units: number }
  | { type: 'round_closed'; audience: Audience; roundIndex: number; closedAt: number; reason: CloseReason }
  | { type: 'round_revealed'; audience: Audience; roundIndex: number; itemId: string; results: RoundResults }
  | { type: 'standings'; audience: Audience; view: StandingsView; entries: StandingEntry[] }
  | { type: 'team_standing'; audience: Audience; standing: OwnStanding }
  | { type: 'player_added'; audience: Audience; playerId: string; teamId: string; number: number }
  | { type: 'team_added'; audience: Audience; teamId: string; name: string }
  | { type: 'player_status'; audience: Audience; playerId: string; status: PlayerStatus };

export type EngineErrorCode =
  | 'invalid_config'
  | 'not_in_lobby'
  | 'session_not_running'
  | 'session_paused'
  | 'session_ended'
  | 'not_paused'
  | 'round_not_ready'
  | 'round_not_open'
  | 'round_not_closed'
  | 'round_not_revealed'
  | 'no_more_items'
  | 'unknown_player'
  | 'unknown_team'
  | 'duplicate_player'
  | 'duplicate_team'
  | 'duplicate_number'
  | 'invalid_multiplier'
  | 'invalid_number'
  | 'invalid_message_id'
  | 'removed'
  | 'too_late'
  | 'not_your_turn'
  | 'already_answered'
  | 'already_locked'
  | 'nothing_to_lock';

export interface EngineError {
  ok: false;
  error: EngineErrorCode;
  message: string;
}

export type EngineResult<T extends object = object> = ({ ok: true; events: EngineEvent[] } & T) | EngineError;

export interface SubmitInput {
  playerId: string;
  clientMessageId: string;
  response: unknown;
  /** Receipt time; the clock's now when omitted. */
  at?: number;
  /** huddle: lock the vote in. Solo and numbered answers are always final. */
  lock?: boolean;
}

export interface SubmitOk {
  acceptance: Acceptance;
  /** True when this was a resend of an accepted message (not counted again). */
  duplicate: boolean;
}
