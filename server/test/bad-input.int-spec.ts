import * as fc from 'fast-check';
import request from 'supertest';
import type { Socket } from 'socket.io-client';
import { itemInputs, makeBankWithItems, makeSchool, makeUser, sessionRequest, signedIn } from './helpers/factories';
import { closeAll, connectHost, connectPlayer, createLiveApp, signInCookie, waitFor, type LiveApp, type TestSocket } from './helpers/sockets';
import { resetDatabase } from './helpers/test-app';

/**
 * Malformed input on both namespaces (DESIGN.md §8: "Malformed payloads get an error
 * acknowledgement, never a crash"). Property-based with fast-check, seeded so a run repeats.
 * Every property: the offender gets `{ ok: false, error, message }` or is disconnected, and a
 * well-behaved player in the same session is still served and /api/health stays 200.
 */
const FC = { numRuns: 50, seed: 20_251_201 };
const ACK_MS = 2000;
const SIMPLE = ['start', 'open_round', 'pause', 'resume', 'add_time', 'close_round', 'reveal', 'next', 'end', 'reshuffle'];
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
// socket.io-client refuses to emit these names itself.
const RESERVED = new Set(['connect', 'connect_error', 'disconnect', 'disconnecting', 'newListener', 'removeListener']);

const isPlain = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v) && !(v instanceof Uint8Array);
const keysWithin = (v: Record<string, unknown>, allowed: string[]) => Object.keys(v).every((k) => allowed.includes(k) && v[k] !== undefined);

/** Oracles from docs/protocol.md, independent of the server's parsers. */
const oracle = {
  clockSync: (v: unknown) => isPlain(v) && keysWithin(v, ['t0']) && typeof v.t0 === 'number' && Number.isFinite(v.t0),
  resync: (v: unknown) => v === null || v === undefined || (isPlain(v) && Object.keys(v).length === 0),
  hostCommand(v: unknown): boolean {
    if (!isPlain(v) || typeof v.type !== 'string') return false;
    if (SIMPLE.includes(v.type)) return keysWithin(v, ['type']);
    if (v.type === 'lock_joining') return keysWithin(v, ['type', 'locked']) && typeof v.locked === 'boolean';
    if (v.type === 'remove_player') return keysWithin(v, ['type', 'playerId']) && typeof v.playerId === 'string' && UUID.test(v.playerId);
    if (v.type === 'rename_player') return keysWithin(v, ['type', 'playerId', 'nickname']) && typeof v.playerId === 'string' && UUID.test(v.playerId) && typeof v.nickname === 'string';
    return false;
  },
};

/** Any JSON value, binary, or a value of the wrong kind entirely. */
const anyPayload = fc.oneof(
  fc.jsonValue(),
  fc.constantFrom(null, 0, -1, 1e308, true, '', '{}', []),
  fc.uint8Array({ maxLength: 64 }).map((a) => Buffer.from(a)),
  fc.array(fc.jsonValue(), { maxLength: 5 }),
);

