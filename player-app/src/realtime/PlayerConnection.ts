import type { JoinInfoResult, JoinRequest, JoinResult, RosterChoice } from './types';

type Failure = Extract<JoinResult, { ok: false }>;

export type FetchLike = (input: string, init?: RequestInit) => Promise<Response>;

export interface PlayerConnectionOptions {
  /** Origin prefix for REST calls; '' means same origin (the dev server proxies /api). */
  apiBase?: string;
  fetch?: FetchLike;
}

// Client-side failures use the same shape as the server's errors so the UI has one path.
const NETWORK_ERROR: Failure = {
  ok: false,
  error: 'network_error',
  message: "Couldn't reach Covalent. Check your Wi-Fi and try again.",
};
const BAD_RESPONSE: Failure = {
  ok: false,
  error: 'bad_response',
  message: 'Something went wrong on our side. Try again in a moment.',
};

/** The player app's REST client: join info and joining. The socket lives in `PlayerSocket`. */
export class PlayerConnection {
  private readonly apiBase: string;
  private readonly fetchFn: FetchLike;

  constructor(options: PlayerConnectionOptions = {}) {
    this.apiBase = options.apiBase ?? '';
    // Look fetch up at call time: a detached `window.fetch` throws "Illegal invocation".
    this.fetchFn = options.fetch ?? ((input, init) => globalThis.fetch(input, init));
  }

  /** `POST /api/play/join`, by nickname or by roster entry. */
  async join(request: JoinRequest): Promise<JoinResult> {
    const payload = await this.request('/api/play/join', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Accept: 'application/json' },
      body: JSON.stringify(request),
    });
    return 'failure' in payload ? payload.failure : parseJoinResult(payload.body, payload.httpOk);
  }

  /** `GET /api/play/sessions/:code`: the session's title and, for class sessions, its roster. */
  async joinInfo(code: string): Promise<JoinInfoResult> {
    const payload = await this.request(`/api/play/sessions/${encodeURIComponent(code)}`, {
      headers: { Accept: 'application/json' },
    });
    return 'failure' in payload ? payload.failure : parseJoinInfo(payload.body, payload.httpOk);
  }

  private async request(
    path: string,
    init: RequestInit,
  ): Promise<{ body: unknown; httpOk: boolean } | { failure: Failure }> {
    let response: Response;
    try {
      response = await this.fetchFn(`${this.apiBase}${path}`, init);
    } catch {
      return { failure: NETWORK_ERROR };
    }
    try {
      return { body: await response.json(), httpOk: response.ok };
    } catch {
      return { failure: BAD_RESPONSE };
    }
  }
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null;
}

/** Accepts only the two documented shapes; anything else is reported as a bad response. */
export function parseJoinResult(payload: unknown, httpOk: boolean): JoinResult {
  if (!isRecord(payload)) return BAD_RESPONSE;
  if (
    httpOk &&
    payload.ok === true &&
    typeof payload.playerToken === 'string' &&
    payload.playerToken !== '' &&
    typeof payload.sessionId === 'string' &&
    typeof payload.playerId === 'string'
  ) {
    return {
      ok: true,
      sessionId: payload.sessionId,
      playerId: payload.playerId,
      playerToken: payload.playerToken,
    };
  }
  return parseFailure(payload);
}

function parseFailure(payload: Record<string, unknown>): Failure {
  if (payload.ok === false && typeof payload.error === 'string' && typeof payload.message === 'string') {
    return { ok: false, error: payload.error, message: payload.message };
  }
  return BAD_RESPONSE;
}

function parseRosterChoice(value: unknown): RosterChoice | null {
  if (!isRecord(value)) return null;
  const { id, displayName, taken } = value;
  if (typeof id !== 'string' || typeof displayName !== 'string') return null;
  return { id, displayName, taken: taken === true };
}

/** Accepts the documented join-info shape; a malformed roster is dropped, not trusted. */
export function parseJoinInfo(payload: unknown, httpOk: boolean): JoinInfoResult {
  if (!isRecord(payload)) return BAD_RESPONSE;
  if (httpOk && payload.ok === true && typeof payload.sessionTitle === 'string') {
    const roster = Array.isArray(payload.roster)
      ? payload.roster.map(parseRosterChoice).filter((r): r is RosterChoice => r !== null)
      : null;
    return {
      ok: true,
      sessionTitle: payload.sessionTitle,
      roster: roster && roster.length > 0 ? roster : null,
      joiningLocked: payload.joiningLocked === true,
    };
  }
  return parseFailure(payload);
}
