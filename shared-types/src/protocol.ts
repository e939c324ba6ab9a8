import type { ItemKey, ItemResponse, PlayerItemView } from './items';

/**
 * The live-session wire protocol (socket.io). Bump when a payload changes shape; clients send it
 * in the handshake and the server refuses a mismatch with `protocol_mismatch`.
 */
export const PROTOCOL_VERSION = 1;

/** socket.io namespaces: the teacher's host screen and the students' player app. */
export const NAMESPACES = { host: '/host', player: '/play' } as const;

/** Session settings a teacher chooses (DESIGN.md §4). */
export const FORMATS = ['huddle', 'numbered', 'solo'] as const;
/** One of {@link FORMATS}. */
export type Format = (typeof FORMATS)[number];
/** What the class sees of the standings. */
export const STANDINGS_VIEWS = ['full', 'top3', 'none'] as const;
/** One of {@link STANDINGS_VIEWS}. */
export type StandingsView = (typeof STANDINGS_VIEWS)[number];
/** Mixer modes. */
export const MIXER_MODES = ['random', 'mix-tables', 'balanced'] as const;
/** One of {@link MIXER_MODES}. */
export type MixerMode = (typeof MIXER_MODES)[number];
/** Team name packs. */
export const NAME_PACKS = ['elements', 'minerals', 'constellations'] as const;
/** One of {@link NAME_PACKS}. */
export type NamePack = (typeof NAME_PACKS)[number];

/** Session states. */
export type SessionStatus = 'lobby' | 'running' | 'paused' | 'ended';
/** Round states. */
export type RoundStatus = 'ready' | 'open' | 'closed' | 'revealed';
/** Player states. */
export type PlayerStatus = 'connected' | 'away' | 'removed';

/**
 * Okabe & Ito (2008) colour-universal palette, "Color Universal Design" (from memory; the hex
 * values are the widely reproduced ones). Teams are also told apart by name and pattern.
 */
export const TEAM_COLOURS = ['#E69F00', '#56B4E9', '#009E73', '#F0E442', '#0072B2', '#D55E00', '#CC79A7', '#000000'] as const;
/** Simple fills drawn beside the team colour, so colour is never the only cue. */
export const TEAM_PATTERNS = ['dots', 'stripes', 'grid', 'waves', 'diagonal', 'checks', 'crosses', 'rings'] as const;
/** One of {@link TEAM_PATTERNS}. */
export type TeamPattern = (typeof TEAM_PATTERNS)[number];

/** Acknowledgement of every client command. */
export type Ack<T extends object = object> = ({ ok: true } & T) | { ok: false; error: string; message: string };
/** The ack callback a command passes last. */
export type AckFn<T extends object = object> = (ack: Ack<T>) => void;

// ---------------------------------------------------------------- REST: setting up and joining

/** `POST /api/sessions`: a teacher sets up a session from a bank. */
export interface CreateSessionRequest {
  bankId: string;
  /** Items to play, in order; all of the bank's items when omitted. */
  itemIds?: string[];
  /** The class playing, or null for an ad-hoc group. */
  classId: string | null;
  format: Format;
  roundSeconds: number;
  /** 0 turns speed off. */
  speedWeight: number;
  standings: StandingsView;
  teamCount?: number;
  targetTeamSize?: number;
  mixerMode: MixerMode;
  namePack: NamePack;
}

/** A session as the host app lists and opens it. */
export interface SessionDto {
  id: string;
  joinCode: string;
  status: SessionStatus;
  bankId: string;
  bankTitle: string;
  classId: string | null;
  className: string | null;
  format: Format;
  roundSeconds: number;
  speedWeight: number;
  standings: StandingsView;
  mixerMode: MixerMode;
  namePack: NamePack;
  itemCount: number;
  playerCount: number;
  createdAt: string;
  endedAt: string | null;
}

/** `POST /api/play/join`: by nickname, or by picking yourself from the class roster. */
export type JoinRequest = { code: string; nickname: string } | { code: string; rosterEntryId: string };

/** `POST /api/play/join` success; the token is kept by the browser to rejoin. */
export interface JoinResponse {
  ok: true;
  sessionId: string;
  playerId: string;
  playerToken: string;
}