describe('bad input on the live-session sockets (integration: property-based)', () => {
  let live: LiveApp;
  const open: TestSocket[] = [];
  let hostSocket: TestSocket;
  let good: TestSocket;
  let offenderToken = '';
  let offender: TestSocket;
  let offenderId = '';
  let optionId = '';
  let sessionId = '';
  let cookie = '';

  async function freshSession(l: LiveApp): Promise<void> {
    await resetDatabase(l.db);
    const teacher = await makeUser(l.db, await makeSchool(l.db));
    const agent = await signedIn(l.app.getHttpServer(), teacher);
    const { bankId, items } = await makeBankWithItems(agent, [itemInputs.single()]);
    optionId = items[0].key.correctOptionId;
    const session = (await agent.post('/api/sessions').send(sessionRequest(bankId, { format: 'solo', teamCount: 1 })).expect(201)).body;
    sessionId = session.id;
    const join = async (nickname: string) => (await request(l.app.getHttpServer()).post('/api/play/join').send({ code: session.joinCode, nickname }).expect(201)).body;
    const g = await join('Goodwin');
    const o = await join('Oddity');
    offenderToken = o.playerToken;
    offenderId = o.playerId;
    good = await connectPlayer(l, g.playerToken);
    offender = await connectPlayer(l, offenderToken);
    open.push(good, offender);
    cookie = await signInCookie(l, teacher);
    hostSocket = await connectHost(l, cookie, sessionId);
    open.push(hostSocket);
    await waitFor(hostSocket, 'host:state');
    expect(await hostSocket.socket.timeout(ACK_MS).emitWithAck('host:command', { type: 'start' })).toMatchObject({ ok: true });
    expect(await hostSocket.socket.timeout(ACK_MS).emitWithAck('host:command', { type: 'open_round' })).toMatchObject({ ok: true });
  }

  /** The offender's socket, reconnected if the server dropped it. */
  async function offenderSocket(): Promise<Socket> {
    if (!offender.socket.connected) {
      offender = await connectPlayer(live, offenderToken);
      open.push(offender);
    }
    return offender.socket;
  }

  async function hostOffender(): Promise<Socket> {
    if (!hostSocket.socket.connected) {
      hostSocket = await connectHost(live, cookie, sessionId);
      open.push(hostSocket);
    }
    return hostSocket.socket;
  }

  /** Sends and returns the ack, or 'disconnected' when the server closed the socket instead. */
  async function send(socket: Socket, event: string, ...args: unknown[]): Promise<any> {
    try {
      return await socket.timeout(ACK_MS).emitWithAck(event, ...args);
    } catch (err) {
      if (!socket.connected) return 'disconnected';
      throw err;
    }
  }

  const isErrorAck = (a: any) => a === 'disconnected' || (a?.ok === false && typeof a.error === 'string' && typeof a.message === 'string');

  /** Everyone else is still served. */
  async function othersServed(): Promise<void> {
    const t0 = 12345;
    expect(await good.socket.timeout(ACK_MS).emitWithAck('clock:sync', { t0 })).toMatchObject({ ok: true, t0 });
    await request(live.app.getHttpServer()).get('/api/health').expect(200);
  }

  async function storedFor(playerId: string): Promise<number> {
    return (await live.db.query('SELECT count(*)::int AS n FROM responses WHERE player_id = $1', [playerId]))[0].n;
  }

  describe('payloads (rate limit raised so every run reaches the parsers)', () => {
    beforeAll(async () => {
      live = await createLiveApp({ tuning: { messagesPerSecond: 100_000 } });
      await freshSession(live);
    }, 30_000);
    afterAll(async () => {
      closeAll(open.splice(0));
      await live.close();
    });
    afterEach(othersServed);

    const validId = fc.stringMatching(/^[A-Za-z0-9_.:-]{1,64}$/);
    const submitNearMiss = () =>
      fc
        .record(
          {
            clientMessageId: fc.oneof(validId, fc.constant(''), fc.string({ minLength: 65, maxLength: 300 }), fc.integer(), fc.constant(null), fc.string({ minLength: 1 }).filter((s) => /[^A-Za-z0-9_.:-]/.test(s))),
            roundIndex: fc.oneof(fc.constant(0), fc.integer({ min: -5, max: -1 }), fc.double(), fc.string(), fc.constant(10_000), fc.constant(null)),
            response: fc.oneof(
              fc.constant({ type: 'single', optionId }),
              fc.jsonValue(),
              fc.record({ type: fc.constant('single'), optionId: fc.string() }),
              fc.record({ type: fc.constantFrom('multi', 'truefalse', 'order', 'numeric', 'text'), value: fc.jsonValue() }),
              fc.record({ type: fc.constant('single'), optionId: fc.constant(optionId), extra: fc.jsonValue() }),
            ),
            lock: fc.oneof(fc.boolean(), fc.string(), fc.integer()),
            junk: fc.jsonValue(),
          },
          { requiredKeys: [] },
        )
        // Drop the (rare) fully valid answer: this property is about refusals.
        .filter((v) => {
          const okId = typeof v.clientMessageId === 'string' && /^[A-Za-z0-9_.:-]{1,64}$/.test(v.clientMessageId);
          const okResponse = JSON.stringify(v.response) === JSON.stringify({ type: 'single', optionId });
          const okLock = !('lock' in v) || typeof v.lock === 'boolean';
          return !(okId && v.roundIndex === 0 && okResponse && okLock && !('junk' in v));
        });

    it('answer:submit: any payload of the wrong shape gets an error ack and stores nothing', async () => {
      await fc.assert(
        fc.asyncProperty(fc.oneof(anyPayload, submitNearMiss()), async (payload) => {
          expect(isErrorAck(await send(await offenderSocket(), 'answer:submit', payload))).toBe(true);
        }),
        FC,
      );
      expect(await storedFor(offenderId)).toBe(0);
    }, 60_000);

    it('answer:lock: any payload gets an error ack (solo has nothing to lock)', async () => {
      const nearMiss = fc.record({ roundIndex: fc.oneof(fc.constant(0), fc.double(), fc.string()), extra: fc.jsonValue() }, { requiredKeys: [] });
      await fc.assert(
        fc.asyncProperty(fc.oneof(anyPayload, nearMiss), async (payload) => {
          expect(isErrorAck(await send(await offenderSocket(), 'answer:lock', payload))).toBe(true);
        }),
        FC,
      );
      expect(await storedFor(offenderId)).toBe(0);
    }, 60_000);

    for (const ns of ['player', 'host'] as const) {
      it(`${ns}: clock:sync and session:resync are ok exactly for the documented shapes`, async () => {
        const socket = () => (ns === 'player' ? offenderSocket() : hostOffender());
        const seen = { ok: 0, refused: 0 };
        const clockLike = fc.record({ t0: fc.oneof(fc.double(), fc.integer(), fc.string(), fc.constant(null)), extra: fc.jsonValue() }, { requiredKeys: [] });
        await fc.assert(
          fc.asyncProperty(fc.oneof(anyPayload, clockLike), async (payload) => {
            const ack = await send(await socket(), 'clock:sync', payload);
            // JSON has no NaN/Infinity: what the server saw is the payload after a JSON round trip.
            const wire = payload instanceof Uint8Array ? payload : JSON.parse(JSON.stringify(payload) ?? 'null');
            if (oracle.clockSync(wire)) expect(ack).toMatchObject({ ok: true, t0: (wire as { t0: number }).t0 });
            else expect(isErrorAck(ack)).toBe(true);
            seen[ack?.ok === true ? 'ok' : 'refused']++;
          }),
          FC,
        );
        // Both sides of the oracle were exercised.
        expect(seen.ok).toBeGreaterThan(0);
        expect(seen.refused).toBeGreaterThan(0);
        await fc.assert(
          fc.asyncProperty(anyPayload, async (payload) => {
            const ack = await send(await socket(), 'session:resync', payload);
            const wire = payload instanceof Uint8Array ? payload : JSON.parse(JSON.stringify(payload) ?? 'null');
            if (oracle.resync(wire)) expect(ack).toMatchObject({ ok: true, view: expect.any(Object) });
            else expect(isErrorAck(ack)).toBe(true);
          }),
          FC,
        );
      }, 60_000);
    }

    it('host:command: anything but a documented command gets an error ack and changes nothing', async () => {
      const nearMiss = fc.record(
        {
          type: fc.oneof(fc.constantFrom(...SIMPLE, 'lock_joining', 'remove_player', 'rename_player'), fc.string(), fc.integer()),
          locked: fc.oneof(fc.string(), fc.integer(), fc.constant(null)),
          playerId: fc.oneof(fc.string(), fc.uuid(), fc.integer()),
          nickname: fc.oneof(fc.string({ maxLength: 300 }), fc.integer()),
          extra: fc.jsonValue(),
        },
        { requiredKeys: [] },
      );
      await fc.assert(
        fc.asyncProperty(fc.oneof(anyPayload, nearMiss), async (payload) => {
          fc.pre(!oracle.hostCommand(JSON.parse(JSON.stringify(payload) ?? 'null')));
          expect(isErrorAck(await send(await hostOffender(), 'host:command', payload))).toBe(true);
        }),
        FC,
      );
      const state = await send(await hostOffender(), 'session:resync', {});
      expect(state.view).toMatchObject({ session: { status: 'running' }, round: { timing: { status: 'open' } } });
    }, 60_000);

    it('extra arguments, deep nesting and long strings under the size limit get error acks', async () => {
      await fc.assert(
        fc.asyncProperty(fc.jsonValue(), fc.jsonValue(), async (a, b) => {
          expect(isErrorAck(await send(await offenderSocket(), 'answer:submit', a, b))).toBe(true);
        }),
        FC,
      );
      await fc.assert(
        fc.asyncProperty(fc.integer({ min: 50, max: 2000 }), fc.boolean(), async (depth, asArray) => {
          let v: unknown = { type: 'single', optionId };
          for (let i = 0; i < depth; i++) v = asArray ? [v] : { response: v };
          expect(isErrorAck(await send(await offenderSocket(), 'answer:submit', { clientMessageId: 'deep', roundIndex: 0, response: v }))).toBe(true);
        }),
        { ...FC, numRuns: 20 },
      );
      const long = 'x'.repeat(15_000); // under maxHttpBufferSize (16 KiB) with the envelope
      expect(await send(await offenderSocket(), 'answer:submit', { clientMessageId: long, roundIndex: 0, response: { type: 'single', optionId } })).toMatchObject({
        ok: false,
        error: 'invalid_payload',
      });
      expect(await send(await offenderSocket(), 'answer:submit', { clientMessageId: 'long-text', roundIndex: 0, response: { type: 'text', text: long } })).toMatchObject({
        ok: false,
        error: 'invalid_payload',
      });
      expect(await storedFor(offenderId)).toBe(0);
    }, 60_000);

    it('unknown events are ignored and the socket keeps working', async () => {
      await fc.assert(
        fc.asyncProperty(fc.string({ minLength: 1, maxLength: 40 }).filter((e) => !RESERVED.has(e)), anyPayload, async (event, payload) => {
          const socket = await offenderSocket();
          socket.emit(event, payload);
          expect(await send(socket, 'clock:sync', { t0: 1 })).toMatchObject({ ok: true, t0: 1 });
        }),
        FC,
      );
    }, 60_000);

    it('a message over maxHttpBufferSize (16 KiB) is refused by the transport: the socket is disconnected', async () => {
      const socket = await offenderSocket();
      const closed = new Promise<string>((resolve) => socket.once('disconnect', resolve));
      socket.emit('answer:submit', { clientMessageId: 'big', roundIndex: 0, response: { type: 'text', text: 'y'.repeat(20_000) } });
      // engine.io closes the WebSocket with 1009 "message too big" (ws maxPayload): a transport close.
      expect(await closed).toMatch(/transport (close|error)/);
      expect(await storedFor(offenderId)).toBe(0);
    });
  });

  describe('floods (the default 20 messages per second per socket)', () => {
    beforeAll(async () => {
      live = await createLiveApp();
      await freshSession(live);
    }, 30_000);
    afterAll(async () => {
      closeAll(open.splice(0));
      await live.close();
    });

    it('200 answers at once: all acked (the excess as rate_limited), one stored, and a classmate still answers', async () => {
      const socket = await offenderSocket();
      const answer = (i: number) => ({ clientMessageId: `flood-${i}`, roundIndex: 0, response: { type: 'single', optionId } });
      const acks = await Promise.all(Array.from({ length: 200 }, (_, i) => send(socket, 'answer:submit', answer(i))));
      const accepted = acks.filter((a) => a?.ok === true);
      expect(accepted).toHaveLength(1);
      expect(acks.filter((a) => a?.error === 'rate_limited').length).toBeGreaterThanOrEqual(200 - 2 * 20);
      expect(acks.every((a) => a?.ok === true || isErrorAck(a))).toBe(true);
      expect(await storedFor(offenderId)).toBe(1);
      const mine = await good.socket.timeout(ACK_MS).emitWithAck('answer:submit', { clientMessageId: 'good-1', roundIndex: 0, response: { type: 'single', optionId } });
      expect(mine).toMatchObject({ ok: true, duplicate: false });
      await request(live.app.getHttpServer()).get('/api/health').expect(200);
    });
  });
});
