import { describe, expect, it, vi } from 'vitest';
import { joinSuccess, jsonResponse, UNKNOWN_CODE_FAILURE } from '@/test/factories';
import { PlayerConnection, parseJoinResult } from './PlayerConnection';

describe(PlayerConnection.name, () => {
  it('POSTs the code and nickname as JSON to /api/play/join', async () => {
    const fetchMock = vi.fn(async () => jsonResponse(200, joinSuccess()));
    const connection = new PlayerConnection({ fetch: fetchMock });

    await connection.join({ code: 'ABC234', nickname: 'Sam' });

    expect(fetchMock).toHaveBeenCalledTimes(1);
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/play/join');
    expect(init.method).toBe('POST');
    expect(new Headers(init.headers).get('Content-Type')).toBe('application/json');
    expect(JSON.parse(init.body as string)).toEqual({ code: 'ABC234', nickname: 'Sam' });
  });

  it('returns the token and session id on success', async () => {
    const connection = new PlayerConnection({ fetch: async () => jsonResponse(201, joinSuccess()) });
    await expect(connection.join({ code: 'ABC234', nickname: 'Sam' })).resolves.toEqual(joinSuccess());
  });

  it("passes the server's error code and message through", async () => {
    const connection = new PlayerConnection({
      fetch: async () => jsonResponse(404, UNKNOWN_CODE_FAILURE),
    });
    await expect(connection.join({ code: 'ABC234', nickname: 'Sam' })).resolves.toEqual(UNKNOWN_CODE_FAILURE);
  });

  it('reports a network failure in the same shape', async () => {
    const connection = new PlayerConnection({
      fetch: async () => {
        throw new TypeError('Failed to fetch');
      },
    });
    await expect(connection.join({ code: 'ABC234', nickname: 'Sam' })).resolves.toMatchObject({
      ok: false,
      error: 'network_error',
    });
  });

  it('reports a body that is not JSON as a bad response', async () => {
    const connection = new PlayerConnection({
      fetch: async () => new Response('<html>502 Bad Gateway</html>', { status: 502 }),
    });
    await expect(connection.join({ code: 'ABC234', nickname: 'Sam' })).resolves.toMatchObject({
      ok: false,
      error: 'bad_response',
    });
  });

  it('prefixes the API base when one is configured', async () => {
    const fetchMock = vi.fn(async (_url: string) => jsonResponse(200, joinSuccess()));
    await new PlayerConnection({ apiBase: 'https://covalent.example', fetch: fetchMock }).join({ code: 'ABC234', nickname: 'Sam' });
    expect(fetchMock.mock.calls[0]?.[0]).toBe('https://covalent.example/api/play/join');
  });
});

describe('parseJoinResult', () => {
  it('refuses a success body without a token', () => {
    expect(parseJoinResult({ ok: true, sessionId: 's' }, true)).toMatchObject({ error: 'bad_response' });
  });

  it('refuses ok:true on an HTTP error status', () => {
    expect(parseJoinResult(joinSuccess(), false)).toMatchObject({ error: 'bad_response' });
  });

  it('drops fields outside the documented shape', () => {
    expect(parseJoinResult({ ...joinSuccess(), extra: 1 }, true)).toEqual(joinSuccess());
  });
});
