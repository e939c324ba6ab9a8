import type {
  CatchupAnswerRequest,
  CatchupAnswerResponse,
  CatchupInfoResponse,
  CatchupStartResponse,
} from '@covalent/shared-types';

/** A refused or failed call, in the server's error shape so the page has one path. */
export interface CatchupFailure {
  ok: false;
  error: string;
  message: string;
}
export type CatchupResult<T> = T | CatchupFailure;

const NETWORK_ERROR: CatchupFailure = {
  ok: false,
  error: 'network_error',
  message: "Couldn't reach Covalent. Check your Wi-Fi and try again.",
};
const BAD_RESPONSE: CatchupFailure = {
  ok: false,
  error: 'bad_response',
  message: 'Something went wrong on our side. Try again in a moment.',
};

async function call<T extends { ok: true }>(path: string, body?: unknown): Promise<CatchupResult<T>> {
  let response: Response;
  try {
    // fetch looked up at call time, so tests can stub it.
    response = await globalThis.fetch(path, {
      method: body === undefined ? 'GET' : 'POST',
      headers: { Accept: 'application/json', ...(body === undefined ? {} : { 'Content-Type': 'application/json' }) },
      body: body === undefined ? undefined : JSON.stringify(body),
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
  if (typeof payload !== 'object' || payload === null) return BAD_RESPONSE;
  const p = payload as Record<string, unknown>;
  if (response.ok && p.ok === true) return payload as T;
  if (p.ok === false && typeof p.error === 'string' && typeof p.message === 'string') {
    return { ok: false, error: p.error, message: p.message };
  }
  return BAD_RESPONSE;
}

/** The catch-up's REST calls (public, no socket). */
export const catchupApi = {
  info: (code: string) => call<CatchupInfoResponse>(`/api/play/catchups/${encodeURIComponent(code)}`),
  start: (code: string, rosterEntryId: string) =>
    call<CatchupStartResponse>(`/api/play/catchups/${encodeURIComponent(code)}/start`, { rosterEntryId }),
  answer: (request: CatchupAnswerRequest) => call<CatchupAnswerResponse>('/api/play/catchups/answers', request),
};