/** `GET /api/play/sessions/:code`: what a student sees before joining. */
export interface JoinInfoResponse {
  ok: true;
  sessionTitle: string;
  /** For class sessions: the roster names to pick from (display names only). */
  roster: { id: string; displayName: string; taken: boolean }[] | null;
  joiningLocked: boolean;
}

// ---------------------------------------------------------------- views sent over the socket

/** A team as everyone may see it. */
export interface TeamView {
  id: string;
  name: string;
  colour: string;
  pattern: TeamPattern;
  members: { playerId: string; nickname: string; number: number; status: PlayerStatus }[];
}

/** The Mixer's cost summary shown to the teacher in the lobby. */
export interface MixerSummary {
  mode: MixerMode;
  seed: string;
  /** e.g. "0 same-table pairs, 2 repeat pairs". */
  description: string;
  sameTablePairs: number;
  repeatPairs: number;
  keepApartViolations: number;
}

/** Server timing of the open round. Clients count down from `deadlineAt` corrected by their clock offset. */
export interface RoundTiming {
  roundIndex: number;
  status: RoundStatus;
  /**
   * Server clock (ms since epoch) at which this client's (or team's) window closes; null when not
   * open. While paused it is frozen: the time left is `deadlineAt − serverNow`.
   */
  deadlineAt: number | null;
  limitMs: number;
  paused: boolean;
  /** Server clock when this message was sent. */
  serverNow: number;
}

/** One standing row. */
export interface StandingRow {
  teamId: string;
  name: string;
  rank: number;
  points: number;
  correctAnswers: number;
}

/** What a player's team reveal looks like, and their own result. */
export interface PlayerReveal {
  roundIndex: number;
  key: ItemKey;
  explanation: string;
  you: { answered: boolean; response: ItemResponse | null; credit: number; correct: boolean; points: number } | null;
  /** `correct` is null when the team gave no answer (numbered: the called member did not submit). */
  team: { answer: ItemResponse | null; correct: boolean | null; points: number; unity: boolean };
}

/** The share of answers for each option (or each distinct answer), shown after the reveal. */
export interface AnswerDistribution {
  total: number;
  /** For choice items: option id → count. For others: a few normalised answers → count. */
  counts: { label: string; optionId: string | null; count: number; correct: boolean }[];
}

/** Everything a player needs after (re)connecting. */
export interface PlayerSessionView {
  sessionId: string;
  status: SessionStatus;
  format: Format;
  you: { playerId: string; nickname: string; teamId: string | null; number: number | null };
  team: TeamView | null;
  round: {
    timing: RoundTiming;
    item: PlayerItemView;
    itemCount: number;
    /** numbered: the member of your team who answers this round. */
    calledPlayerId: string | null;
    /** huddle: your team's current votes. */
    votes: VoteView[];
    /** Your own accepted answer this round, if any. */
    yourAnswer: { response: ItemResponse; locked: boolean } | null;
    reveal: PlayerReveal | null;
  } | null;
  ownStanding: { rank: number; points: number; teamCount: number } | null;
  /** The class standings as the host chose to show them (empty when `none`). */
  standings: StandingRow[];
  /** Your totals so far (for the end-of-session summary); once ended, `itemCount` is the rounds played. */
  summary: { answered: number; correct: number; points: number; itemCount: number };
  serverNow: number;
}

/** A teammate's current huddle vote. */
export interface VoteView {
  playerId: string;
  response: ItemResponse;
  locked: boolean;
}

/** Everything the host screen needs; pushed again whenever something changes. */
export interface HostSessionView {
  session: SessionDto;
  joiningLocked: boolean;
  teams: TeamView[];
  /** Players not yet placed on a team (joined after lobby, before the next reshuffle). */
  unplaced: { playerId: string; nickname: string }[];
  mixer: MixerSummary | null;
  round: {
    timing: RoundTiming;
    itemIndex: number;
    itemCount: number;
    /** The bank item on screen, and its tags (the host shows the lab-safety caution for `safety`). */
    itemId: string;
    tags: string[];
    item: PlayerItemView;
    /** Per team: how many have locked in; never who got what. */
    progress: { teamId: string; answered: number; members: number }[];
    /** Present only once revealed. */
    reveal: { key: ItemKey; explanation: string; distribution: AnswerDistribution } | null;
  } | null;
  standings: StandingRow[];
  /** After the end: class accuracy and the items to revisit. */
  summary: { accuracy: number | null; itemsToRevisit: { itemId: string; prompt: string; p: number | null }[] } | null;
  serverNow: number;
}

