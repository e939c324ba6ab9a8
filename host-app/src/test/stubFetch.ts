import { vi } from 'vitest';

export interface StubResponse {
  status: number;
  body?: unknown;
}

/** `"METHOD /path"` → the response, or a function of the request body for stateful flows. */
export type FetchRoutes = Record<string, StubResponse | ((body: unknown) => StubResponse)>;

function toResponse({ status, body }: StubResponse): Response {
  const text = body === undefined ? null : JSON.stringify(body);
  return new Response(text, { status, headers: text ? { 'Content-Type': 'application/json' } : {} });
}

/**
 * Replaces global fetch with a route table. An unlisted request fails the test loudly
 * rather than hanging on a real network call.
 */
export function stubFetch(routes: FetchRoutes) {
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    const url = typeof input === 'string' ? input : input instanceof URL ? input.href : input.url;
    const key = `${init?.method ?? 'GET'} ${url}`;
    const route = routes[key];
    if (!route) throw new Error(`Unexpected request in test: ${key}`);
    const body = typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined;
    return toResponse(typeof route === 'function' ? route(body) : route);
  });
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

/** The JSON body a stubbed fetch was called with, for one call. */
export function sentBody(fetchMock: ReturnType<typeof stubFetch>, method: string, url: string): unknown {
  const call = fetchMock.mock.calls.find(([input, init]) => input === url && (init?.method ?? 'GET') === method);
  if (!call) throw new Error(`No ${method} ${url} was sent.`);
  const raw = call[1]?.body;
  return typeof raw === 'string' ? (JSON.parse(raw) as unknown) : undefined;
}

/** Every call a stubbed fetch received for one method and URL, to count them. */
export function callsTo(fetchMock: ReturnType<typeof stubFetch>, method: string, url: string) {
  return fetchMock.mock.calls.filter(([input, init]) => input === url && (init?.method ?? 'GET') === method);
}
