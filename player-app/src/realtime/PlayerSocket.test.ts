import { beforeEach, describe, expect, it } from 'vitest';
import { useConnectionStore } from '@/stores/useConnectionStore';
import { useGameStore } from '@/stores/useGameStore';
import { useSessionStore } from '@/stores/useSessionStore';
import { connectedFake, FakeSocket, flush, TIME_OUT } from '@/test/fakeSocket';
import { ME, reveal, round, sessionView, singleItem, timing } from '@/test/factories';
import { PLAYER_TOKEN_KEY } from './playerTokenStorage';
import { PlayerSocket, TIMED_OUT } from './PlayerSocket';

const game = () => useGameStore.getState();
const connection = () => useConnectionStore.getState();

beforeEach(() => {
  game().reset();
  connection().reset();
  useSessionStore.getState().reset();
});

describe(PlayerSocket.name, () => {
  it('hands the token and protocol version to the socket factory', async () => {
    const fake = new FakeSocket();
    const auths: unknown[] = [];
    const socket = new PlayerSocket({
      createSocket: async (auth) => {
        auths.push(auth);
        return fake.asTransport();
      },
    });
    await socket.connect('tok-9');
    expect(auths).toEqual([{ token: 'tok-9', protocolVersion: 1 }]);
    expect(fake.connectCalls).toBe(1);
    expect(connection().status).toBe('connecting');
  });

  it('writes session:state into the game store', async () => {
    const { fake } = await connectedFake();
    fake.serverEmit('session:state', sessionView({ status: 'running', round: round() }));
    expect(game()).toMatchObject({
      loaded: true,
      status: 'running',
      you: { playerId: ME, nickname: 'Sam' },
      team: { name: 'Argon' },
      round: { item: { prompt: singleItem().prompt } },
    });
  });

  it('replaces the round on round:opened and drops messages about other rounds', async () => {
    const { fake } = await connectedFake();
    fake.serverEmit('session:state', sessionView({ status: 'running', format: 'huddle' }));
    fake.serverEmit('round:opened', {
      roundIndex: 3,
      itemCount: 10,
      item: singleItem(),
      timing: timing({ roundIndex: 3 }),
      calledPlayerId: null,
    });
    expect(game().round?.timing.roundIndex).toBe(3);

    const votes = [{ playerId: 'p-ada', response: { type: 'single', optionId: 'o-face' }, locked: false }];
    fake.serverEmit('round:votes', { roundIndex: 2, teamId: 't-argon', votes }); // stale round
    expect(game().round?.votes).toEqual([]);
    fake.serverEmit('round:votes', { roundIndex: 3, teamId: 't-other', votes }); // other team
    expect(game().round?.votes).toEqual([]);
    fake.serverEmit('round:votes', { roundIndex: 3, teamId: 't-argon', votes });
    expect(game().round?.votes).toEqual(votes);
  });

  it('writes round:revealed into the round and counts it once in the summary', async () => {
    const { fake } = await connectedFake();
    fake.serverEmit('session:state', sessionView({ status: 'running', round: round() }));
    const result = reveal({
      you: { answered: true, response: { type: 'single', optionId: 'o-face' }, credit: 1, correct: true, points: 850 },
    });
    fake.serverEmit('round:revealed', result);
    fake.serverEmit('round:revealed', result); // a repeat must not count twice
    expect(game().round?.reveal).toEqual(result);
    expect(game().round?.timing.status).toBe('revealed');
    expect(game().summary).toMatchObject({ answered: 1, correct: 1, points: 850 });
  });

  it('writes timing, calls, standings and status', async () => {
    const { fake } = await connectedFake();
    fake.serverEmit('session:state', sessionView({ status: 'running', round: round() }));
    fake.serverEmit('round:timing', timing({ paused: true, deadlineAt: 1_000_020_000 }));
    fake.serverEmit('round:call', { roundIndex: 0, calledPlayerId: 'p-ada' });
    fake.serverEmit('standings:update', { own: { rank: 2, points: 900, teamCount: 6 }, standings: [] });
    fake.serverEmit('session:status', { status: 'paused' });
    expect(game().round?.timing).toMatchObject({ paused: true, deadlineAt: 1_000_020_000 });
    expect(game().round?.calledPlayerId).toBe('p-ada');
    expect(game().ownStanding).toEqual({ rank: 2, points: 900, teamCount: 6 });
    expect(game().status).toBe('paused');
  });

  it('sends answer:submit with the option id and a fresh clientMessageId per answer', async () => {
    const { fake, socket } = await connectedFake();
    fake.serverEmit('session:state', sessionView({ status: 'running', round: round() }));
    const ok = { ok: true, duplicate: false, locked: true, acceptedAt: 1 };
    fake.respond('answer:submit', ok, ok);

    await socket.submitAnswer(0, { type: 'single', optionId: 'o-face' });
    await socket.submitAnswer(0, { type: 'single', optionId: 'o-bag' });

    const [first, second] = fake.commands('answer:submit');
    expect(first).toEqual({ clientMessageId: 'm-1', roundIndex: 0, response: { type: 'single', optionId: 'o-face' } });
    expect(second).toMatchObject({ clientMessageId: 'm-2' });
    expect(fake.emitted.find((e) => e.event === 'answer:submit')?.timeoutMs).toBe(5000);
    expect(game().round?.yourAnswer).toEqual({ response: { type: 'single', optionId: 'o-bag' }, locked: true });
  });

  it('retries once after a timeout with the same clientMessageId', async () => {
    const { fake, socket } = await connectedFake();
    fake.respond('answer:submit', TIME_OUT, { ok: true, duplicate: true, locked: true, acceptedAt: 1 });

    const ack = await socket.submitAnswer(0, { type: 'single', optionId: 'o-face' });

    const sends = fake.commands('answer:submit') as { clientMessageId: string }[];
    expect(sends).toHaveLength(2);
    expect(sends[1]?.clientMessageId).toBe(sends[0]?.clientMessageId);
    expect(ack).toMatchObject({ ok: true, duplicate: true });
  });

  it('reports a double timeout and reuses the id when the player sends the same answer again', async () => {
    const { fake, socket } = await connectedFake();
    fake.respond('answer:submit', TIME_OUT, TIME_OUT, { ok: true, duplicate: true, locked: true, acceptedAt: 1 });
    const response = { type: 'single', optionId: 'o-face' } as const;

    expect(await socket.submitAnswer(0, response)).toBe(TIMED_OUT);
    await socket.submitAnswer(0, response);

    const ids = (fake.commands('answer:submit') as { clientMessageId: string }[]).map((p) => p.clientMessageId);
    expect(ids).toEqual(['m-1', 'm-1', 'm-1']);
  });

  it("passes the server's refusal through", async () => {
    const { fake, socket } = await connectedFake();
    const tooLate = { ok: false, error: 'too_late', message: "Time was up — your answer didn't count this round." };
    fake.respond('answer:submit', tooLate);
    expect(await socket.submitAnswer(0, { type: 'truefalse', value: true })).toEqual(tooLate);
    expect(fake.commands('answer:submit')).toHaveLength(1);
  });

  it('keeps the clock offset of the lowest round-trip sample of five', async () => {
    // Each sample: the client clock advances by the round trip; the server is 5 s ahead,
    // but replies are skewed by queueing, so only the fastest sample gives 5000 exactly.
    let clientNow = 0;
    const fake = new FakeSocket();
    const trips = [300, 40, 500, 120, 90];
    const skew = [100, 0, 200, 30, -20];
    let i = 0;
    fake.respondAlways('clock:sync', (p) => {
      const { t0 } = p as { t0: number };
      const k = i++;
      const trip = trips[k] ?? 0;
      clientNow = t0 + trip;
      return { ok: true, t0, serverNow: t0 + trip / 2 + 5000 + (skew[k] ?? 0) };
    });
    const socket = new PlayerSocket({ createSocket: async () => fake.asTransport(), now: () => clientNow });
    await socket.connect('tok');
    fake.serverEmit('connect');
    await flush(40);

    expect(fake.commands('clock:sync')).toHaveLength(5);
    expect(connection().offsetMs).toBe(5000);
    expect(connection().offsetRoundTripMs).toBe(40);
  });

  it('shows reconnecting on a drop, then resyncs and re-measures the clock on reconnect', async () => {
    const { fake } = await connectedFake({ clockSamples: 1 });
    expect(connection().status).toBe('connected');
    fake.respond('session:resync', { ok: true, view: sessionView({ status: 'running' }) });

    fake.serverEmit('disconnect', 'transport close');
    expect(connection().status).toBe('reconnecting');

    fake.serverEmit('connect');
    await flush();
    expect(connection().status).toBe('connected');
    expect(fake.commands('session:resync')).toEqual([{}]);
    expect(fake.commands('clock:sync')).toHaveLength(2);
    expect(game().status).toBe('running');
  });

  it('does not resync on the first connect: the server pushes the state itself', async () => {
    const { fake } = await connectedFake();
    expect(fake.commands('session:resync')).toEqual([]);
  });

  it('clears the token and stops when the host removes the player', async () => {
    localStorage.setItem(PLAYER_TOKEN_KEY, 'tok-1');
    const { fake } = await connectedFake();
    fake.serverEmit('player:removed', { message: 'Your teacher removed you from this session.' });
    expect(game().removedMessage).toBe('Your teacher removed you from this session.');
    expect(localStorage.getItem(PLAYER_TOKEN_KEY)).toBeNull();
    expect(fake.disconnected).toBe(true);
    fake.serverEmit('disconnect', 'io server disconnect');
    expect(connection().status).toBe('idle');
  });

  it('gives up and clears the token when the handshake is refused', async () => {
    localStorage.setItem(PLAYER_TOKEN_KEY, 'tok-old');
    const { fake } = await connectedFake({ token: 'tok-old' });
    fake.active = false;
    fake.serverEmit('connect_error', Object.assign(new Error('refused'), { data: { message: 'That session has ended.' } }));
    expect(connection()).toMatchObject({ status: 'refused', refusedMessage: 'That session has ended.' });
    expect(localStorage.getItem(PLAYER_TOKEN_KEY)).toBeNull();
    expect(useSessionStore.getState().phase).toBe('notJoined');
  });

  it('keeps retrying through transient connect errors', async () => {
    const { fake } = await connectedFake();
    fake.serverEmit('connect_error', new Error('xhr poll error'));
    expect(connection().status).not.toBe('refused');
  });

  it('answers a command without a socket with a not-connected failure', async () => {
    const socket = new PlayerSocket({ createSocket: async () => new FakeSocket().asTransport() });
    await expect(socket.lockAnswer(0)).resolves.toMatchObject({ ok: false, error: 'not_connected' });
  });

  it('marks the answer locked after answer:lock', async () => {
    const { fake, socket } = await connectedFake();
    fake.serverEmit(
      'session:state',
      sessionView({
        status: 'running',
        format: 'huddle',
        round: round({ yourAnswer: { response: { type: 'single', optionId: 'o-face' }, locked: false } }),
      }),
    );
    fake.respond('answer:lock', { ok: true });
    await socket.lockAnswer(0);
    expect(fake.commands('answer:lock')).toEqual([{ roundIndex: 0 }]);
    expect(game().round?.yourAnswer?.locked).toBe(true);
  });
});
