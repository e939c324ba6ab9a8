import type { JoinRequest, JoinResult } from './types';

export type FetchLike = (input: string, init?: RequestInit) => Promise<Response>;

export interface PlayerConnectionOptions {
  /** Origin prefix for REST calls; '' means same origin (the dev server proxies /api). */
  apiBase?: string;
  fetch?: FetchLike;
}

// Client-side failures use the same shape as the server's errors so the UI has one path.
const NETWORK_ERROR: JoinResult = {
  ok: false,
  error: 'network_error',
  message: "Couldn't reach Covalent. Check your Wi-Fi and try again.",
};
const BAD_RESPONSE: JoinResult = {
  ok: false,
  error: 'bad_response',
  message: 'Something went wrong on our side. Try again in a moment.',
};

/**
 * The player app's one connection to the server. It will own the single socket.io socket
 * (created on join, with the player token) and register every listener; for now it only
 * performs the REST join. socket.io-client is not imported until it is used, to keep the
 * first load small.
 */
export class PlayerConnection {
  private readonly apiBase: string;
  private readonly fetchFn: FetchLike;

  constructor(options: PlayerConnectionOptions = {}) {
    this.apiBase = options.apiBase ?? '';
    // Look fetch up at call time: a detached `window.fetch` throws "Illegal invocation".
    this.fetchFn = options.fetch ?? ((input, init) => globalThis.fetch(input, init));
  }

  async join(code: string, nickname: string): Promise<JoinResult> {
    const body: JoinRequest = { code, nickname };
    let response: Response;
    try {
      response = await this.fetchFn(`${this.apiBase}/api/play/join`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Accept: 'application/json' },
        body: JSON.stringify(body),
      });
    } catch {
      return NETWORK_ERROR;
    }
    let payload: unknown;
    try {
      payload = await response.json();
    } catch {
      return BAD_RESPONSE;
    }
    return parseJoinResult(payload, response.ok);
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
    typeof payload.sessionId === 'string'
  ) {
    return { ok: true, playerToken: payload.playerToken, sessionId: payload.sessionId };
  }
  if (payload.ok === false && typeof payload.error === 'string' && typeof payload.message === 'string') {
    return { ok: false, error: payload.error, message: payload.message };
  }
  return BAD_RESPONSE;
}
