import request from 'supertest';
import type { App } from 'supertest/types';
import { LiveSessionsService } from '../src/sessions/live/live-sessions.service';
import { itemInputs, makeBankWithItems, makeSchool, makeUser, sessionRequest, signedIn } from './helpers/factories';
import { closeAll, connectHost, connectPlayer, createLiveApp, emitAck, settle, signInCookie, waitFor, type LiveApp, type TestSocket } from './helpers/sockets';
import { resetDatabase } from './helpers/test-app';

/**
 * Points by DESIGN.md §4: points = round(1000 · c · (1 − w · t/T)); huddle team
 * points = mean of members' points (non-voters 0) × 1.1 when every member was correct.
 */
describe(`${LiveSessionsService.name} (integration: REST + sockets + PostgreSQL)`, () => {
  let live: LiveApp;
  let http: App;
  const open: TestSocket[] = [];

  beforeAll(async () => {
    live = await createLiveApp({ rateLimit: { failures: 5 } });
    http = live.app.getHttpServer();
  });
  afterAll(async () => {
    closeAll(open);
    await live.close();
  });
  beforeEach(async () => {
    closeAll(open.splice(0));
    live.limiter.reset();
    await resetDatabase(live.db);
  });

  async function teacherWithBank(inputs: object[] = [itemInputs.single()]) {
    const school = await makeSchool(live.db);
    const teacher = await makeUser(live.db, school);
    const agent = await signedIn(http, teacher);
    const bank = await makeBankWithItems(agent, inputs);
    return { school, teacher, agent, ...bank };
  }

  async function newSession(overrides: Record<string, unknown> = {}, inputs?: object[]) {
    const t = await teacherWithBank(inputs);
    const session = (await t.agent.post('/api/sessions').send(sessionRequest(t.bankId, overrides)).expect(201)).body;
    return { ...t, session };
  }

  const join = (code: string, nickname: string) => request(http).post('/api/play/join').send({ code, nickname });

  async function joinAndConnect(code: string, nickname: string): Promise<{ playerId: string; token: string; ts: TestSocket }> {
    const res = await join(code, nickname).expect(201);
    const ts = await connectPlayer(live, res.body.playerToken);
    open.push(ts);
    await waitFor(ts, 'session:state');
    return { playerId: res.body.playerId, token: res.body.playerToken, ts };
  }

  async function host(teacherCookieOf: { teacher: Parameters<typeof signInCookie>[1] }, sessionId: string): Promise<TestSocket> {
    const ts = await connectHost(live, await signInCookie(live, teacherCookieOf.teacher), sessionId);
    open.push(ts);
    await waitFor(ts, 'host:state');
    return ts;
  }

  const command = (ts: TestSocket, cmd: unknown) => emitAck(ts.socket, 'host:command', cmd);

  // ---------------------------------------------------------------- REST

  describe('setting up and joining', () => {
    it('creates a session with a 6-character code from the unambiguous alphabet and lists it', async () => {
      const { agent, session } = await newSession();
      expect(session).toMatchObject({ status: 'lobby', format: 'huddle', itemCount: 1, playerCount: 0, bankTitle: 'Lab entry & exit procedures' });
      expect(session.joinCode).toMatch(/^[ABCDEFGHJKMNPQRSTUVWXYZ23456789]{6}$/);
      expect((await agent.get('/api/sessions').expect(200)).body.map((s: { id: string }) => s.id)).toEqual([session.id]);
      expect((await agent.get(`/api/sessions/${session.id}`).expect(200)).body).toMatchObject({ id: session.id });
    });

    it("refuses a bank the teacher cannot see (404) and another teacher's session (404)", async () => {
      const { school, session, bankId } = await newSession();
      const other = await signedIn(http, await makeUser(live.db, school));
      await other.post('/api/sessions').send(sessionRequest(bankId)).expect(404);
      await other.get(`/api/sessions/${session.id}`).expect(404);
      await other.post('/api/sessions').send(sessionRequest(bankId, { roundSeconds: 1 })).expect(400);
    });

    it('joins by nickname; refuses an offensive nickname and a duplicate (case-insensitive)', async () => {
      const { session } = await newSession();
      const ok = await join(session.joinCode, '  Quiet Argon ').expect(201);
      expect(ok.body).toMatchObject({ ok: true, sessionId: session.id, playerId: expect.any(String), playerToken: expect.any(String) });
      const rude = await join(session.joinCode, 'fuckface').expect(400);
      expect(rude.body).toMatchObject({ ok: false, error: 'nickname_not_allowed', message: expect.stringMatching(/not allowed/) });
      const dupe = await join(session.joinCode, 'quiet argon').expect(409);
      expect(dupe.body).toMatchObject({ ok: false, error: 'nickname_taken' });
      await join(session.joinCode, 'x'.repeat(21)).expect(400);
      await join(session.joinCode, '   ').expect(400);
    });

    it('joins by roster pick for a class session, once per roster entry', async () => {
      const t = await teacherWithBank();
      const cls = (await t.agent.post('/api/classes').send({ name: 'Chemistry', period: '2' }).expect(201)).body;
      const entry = (await t.agent.post(`/api/classes/${cls.id}/roster`).send({ displayName: 'Mateo R.', tableGroup: '1' }).expect(201)).body;
      const session = (await t.agent.post('/api/sessions').send(sessionRequest(t.bankId, { classId: cls.id })).expect(201)).body;
      expect(session.className).toBe('Chemistry · period 2'); // the period tells two sections of one course apart
      const info = (await request(http).get(`/api/play/sessions/${session.joinCode.toLowerCase()}`).expect(200)).body;
      expect(info).toEqual({ ok: true, sessionTitle: 'Lab entry & exit procedures', roster: [{ id: entry.id, displayName: 'Mateo R.', taken: false }], joiningLocked: false });
      await request(http).post('/api/play/join').send({ code: session.joinCode, rosterEntryId: entry.id }).expect(201);
      const again = await request(http).post('/api/play/join').send({ code: session.joinCode, rosterEntryId: entry.id }).expect(409);
      expect(again.body.error).toBe('roster_entry_taken');
      expect((await request(http).get(`/api/play/sessions/${session.joinCode}`).expect(200)).body.roster[0].taken).toBe(true);
    });

    it('answers an unknown code with 404 unknown_code and a sentence', async () => {
      const res = await request(http).get('/api/play/sessions/ZZZZZZ').expect(404);
      expect(res.body).toEqual({ ok: false, error: 'unknown_code', message: expect.stringMatching(/code/) });
      await join('ZZZZZZ', 'Ana').expect(404);
    });

    it('rate-limits join-code guessing per address (5 failures in this suite, then 429 even for a good code)', async () => {
      const { session } = await newSession();
      for (let i = 0; i < 5; i++) await request(http).get(`/api/play/sessions/ZZZZZ${'ABCDE'[i]}`).expect(404);
      const blocked = await request(http).get(`/api/play/sessions/${session.joinCode}`).expect(429);
      expect(blocked.body).toMatchObject({ ok: false, error: 'rate_limited' });
    });

    it('refuses joining once locked (403) and after the end (410)', async () => {
      const t = await newSession();
      const h = await host(t, t.session.id);
      expect(await command(h, { type: 'lock_joining', locked: true })).toMatchObject({ ok: true, view: { joiningLocked: true } });
      expect((await join(t.session.joinCode, 'Late Neon').expect(403)).body.error).toBe('joining_locked');
      await command(h, { type: 'lock_joining', locked: false });
      await join(t.session.joinCode, 'Early Neon').expect(201);
      expect(await command(h, { type: 'end' })).toMatchObject({ ok: true });
      expect((await join(t.session.joinCode, 'Later Neon').expect(410)).body.error).toBe('session_ended');
    });
  });

  // ---------------------------------------------------------------- acks

  describe('acknowledgements', () => {
    it('answers malformed host commands with { ok: false } and keeps the connection', async () => {
      const t = await newSession();
      const h = await host(t, t.session.id);
      for (const bad of [{ type: 'launch_rockets' }, 'start', 42, null, { type: 'lock_joining', locked: 'yes' }, { type: 'start', extra: 1 }, { type: 'remove_player', playerId: 'me' }]) {
        const ack = await command(h, bad);
        expect(ack).toMatchObject({ ok: false, error: 'invalid_payload', message: expect.any(String) });
      }
      expect(await command(h, { type: 'open_round' })).toMatchObject({ ok: false, error: 'session_not_running' });
      expect(await command(h, { type: 'start' })).toMatchObject({ ok: false, error: 'no_players' });
      expect(h.socket.connected).toBe(true);
      expect(await emitAck(h.socket, 'session:resync', {})).toMatchObject({ ok: true, view: { session: { id: t.session.id } } });
      expect(await emitAck(h.socket, 'clock:sync', { t0: 5 })).toEqual({ ok: true, t0: 5, serverNow: live.clock.now() });
    });

    it('answers malformed player payloads with { ok: false }; a payload cannot name another player', async () => {
      const t = await newSession();
      const me = await joinAndConnect(t.session.joinCode, 'Ana');
      const other = await joinAndConnect(t.session.joinCode, 'Ben');
      const h = await host(t, t.session.id);
      await command(h, { type: 'start' });
      await command(h, { type: 'open_round' });
      const good = { clientMessageId: 'm1', roundIndex: 0, response: { type: 'single', optionId: t.items[0].options[1].id } };
      const bads = [
        {},
        'answer',
        { ...good, playerId: other.playerId },
        { ...good, clientMessageId: '' },
        { ...good, roundIndex: '0' },
        { ...good, response: { type: 'text', text: 'hi' } },
        { ...good, response: { type: 'single', optionId: 'not-an-option' } },
        { ...good, response: { type: 'single', optionId: t.items[0].options[1].id, sneaky: true } },
      ];
      for (const bad of bads) expect(await emitAck(me.ts.socket, 'answer:submit', bad)).toMatchObject({ ok: false, error: 'invalid_payload' });
      expect(await emitAck(me.ts.socket, 'answer:lock', { roundIndex: 'x' })).toMatchObject({ ok: false, error: 'invalid_payload' });
      expect(me.ts.socket.connected).toBe(true);
      expect(await emitAck(me.ts.socket, 'answer:submit', good)).toMatchObject({ ok: true, duplicate: false });
      const rows = await live.db.query('SELECT player_id FROM responses');
      expect(rows).toEqual([{ player_id: me.playerId }]);
    });

    it('drops a socket that sends more than the 16 KB buffer limit', async () => {
      const t = await newSession();
      const me = await joinAndConnect(t.session.joinCode, 'Ana');
      const gone = new Promise((resolve) => me.ts.socket.once('disconnect', resolve));
      me.ts.socket.emit('answer:submit', { clientMessageId: 'big', roundIndex: 0, response: { type: 'text', text: 'x'.repeat(20_000) } });
      await expect(gone).resolves.toBeDefined();
    });
  });

  // ---------------------------------------------------------------- a game

  describe('a huddle game over sockets', () => {
    it('runs start → open → votes (teammates only) → close → reveal → standings, with §4 points', async () => {
      const t = await newSession({ teamCount: 2 });
      const h = await host(t, t.session.id);
      const players = [];
      for (const name of ['Ana', 'Ben', 'Cai', 'Dee']) players.push(await joinAndConnect(t.session.joinCode, name));
      const started = await command(h, { type: 'start' });
      expect(started.ok).toBe(true);
      const teams: { id: string; members: { playerId: string }[] }[] = started.view.teams;
      expect(teams.map((x) => x.members.length)).toEqual([2, 2]);
      const byId = new Map(players.map((p) => [p.playerId, p]));
      const [a1, a2] = teams[0].members.map((m) => byId.get(m.playerId)!);
      const [b1, b2] = teams[1].members.map((m) => byId.get(m.playerId)!);
      const state = await waitFor(a1.ts, 'session:state', (v: any) => v.status === 'running');
      expect(state.team.id).toBe(teams[0].id);

      const item = t.items[0];
      const right = { type: 'single', optionId: item.key.correctOptionId };
      const wrong = { type: 'single', optionId: item.options.find((o) => o.id !== item.key.correctOptionId)!.id };
      expect(await command(h, { type: 'open_round' })).toMatchObject({ ok: true });
      const opened = await waitFor(b2.ts, 'round:opened');
      expect(opened).toMatchObject({ roundIndex: 0, itemCount: 1, item: { type: 'single', prompt: item.prompt }, timing: { deadlineAt: live.clock.now() + 30_000, limitMs: 30_000 } });

      const submit = (p: typeof a1, id: string, response: object, lock = true) => emitAck(p.ts.socket, 'answer:submit', { clientMessageId: id, roundIndex: 0, response, lock });
      expect(await submit(a1, 'a1-1', right)).toMatchObject({ ok: true, duplicate: false, locked: true }); // t = 0 s
      await waitFor(a2.ts, 'round:votes', (v: any) => v.votes.some((x: any) => x.playerId === a1.playerId));
      live.clock.advance(6_000);
      expect(await submit(a2, 'a2-1', right)).toMatchObject({ ok: true }); // t = 6 s
      expect(await submit(b1, 'b1-1', wrong)).toMatchObject({ ok: true }); // t = 6 s
      live.clock.advance(6_000);
      expect(await submit(b2, 'b2-1', right, false)).toMatchObject({ ok: true, locked: false }); // t = 12 s
      await settle();
      // Votes go to teammates only.
      const votesSeen = (p: typeof a1) => p.ts.log.filter((r) => r.event === 'round:votes').map((r) => (r.args[0] as { teamId: string }).teamId);
      for (const p of [a1, a2]) expect(new Set(votesSeen(p))).toEqual(new Set([teams[0].id]));
      for (const p of [b1, b2]) expect(new Set(votesSeen(p))).toEqual(new Set([teams[1].id]));

      expect(await command(h, { type: 'close_round' })).toMatchObject({ ok: true });
      await waitFor(a1.ts, 'round:closed');
      const revealed = await command(h, { type: 'reveal' });
      expect(revealed.view.round.reveal.key).toEqual(item.key);

      // a1: t=0 → 1000; a2: t=6 of 30 → round(1000·(1 − 0.5·0.2)) = 900; mean 950, unity ×1.1 → 1045.
      // b1: wrong → 0; b2: t=12 → round(1000·(1 − 0.5·0.4)) = 800; mean 400, no unity.
      // b's team answer: 1–1 tie, the wrong choice reached one vote first → team answer wrong.
      const revealB2 = await waitFor(b2.ts, 'round:revealed');
      expect(revealB2).toMatchObject({ roundIndex: 0, key: item.key, you: { answered: true, credit: 1, correct: true, points: 800 }, team: { points: 400, unity: false, correct: false } });
      const revealA1 = await waitFor(a1.ts, 'round:revealed');
      expect(revealA1).toMatchObject({ you: { points: 1000 }, team: { points: 1045, unity: true, correct: true } });
      const standings = await waitFor(a2.ts, 'standings:update');
      expect(standings.own).toEqual({ rank: 1, points: 1045, teamCount: 2 });
      expect(standings.standings.map((r: any) => [r.teamId, r.rank, r.points])).toEqual([
        [teams[0].id, 1, 1045],
        [teams[1].id, 2, 400],
      ]);
      const rows: { player_id: string; points: number; final: boolean }[] = await live.db.query('SELECT player_id, points, final FROM responses ORDER BY seq');
      expect(rows.map((r) => [r.player_id, r.points, r.final])).toEqual([
        [a1.playerId, 1000, true],
        [a2.playerId, 900, true],
        [b1.playerId, 0, true],
        [b2.playerId, 800, true],
      ]);

      // Nothing any player received before its round:revealed names the key or says who is right.
      for (const p of players) {
        const upTo = p.ts.log.findIndex((r) => r.event === 'round:revealed');
        expect(upTo).toBeGreaterThan(0);
        for (const r of p.ts.log.slice(0, upTo)) expect(leaks(r.args, [])).toEqual([]);
      }
    });

    it('numbered: a teammate of a called member who answered wrong reads "not right"; of one who did not answer, no verdict', async () => {
      const t = await newSession({ format: 'numbered', teamCount: 2 });
      const h = await host(t, t.session.id);
      const players: Awaited<ReturnType<typeof joinAndConnect>>[] = [];
      for (const name of ['Ana', 'Ben', 'Cai', 'Dee']) players.push(await joinAndConnect(t.session.joinCode, name));
      const started = await command(h, { type: 'start' });
      const teams: { id: string; members: { playerId: string }[] }[] = started.view.teams;
      const byId = new Map(players.map((p) => [p.playerId, p]));
      await command(h, { type: 'open_round' });
      const opened = await Promise.all(players.map((p) => waitFor(p.ts, 'round:opened')));
      const calledOf = (team: (typeof teams)[number]) => opened[players.findIndex((p) => p.playerId === team.members[0].playerId)].calledPlayerId as string;
      const [calledA, calledB] = teams.map(calledOf);
      const otherOf = (team: (typeof teams)[number], called: string) => byId.get(team.members.find((m) => m.playerId !== called)!.playerId)!;
      const item = t.items[0];
      const wrong = { type: 'single', optionId: item.options.find((o) => o.id !== item.key.correctOptionId)!.id };
      expect(await emitAck(byId.get(calledA)!.ts.socket, 'answer:submit', { clientMessageId: 'a-1', roundIndex: 0, response: wrong })).toMatchObject({ ok: true });
      // Team B's called member says nothing.
      await command(h, { type: 'close_round' });
      await command(h, { type: 'reveal' });
      const revealA = await waitFor(otherOf(teams[0], calledA).ts, 'round:revealed');
      const revealB = await waitFor(otherOf(teams[1], calledB).ts, 'round:revealed');
      expect(revealA).toMatchObject({ you: null, team: { answer: wrong, correct: false, points: 0 } });
      expect(revealB).toMatchObject({ you: null, team: { answer: null, correct: null, points: 0 } });
    });

    it('counts a resend with the same clientMessageId once (one row) and refuses a late answer with too_late', async () => {
      const t = await newSession({ format: 'solo' });
      const me = await joinAndConnect(t.session.joinCode, 'Ana');
      const late = await joinAndConnect(t.session.joinCode, 'Ben');
      const h = await host(t, t.session.id);
      await command(h, { type: 'start' });
      await command(h, { type: 'open_round' });
      const payload = { clientMessageId: 'same-id', roundIndex: 0, response: { type: 'single', optionId: t.items[0].options[0].id } };
      const first = await emitAck(me.ts.socket, 'answer:submit', payload);
      const second = await emitAck(me.ts.socket, 'answer:submit', payload);
      expect(first).toMatchObject({ ok: true, duplicate: false });
      expect(second).toEqual({ ok: true, duplicate: true, locked: first.locked, acceptedAt: first.acceptedAt });
      expect(await live.db.query('SELECT count(*)::int AS n FROM responses')).toEqual([{ n: 1 }]);

      live.clock.advance(30_001);
      const tooLate = await emitAck(late.ts.socket, 'answer:submit', { ...payload, clientMessageId: 'late-1' });
      expect(tooLate).toMatchObject({ ok: false, error: 'too_late', message: expect.any(String) });
      expect(await live.db.query('SELECT count(*)::int AS n FROM responses')).toEqual([{ n: 1 }]);
    });

    it('gives a player who drops and reconnects with the token their team and points back', async () => {
      const t = await newSession({ format: 'solo', teamCount: 1 });
      const me = await joinAndConnect(t.session.joinCode, 'Ana');
      const h = await host(t, t.session.id);
      const started = await command(h, { type: 'start' });
      const teamId = started.view.teams[0].id;
      await command(h, { type: 'open_round' });
      await emitAck(me.ts.socket, 'answer:submit', { clientMessageId: 'x1', roundIndex: 0, response: { type: 'single', optionId: t.items[0].key.correctOptionId } });
      await waitFor(me.ts, 'round:closed'); // everyone answered
      await command(h, { type: 'reveal' });
      me.ts.socket.close();
      await settle(100);
      const back = await connectPlayer(live, me.token);
      open.push(back);
      const view = await waitFor(back, 'session:state');
      expect(view.you).toEqual({ playerId: me.playerId, nickname: 'Ana', teamId, number: 1 });
      expect(view.team).toMatchObject({ id: teamId, members: [{ playerId: me.playerId, status: 'connected' }] });
      expect(view.round.reveal.you).toMatchObject({ points: 1000, correct: true });
      expect(view.summary).toEqual({ answered: 1, correct: 1, points: 1000, itemCount: 1 });
      expect(view.ownStanding).toEqual({ rank: 1, points: 1000, teamCount: 1 });
    });
    it('ended after one round of three, the phone counts one round played, not two missed', async () => {
      const t = await newSession({ format: 'solo', teamCount: 1 }, [itemInputs.single(), itemInputs.single(), itemInputs.single()]);
      const me = await joinAndConnect(t.session.joinCode, 'Ana');
      const h = await host(t, t.session.id);
      await command(h, { type: 'start' });
      await command(h, { type: 'open_round' });
      await emitAck(me.ts.socket, 'answer:submit', { clientMessageId: 'e1', roundIndex: 0, response: { type: 'single', optionId: t.items[0].key.correctOptionId } });
      await waitFor(me.ts, 'round:closed');
      await command(h, { type: 'reveal' });
      expect(await command(h, { type: 'end' })).toMatchObject({ ok: true });
      const ended = await emitAck(me.ts.socket, 'session:resync', {});
      expect(ended.view).toMatchObject({ status: 'ended', summary: { answered: 1, correct: 1, points: 1000, itemCount: 1 } });
    });

    it('places a late joiner on the smallest team; they play from the next round', async () => {
      const t = await newSession({ format: 'solo', teamCount: 2 }, [itemInputs.single(), itemInputs.truefalse()]);
      for (const name of ['Ana', 'Ben', 'Cai']) await joinAndConnect(t.session.joinCode, name);
      const h = await host(t, t.session.id);
      const started = await command(h, { type: 'start' });
      const smaller = started.view.teams.find((x: { members: unknown[] }) => x.members.length === 1);
      await command(h, { type: 'open_round' });
      const late = await joinAndConnect(t.session.joinCode, 'Late Xenon');
      const view = await waitFor(late.ts, 'session:state', (v: any) => v.you.teamId !== null);
      expect(view.you).toMatchObject({ teamId: smaller.id, number: 2 });
      const ack = await emitAck(late.ts.socket, 'answer:submit', { clientMessageId: 'l1', roundIndex: 0, response: { type: 'single', optionId: t.items[0].options[0].id } });
      expect(ack).toMatchObject({ ok: false, error: 'round_not_open' });
      await command(h, { type: 'close_round' });
      await command(h, { type: 'reveal' });
      await command(h, { type: 'next' });
      await command(h, { type: 'open_round' });
      await waitFor(late.ts, 'round:opened', (o: any) => o.roundIndex === 1);
      expect(await emitAck(late.ts.socket, 'answer:submit', { clientMessageId: 'l2', roundIndex: 1, response: { type: 'truefalse', value: false } })).toMatchObject({ ok: true });
    });
  });

  // ---------------------------------------------------------------- who may do what

  describe('roles on the sockets', () => {
    it('refuses the host namespace without the teacher cookie, with another teacher, and with a stale protocol', async () => {
      const t = await newSession();
      await expect(connectHost(live, null, t.session.id)).rejects.toMatchObject({ data: { error: 'unauthenticated' } });
      const stranger = await makeUser(live.db, t.school);
      await expect(connectHost(live, await signInCookie(live, stranger), t.session.id)).rejects.toMatchObject({ data: { error: 'forbidden' } });
      await expect(connectHost(live, await signInCookie(live, t.teacher), t.session.id, 0)).rejects.toMatchObject({ data: { error: 'protocol_mismatch' } });
      const res = await join(t.session.joinCode, 'Ana').expect(201);
      // A player's token is no teacher cookie.
      await expect(connectHost(live, `covalent_sid=${res.body.playerToken}`, t.session.id)).rejects.toMatchObject({ data: { error: 'unauthenticated' } });
    });

    it("refuses a forged token (another session's id re-signed by nobody) and a removed player's token", async () => {
      const a = await newSession();
      const b = await newSession();
      const me = await joinAndConnect(a.session.joinCode, 'Ana');
      const [, playerId, version, sig] = me.token.split('.');
      await expect(connectPlayer(live, [b.session.id, playerId, version, sig].join('.'))).rejects.toMatchObject({ data: { error: 'invalid_token' } });
      await expect(connectPlayer(live, 'not-a-token')).rejects.toMatchObject({ data: { error: 'invalid_token' } });

      const h = await host(a, a.session.id);
      const removedNotice = waitFor(me.ts, 'player:removed');
      expect(await command(h, { type: 'remove_player', playerId: me.playerId })).toMatchObject({ ok: true });
      await removedNotice;
      await expect(connectPlayer(live, me.token)).rejects.toMatchObject({ data: { error: 'removed' } });
    });
  });
});

/** Paths of anything that would tell a player what is right: key fields, credit, correctness. */
function leaks(value: unknown, path: string[]): string[] {
  if (Array.isArray(value)) return value.flatMap((v, i) => leaks(v, [...path, String(i)]));
  if (typeof value !== 'object' || value === null) return [];
  const found: string[] = [];
  for (const [k, v] of Object.entries(value)) {
    const here = [...path, k];
    const where = here.join('.');
    // summary.correct counts revealed rounds only (0 before the first reveal); standings' correctAnswers likewise.
    const allowed = (k === 'correct' && path[path.length - 1] === 'summary') || k === 'correctAnswers';
    if (!allowed && ['key', 'credit', 'correct', 'correctOptionId', 'correctOptionIds', 'accepted', 'explanation', 'reveal'].includes(k)) {
      if (!(k === 'reveal' && v === null)) found.push(where);
    }
    found.push(...leaks(v, here));
  }
  return found;
}
