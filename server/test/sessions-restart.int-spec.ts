import request from 'supertest';
import { LiveSessionsService } from '../src/sessions/live/live-sessions.service';
import { itemInputs, makeBankWithItems, makeSchool, makeUser, sessionRequest, signedIn } from './helpers/factories';
import { closeAll, connectHost, connectPlayer, createLiveApp, emitAck, signInCookie, waitFor, type LiveApp, type TestSocket } from './helpers/sockets';
import { FakeClock, resetDatabase } from './helpers/test-app';

/**
 * A server stopped mid-round (no session ended, no final snapshot: what a crash
 * leaves) and a new app on the same database. Points by DESIGN.md §4.
 */
describe(`${LiveSessionsService.name} restore after a restart (integration)`, () => {
  const clock = new FakeClock();
  const sockets: TestSocket[] = [];
  let first: LiveApp | null = null;
  let second: LiveApp | null = null;

  afterAll(async () => {
    closeAll(sockets);
    await first?.close().catch(() => undefined);
    await second?.close();
  });

  it('resumes: every acknowledged answer still counts after the reveal, players rejoin with their tokens', async () => {
    const tuning = { snapshotEveryMs: 3_600_000, restoreGraceMs: 3_600_000 };
    first = await createLiveApp({ clock, tuning });
    await resetDatabase(first.db);
    const school = await makeSchool(first.db);
    const teacher = await makeUser(first.db, school);
    const agent = await signedIn(first.app.getHttpServer(), teacher);
    const { bankId, items } = await makeBankWithItems(agent, [itemInputs.single(), itemInputs.truefalse()]);
    const session = (await agent.post('/api/sessions').send(sessionRequest(bankId, { teamCount: 2 })).expect(201)).body;
    const players: { playerId: string; token: string; ts: TestSocket }[] = [];
    for (const nickname of ['Ana', 'Ben', 'Cai', 'Dee']) {
      const res = await request(first.app.getHttpServer()).post('/api/play/join').send({ code: session.joinCode, nickname }).expect(201);
      const ts = await connectPlayer(first, res.body.playerToken);
      sockets.push(ts);
      players.push({ playerId: res.body.playerId, token: res.body.playerToken, ts });
    }
    const cookie = await signInCookie(first, teacher);
    const host1 = await connectHost(first, cookie, session.id);
    sockets.push(host1);
    const started = await emitAck(host1.socket, 'host:command', { type: 'start' });
    const teams: { id: string; members: { playerId: string }[] }[] = started.view.teams;
    const tokenOf = new Map(players.map((p) => [p.playerId, p]));
    const [a1, a2] = teams[0].members.map((m) => tokenOf.get(m.playerId)!);
    const [b1, b2] = teams[1].members.map((m) => tokenOf.get(m.playerId)!);
    await emitAck(host1.socket, 'host:command', { type: 'open_round' });

    const right = { type: 'single', optionId: items[0].key.correctOptionId };
    const wrong = { type: 'single', optionId: items[0].options.find((o) => o.id !== items[0].key.correctOptionId)!.id };
    const vote = (ts: TestSocket, id: string, response: object) => emitAck(ts.socket, 'answer:submit', { clientMessageId: id, roundIndex: 0, response, lock: true });
    expect(await vote(a1.ts, 'a1-vote', right)).toMatchObject({ ok: true, duplicate: false }); // t = 0 s
    clock.advance(6_000);
    expect(await vote(a2.ts, 'a2-vote', right)).toMatchObject({ ok: true }); // t = 6 s
    expect(await vote(b1.ts, 'b1-vote', wrong)).toMatchObject({ ok: true }); // t = 6 s

    // The three answers are only in their rows, not in the stored snapshot: restore must replay them.
    expect(await first.db.query('SELECT snapshot_seq::int AS s, status FROM sessions')).toEqual([{ s: 0, status: 'running' }]);
    expect(await first.db.query('SELECT count(*)::int AS n FROM responses')).toEqual([{ n: 3 }]);
    closeAll(sockets.splice(0));
    await first.close();
    first = null;

    second = await createLiveApp({ clock, tuning });
    const back = new Map<string, TestSocket>();
    for (const p of [a1, a2, b1, b2]) {
      const ts = await connectPlayer(second, p.token);
      sockets.push(ts);
      back.set(p.playerId, ts);
    }
    const a2View = await waitFor(back.get(a2.playerId)!, 'session:state');
    expect(a2View).toMatchObject({
      status: 'running',
      you: { playerId: a2.playerId, teamId: teams[0].id },
      team: { id: teams[0].id },
      round: { timing: { status: 'open', deadlineAt: clock.now() - 6_000 + 30_000 }, yourAnswer: { response: right, locked: true } },
    });
    // A resend across the restart is still the same answer.
    expect(await vote(back.get(a1.playerId)!, 'a1-vote', right)).toMatchObject({ ok: true, duplicate: true });
    clock.advance(6_000);
    expect(await vote(back.get(b2.playerId)!, 'b2-vote', right)).toMatchObject({ ok: true, duplicate: false }); // t = 12 s: all locked, round closes

    const host2 = await connectHost(second, cookie, session.id);
    sockets.push(host2);
    const revealed = await emitAck(host2.socket, 'host:command', { type: 'reveal' });
    expect(revealed).toMatchObject({ ok: true });
    // a1: 1000; a2: t=6 of 30 → round(1000·(1 − 0.5·0.2)) = 900; mean 950 × 1.1 unity = 1045.
    // b1: wrong → 0; b2: t=12 → round(1000·(1 − 0.5·0.4)) = 800; mean 400.
    expect(revealed.view.standings.map((r: { teamId: string; points: number }) => [r.teamId, r.points])).toEqual([
      [teams[0].id, 1045],
      [teams[1].id, 400],
    ]);
    const reveal = await waitFor(back.get(a2.playerId)!, 'round:revealed');
    expect(reveal).toMatchObject({ you: { answered: true, correct: true, points: 900 }, team: { points: 1045, unity: true } });
    const rows: { player_id: string; points: number }[] = await second.db.query('SELECT player_id, points FROM responses WHERE final ORDER BY seq');
    expect(rows).toEqual([
      { player_id: a1.playerId, points: 1000 },
      { player_id: a2.playerId, points: 900 },
      { player_id: b1.playerId, points: 0 },
      { player_id: b2.playerId, points: 800 },
    ]);
    expect(await emitAck(host2.socket, 'host:command', { type: 'next' })).toMatchObject({ ok: true });
    expect(await emitAck(host2.socket, 'host:command', { type: 'end' })).toMatchObject({ ok: true, view: { session: { status: 'ended' } } });
    expect(await second.db.query('SELECT status FROM sessions')).toEqual([{ status: 'ended' }]);
  });
});
