import { vi } from 'vitest';
import type { JoinResult } from '@/realtime';

/** A valid code: every character from the join-code alphabet. */
export const VALID_CODE = 'ABC234';

export const UNKNOWN_CODE_FAILURE: JoinResult = {
  ok: false,
  error: 'unknown_code',
  message: 'No session has that code. Check the code on the board.',
};

export function joinSuccess(overrides: Partial<{ playerToken: string; sessionId: string }> = {}) {
  return {
    ok: true as const,
    playerToken: 'player-token-abc',
    sessionId: '6f1c2d1e-0000-4000-8000-000000000001',
    ...overrides,
  };
}

export function jsonResponse(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
}

/** Replaces global fetch with a mock answering every call with the given status and body. */
export function stubFetch(status: number, body: unknown) {
  const fetchMock = vi.fn(async (_input: string, _init?: RequestInit) => jsonResponse(status, body));
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

/** A fetch that stays pending until `respond` is called, to observe the submitting state. */
export function stubPendingFetch() {
  let respond: (response: Response) => void = () => undefined;
  const fetchMock = vi.fn(
    (_input: string, _init?: RequestInit) =>
      new Promise<Response>((resolve) => {
        respond = resolve;
      }),
  );
  vi.stubGlobal('fetch', fetchMock);
  return { fetchMock, respond: (response: Response) => respond(response) };
}

/** Points jsdom's location at a player-app URL without reloading. */
export function visit(pathAndQuery: string): void {
  window.history.replaceState(null, '', pathAndQuery);
}
