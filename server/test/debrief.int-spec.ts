import { parse } from 'csv-parse/sync';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import type { App } from 'supertest/types';
import { variance } from 'simple-statistics';
import { DebriefService } from '../src/debrief/debrief.service';
import { analyseSession, type DebriefInput } from '../src/debrief/domain';
import { itemInputs, makeBankWithItems, makeSchool, makeUser, sessionRequest, signedIn } from './helpers/factories';
import { closeAll, connectHost, connectPlayer, emitAck, signInCookie, waitFor, type LiveApp, type TestSocket } from './helpers/sockets';
import { createTestApp, resetDatabase, type TestContext } from './helpers/test-app';

type Agent = Awaited<ReturnType<typeof signedIn>>;
const csvRows = (text: string) => parse(text.replace(/^\uFEFF/, ''), { columns: true }) as Record<string, string>[];

/**
 * One class session played over real sockets (solo, 3 items) and read back through the debrief
 * routes. Credits by DESIGN.md §5: single and true/false 1 or 0; multi (correct − wrong picks) / number correct, floored at 0.
 */
describe(`${DebriefService.name} (integration: sockets + REST + PostgreSQL + SMTP)`, () => {
  let ctx: TestContext;
  let live: LiveApp;
  let http: App;
  const open: TestSocket[] = [];

  beforeAll(async () => {
    ctx = await createTestApp();
    await ctx.app.listen(0, '127.0.0.1');
    http = ctx.app.getHttpServer();
    const port = (http as unknown as { address(): AddressInfo }).address().port;
    live = { app: ctx.app, db: ctx.db, url: `http://127.0.0.1:${port}` } as LiveApp;
  });
  afterAll(async () => {
    closeAll(open);
    await ctx.close();
  });
  beforeEach(async () => {
    closeAll(open.splice(0));
    await resetDatabase(ctx.db);
  });

  const STUDENTS = ['Ana P.', 'Ben Q.', 'Cai R.', 'Dee S.'] as const;

  /** Owner, co-teacher, school admin and an unrelated teacher; a class with a roster; an ended, played session. */
  async function playedSession() {
    const school = await makeSchool(ctx.db);
    const [teacher, coTeacher, stranger] = [await makeUser(ctx.db, school), await makeUser(ctx.db, school), await makeUser(ctx.db, school)];
    const admin = await makeUser(ctx.db, school, 'admin');
    const agent = await signedIn(http, teacher);
    const { bankId, items } = await makeBankWithItems(agent, [itemInputs.single(), itemInputs.truefalse(), itemInputs.multi()]);
    const cls = (await agent.post('/api/classes').send({ name: 'Chemistry', period: '2' }).expect(201)).body;
    await agent.post(`/api/classes/${cls.id}/co-teachers`).send({ email: coTeacher.email }).expect(200);
    const entries: { id: string; displayName: string }[] = [];
    for (const displayName of STUDENTS) entries.push((await agent.post(`/api/classes/${cls.id}/roster`).send({ displayName }).expect(201)).body);
    const session = (await agent.post('/api/sessions').send(sessionRequest(bankId, { classId: cls.id, format: 'solo', teamCount: 2 })).expect(201)).body;

    const [single, tf, multi] = items;
    const wrongSingle = single.options.find((o) => o.id !== single.key.correctOptionId)!.id;
    const [m0, m1, m2] = multi.options.map((o) => o.id); // key: m0 and m2
    // Per student, the response to each item (null: no answer).
    const plan: Record<(typeof STUDENTS)[number], (object | null)[]> = {
      'Ana P.': [{ type: 'single', optionId: single.key.correctOptionId }, { type: 'truefalse', value: false }, { type: 'multi', optionIds: [m0, m2] }],
      'Ben Q.': [{ type: 'single', optionId: single.key.correctOptionId }, { type: 'truefalse', value: true }, { type: 'multi', optionIds: [m0] }],
      'Cai R.': [{ type: 'single', optionId: wrongSingle }, { type: 'truefalse', value: true }, { type: 'multi', optionIds: [m0, m1] }],
      'Dee S.': [{ type: 'single', optionId: wrongSingle }, { type: 'truefalse', value: false }, null],
    };
    // Expected credits, by hand from DESIGN.md §5 (truefalse key is false; multi key {m0, m2}).
    const credits: Record<(typeof STUDENTS)[number], number[]> = {
      'Ana P.': [1, 1, 1],
      'Ben Q.': [1, 0, 0.5],
      'Cai R.': [0, 0, 0],
      'Dee S.': [0, 1, 0],
    };

    const host = await connectHost(live, await signInCookie(live, teacher), session.id);
    open.push(host);
    await waitFor(host, 'host:state');
    const players: { name: (typeof STUDENTS)[number]; playerId: string; ts: TestSocket }[] = [];
    for (const [i, name] of STUDENTS.entries()) {
      const res = await request(http).post('/api/play/join').send({ code: session.joinCode, rosterEntryId: entries[i].id }).expect(201);
      const ts = await connectPlayer(live, res.body.playerToken);
      open.push(ts);
      await waitFor(ts, 'session:state');
      players.push({ name, playerId: res.body.playerId, ts });
    }
    const command = (cmd: object) => emitAck(host.socket, 'host:command', cmd);
    expect(await command({ type: 'start' })).toMatchObject({ ok: true });
    for (let round = 0; round < items.length; round++) {
      if (round > 0) expect(await command({ type: 'next' })).toMatchObject({ ok: true });
      expect(await command({ type: 'open_round' })).toMatchObject({ ok: true });
      for (const p of players) {
        await waitFor(p.ts, 'round:opened', (o: { roundIndex: number }) => o.roundIndex === round);
        const response = plan[p.name][round];
        if (response) expect(await emitAck(p.ts.socket, "answer:submit", { clientMessageId: `m-${p.playerId}-${round}`, roundIndex: round, response })).toMatchObject({ ok: true });
      }
      await command({ type: 'close_round' }); // already closed when everyone answered
      expect(await command({ type: 'reveal' })).toMatchObject({ ok: true });
    }
    expect(await command({ type: 'end' })).toMatchObject({ ok: true });

    const ids = new Map(players.map((p) => [p.name, p.playerId]));
    /** The same matrix, written out by hand, for analyseSession. */
    const expectedInput = (removed: string[] = []): DebriefInput => ({
      items: [
        { id: single.id, optionIds: single.options.map((o) => o.id), correctOptionIds: [single.key.correctOptionId], dichotomous: true },
        { id: tf.id, optionIds: ['true', 'false'], correctOptionIds: ['false'], dichotomous: true },
        { id: multi.id, optionIds: [m0, m1, m2], correctOptionIds: [m0, m2], dichotomous: false },
      ],
      examinees: STUDENTS.map((name) => ({ id: ids.get(name)!, ...(removed.includes(name) ? { removed: true } : {}) })),
      responses: STUDENTS.filter((name) => !removed.includes(name)).flatMap((name) =>
        plan[name].flatMap((r, i) => {
          if (!r) return [];
          const res = r as { type: string; optionId?: string; optionIds?: string[]; value?: boolean };
          const chosen = res.type === 'single' ? [res.optionId!] : res.type === 'multi' ? res.optionIds! : [String(res.value)];
          return [{ examineeId: ids.get(name)!, itemId: items[i].id, credit: credits[name][i], answered: true, chosenOptionIds: chosen }];
        }),
      ),
    });
    return { school, teacher, coTeacher, stranger, admin, agent, cls, entries, session, items, ids, credits, expectedInput };
  }

  it('gives a debrief whose figures equal analyseSession on the same matrix', async () => {
    const t = await playedSession();
    const d = (await t.agent.get(`/api/sessions/${t.session.id}/debrief`).expect(200)).body;
    const expected = analyseSession(t.expectedInput());
    expect(d).toMatchObject({ sessionId: t.session.id, className: 'Chemistry · period 2', format: 'solo', unit: 'player', playerCount: 4, removedCount: 0, itemCount: 3 });
    // p = mean credit (DESIGN.md §6), by hand: single 2/4, truefalse 2/4, multi 1.5/4.
    expect(d.items.map((i: { p: { value: number } }) => i.p.value)).toEqual([0.5, 0.5, 0.375]);
    expect(d.items.map((i: { p: unknown; D: unknown; pointBiserial: unknown }) => [i.p, i.D, i.pointBiserial])).toEqual(
      expected.items.map((i) => [i.difficulty, i.discrimination, i.pointBiserial]),
    );
    expect(d.items.map((i: { flags: string[] }) => i.flags)).toEqual(expected.items.map((i) => i.flags));
    // A multi item gives partial credit → Cronbach's alpha; checked against simple-statistics population variances.
    const rows = ['Ana P.', 'Ben Q.', 'Cai R.', 'Dee S.'].map((n) => t.credits[n as keyof typeof t.credits]);
    const itemVar = [0, 1, 2].reduce((s, j) => s + variance(rows.map((r) => r[j])), 0);
    const alpha = (3 / 2) * (1 - itemVar / variance(rows.map((r) => r[0] + r[1] + r[2])));
    expect(d.reliability).toMatchObject({ method: 'alpha', value: { value: expect.closeTo(alpha, 10) } });
    expect(d.reliability.value).toEqual(expected.reliability.coefficient);
    const ana = d.students.find((s: { rosterName: string }) => s.rosterName === 'Ana P.');
    expect(ana).toMatchObject({ score: 3, percent: { value: 100 }, answered: 3, missed: [], removed: false });
    const dee = d.students.find((s: { rosterName: string }) => s.rosterName === 'Dee S.');
    expect(dee.missed.map((m: { itemId: string; answered: boolean; answerText: string }) => [m.itemId, m.answered, m.answerText])).toEqual([
      [t.items[0].id, true, expect.stringMatching(/^[AC]\. /)],
      [t.items[2].id, false, ''],
    ]);
    expect(dee.missed[0].keyText).toBe('B. Volumetric pipette');
    expect(d.teams).toHaveLength(2);

    const item = (await t.agent.get(`/api/sessions/${t.session.id}/debrief/items/${t.items[1].id}`).expect(200)).body;
    expect(item.distractors.value.rows.map((r: { letter: string; text: string; isKey: boolean; overall: number }) => [r.letter, r.text, r.isKey, r.overall])).toEqual([
      ['A', 'True', false, 0.5],
      ['B', 'False', true, 0.5],
    ]);

    const list = (await t.agent.get('/api/debriefs').expect(200)).body;
    expect(list).toEqual([expect.objectContaining({ sessionId: t.session.id, classAccuracy: { value: expect.closeTo(5.5 / 12, 10), reason: null } })]);
    expect(list[0].items).toBeUndefined();

    const trends = (await t.agent.get(`/api/classes/${t.cls.id}/trends`).expect(200)).body;
    expect(trends.tags).toEqual([
      { tag: 'glassware', points: [expect.objectContaining({ sessionId: t.session.id, accuracy: { value: 0.5, reason: null } })] },
      { tag: 'ppe', points: [expect.objectContaining({ accuracy: { value: 0.375, reason: null } })] },
    ]);
  });

  it('exports a gradebook CSV (BOM, attachment) whose rows match the debrief, and an item-analysis CSV', async () => {
    const t = await playedSession();
    const res = await t.agent.get(`/api/sessions/${t.session.id}/exports/gradebook.csv`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    }).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="lab-entry-exit-procedures-\d{4}-\d{2}-\d{2}-gradebook\.csv"$/);
    const bytes = res.body as Buffer;
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]); // UTF-8 BOM
    const rows = csvRows(bytes.toString('utf8'));
    expect(rows.map((r) => [r.student, r.score, r.percent, r.items_answered])).toEqual([
      ['Ana P.', '3.00', '100.0', '3'],
      ['Ben Q.', '1.50', '50.0', '3'],
      ['Cai R.', '0.00', '0.0', '3'],
      ['Dee S.', '1.00', '33.3', '2'],
    ]);
    const analysis = await t.agent.get(`/api/sessions/${t.session.id}/exports/item-analysis.csv`).expect(200);
    expect(analysis.headers['content-disposition']).toMatch(/^attachment; filename=".*-item-analysis\.csv"$/);
    const items = csvRows(analysis.text);
    expect(items.map((r) => [r.position, r.p, r.key])).toEqual([
      ['1', '0.500', 'B'],
      ['2', '0.500', 'B'],
      ['3', '0.375', 'A; C'],
    ]);
  });

  it('e-mails the debrief to the teacher and co-teachers with the gradebook CSV attached', async () => {
    const t = await playedSession();
    const sent = (await t.agent.post(`/api/sessions/${t.session.id}/debrief/email`).expect(200)).body;
    expect(new Set(sent.recipients)).toEqual(new Set([t.teacher.email, t.coTeacher.email]));
    const mail = await ctx.mail.waitFor((m) => m.subject.startsWith('Debrief: Lab entry & exit procedures'));
    expect(new Set(mail.to)).toEqual(new Set([t.teacher.email, t.coTeacher.email]));
    expect(mail.html).toContain('<h2>Items to revisit</h2>');
    expect(mail.html).toContain('Which glassware delivers 10.0 mL most precisely?');
    expect(mail.html).not.toContain('Ana P.'); // names only in the attachment
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0]).toMatchObject({ filename: expect.stringMatching(/-gradebook\.csv$/), contentType: 'text/csv' });
    expect(csvRows(mail.attachments[0].content).map((r) => [r.student, r.percent])).toEqual([
      ['Ana P.', '100.0'],
      ['Ben Q.', '50.0'],
      ['Cai R.', '0.0'],
      ['Dee S.', '33.3'],
    ]);
  });

  it('answers 404 to a teacher without the class on every route, and lets the co-teacher and the admin read', async () => {
    const t = await playedSession();
    const stranger: Agent = await signedIn(http, t.stranger);
    const id = t.session.id;
    await stranger.get(`/api/sessions/${id}/debrief`).expect(404);
    await stranger.get(`/api/sessions/${id}/debrief/items/${t.items[0].id}`).expect(404);
    await stranger.get(`/api/sessions/${id}/exports/gradebook.csv`).expect(404);
    await stranger.get(`/api/sessions/${id}/exports/item-analysis.csv`).expect(404);
    await stranger.post(`/api/sessions/${id}/debrief/email`).expect(404);
    await stranger.get(`/api/classes/${t.cls.id}/trends`).expect(404);
    await stranger.delete(`/api/sessions/${id}/players/${t.ids.get('Ana P.')}/data`).expect(404);
    await stranger.delete(`/api/classes/${t.cls.id}/roster/${t.entries[0].id}/data`).expect(404);
    expect((await stranger.get('/api/debriefs').expect(200)).body).toEqual([]);
    const otherSchool = await signedIn(http, await makeUser(ctx.db, await makeSchool(ctx.db), 'admin'));
    await otherSchool.get(`/api/sessions/${id}/debrief`).expect(404);
    await request(http).get(`/api/sessions/${id}/debrief`).expect(401);

    for (const user of [t.coTeacher, t.admin]) {
      const a = await signedIn(http, user);
      expect((await a.get(`/api/sessions/${id}/debrief`).expect(200)).body.sessionId).toBe(id);
      await a.get(`/api/sessions/${id}/exports/gradebook.csv`).expect(200);
      await a.get(`/api/classes/${t.cls.id}/trends`).expect(200);
    }
  });

  it("deletes one student's data on request: their rows go and the debrief counts them as removed", async () => {
    const t = await playedSession();
    const dee = t.ids.get('Dee S.')!;
    const res = (await t.agent.delete(`/api/sessions/${t.session.id}/players/${dee}/data`).expect(200)).body;
    expect(res).toEqual({ ok: true, deletedResponses: 2 });
    expect(await ctx.db.query('SELECT count(*)::int AS n FROM responses WHERE player_id = $1', [dee])).toEqual([{ n: 0 }]);
    const [row] = await ctx.db.query('SELECT nickname, roster_entry_id, status FROM session_players WHERE id = $1', [dee]);
    expect(row).toEqual({ nickname: 'Removed student', roster_entry_id: null, status: 'removed' });
    // Nothing Dee answered is left in the stored snapshot (her id stays only as a roster slot).
    const [{ snapshot }] = await ctx.db.query('SELECT snapshot FROM sessions WHERE id = $1', [t.session.id]);
    const answeredBy = (snapshot.rounds as { answers: { playerId: string }[]; results: { players: { playerId: string }[] } }[]).flatMap((r) => [
      ...r.answers.map((a) => a.playerId),
      ...r.results.players.map((p) => p.playerId),
    ]);
    expect(answeredBy).not.toContain(dee);
    expect(answeredBy).toContain(t.ids.get('Ana P.'));
    expect((snapshot.acceptances as { playerId: string }[]).some((a) => a.playerId === dee)).toBe(false);

    const d = (await t.agent.get(`/api/sessions/${t.session.id}/debrief`).expect(200)).body;
    expect(d).toMatchObject({ playerCount: 3, removedCount: 1 });
    const expected = analyseSession(t.expectedInput(['Dee S.']));
    expect(d.items.map((i: { p: unknown; D: unknown }) => [i.p, i.D])).toEqual(expected.items.map((i) => [i.difficulty, i.discrimination]));
    expect(d.items[0].p.value).toBeCloseTo(2 / 3, 10); // Ana and Ben right, Cai wrong
    expect(d.students.filter((s: { removed: boolean }) => s.removed)).toEqual([expect.objectContaining({ playerId: dee, nickname: 'Removed student', score: null })]);
    const csv = csvRows((await t.agent.get(`/api/sessions/${t.session.id}/exports/gradebook.csv`).expect(200)).text);
    expect(csv.map((r) => r.student)).toEqual(['Ana P.', 'Ben Q.', 'Cai R.']);
  });

  it("deletes a roster entry's data across the class's sessions (class owner only)", async () => {
    const t = await playedSession();
    const co = await signedIn(http, t.coTeacher);
    await co.delete(`/api/classes/${t.cls.id}/roster/${t.entries[0].id}/data`).expect(403);
    expect((await t.agent.delete(`/api/classes/${t.cls.id}/roster/${t.entries[0].id}/data`).expect(200)).body).toEqual({ ok: true, deletedResponses: 3 });
    const d = (await t.agent.get(`/api/sessions/${t.session.id}/debrief`).expect(200)).body;
    expect(d).toMatchObject({ playerCount: 3, removedCount: 1 });
    expect(d.students.some((s: { rosterName: string | null }) => s.rosterName === 'Ana P.')).toBe(false);
  });

  it('refuses the debrief of a session that has not ended (409)', async () => {
    const school = await makeSchool(ctx.db);
    const agent = await signedIn(http, await makeUser(ctx.db, school));
    const { bankId } = await makeBankWithItems(agent, [itemInputs.single()]);
    const session = (await agent.post('/api/sessions').send(sessionRequest(bankId)).expect(201)).body;
    expect((await agent.get(`/api/sessions/${session.id}/debrief`).expect(409)).body.error).toBe('session_not_ended');
  });
});