// ---------------------------------------------------------------- commands

/** Commands the host screen sends. */
export type HostCommand =
  | { type: 'start' }
  | { type: 'open_round' }
  | { type: 'pause' }
  | { type: 'resume' }
  | { type: 'add_time' }
  | { type: 'close_round' }
  | { type: 'reveal' }
  | { type: 'next' }
  | { type: 'end' }
  | { type: 'reshuffle' }
  | { type: 'lock_joining'; locked: boolean }
  | { type: 'remove_player'; playerId: string }
  | { type: 'rename_player'; playerId: string; nickname: string };

/** A player's answer (or huddle vote). `clientMessageId` makes a resend count once. */
export interface SubmitAnswerPayload {
  clientMessageId: string;
  roundIndex: number;
  response: ItemResponse;
  /** huddle: lock the vote in; other formats lock on submit. */
  lock?: boolean;
}

/** NTP-style clock sample: the client sends t0, the server answers with its clock. */
export interface ClockSyncPayload {
  t0: number;
}

/** Events the player app sends. */
export interface PlayerClientEvents {
  'answer:submit': (payload: SubmitAnswerPayload, ack: AckFn<{ duplicate: boolean; locked: boolean; acceptedAt: number }>) => void;
  'answer:lock': (payload: { roundIndex: number }, ack: AckFn) => void;
  'clock:sync': (payload: ClockSyncPayload, ack: AckFn<{ t0: number; serverNow: number }>) => void;
  'session:resync': (payload: Record<string, never>, ack: AckFn<{ view: PlayerSessionView }>) => void;
}

/** Events the server sends to players. */
export interface PlayerServerEvents {
  /** A full view: on connect, on resync, and on team changes. */
  'session:state': (view: PlayerSessionView) => void;
  'round:opened': (payload: { roundIndex: number; itemCount: number; item: PlayerItemView; timing: RoundTiming; calledPlayerId: string | null }) => void;
  'round:timing': (timing: RoundTiming) => void;
  'round:votes': (payload: { roundIndex: number; teamId: string; votes: VoteView[] }) => void;
  'round:call': (payload: { roundIndex: number; calledPlayerId: string | null }) => void;
  'round:closed': (payload: { roundIndex: number }) => void;
  'round:revealed': (reveal: PlayerReveal) => void;
  'standings:update': (payload: { own: { rank: number; points: number; teamCount: number } | null; standings: StandingRow[] }) => void;
  'session:status': (payload: { status: SessionStatus }) => void;
  /** The host removed this player; the token no longer works. */
  'player:removed': (payload: { message: string }) => void;
}

/** Events the host screen sends. */
export interface HostClientEvents {
  'host:command': (command: HostCommand, ack: AckFn<{ view: HostSessionView }>) => void;
  'clock:sync': (payload: ClockSyncPayload, ack: AckFn<{ t0: number; serverNow: number }>) => void;
  'session:resync': (payload: Record<string, never>, ack: AckFn<{ view: HostSessionView }>) => void;
}

/** Events the server sends to the host screen. */
export interface HostServerEvents {
  'host:state': (view: HostSessionView) => void;
}

/** Handshake `auth` of the player namespace. */
export interface PlayerHandshake {
  token: string;
  protocolVersion: number;
}

/** Handshake `auth` of the host namespace (the sign-in cookie travels with the request). */
export interface HostHandshake {
  sessionId: string;
  protocolVersion: number;
}

/** The unambiguous join-code alphabet: no 0/O, 1/I/L. */
export const JOIN_CODE_ALPHABET = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';
/** Join codes are this long. */
export const JOIN_CODE_LENGTH = 6;
