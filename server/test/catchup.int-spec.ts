import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { CATCHUP_CLOCK, type CatchupClock } from '../src/catchup/catchup.constants';
import { CatchupService } from '../src/catchup/catchup.service';
import { DAY_MS } from '../src/catchup/domain';
import { makeEndedSession, makeSchool, makeUser, signedIn } from './helpers/factories';
import { createTestApp, resetDatabase, type TestContext } from './helpers/test-app';

const STUDENTS = ['Ana P.', 'Ben Q.', 'Cai R.'] as const;

/**
 * makeEndedSession's three players answer its true/false item (key false) right, wrong, right.
 * Here they are linked to roster entries and a second, single-choice item is added that only the
 * first player gets wrong. So: Ana missed the single item, Ben the true/false one, Cai nothing.
 */
async function addRosterAndSingleItem(db: DataSource, sessionId: string, playerIds: string[], entryIds: string[]) {
  for (const [i, playerId] of playerIds.entries()) {
    await db.query('UPDATE session_players SET roster_entry_id = $1, nickname = $2 WHERE id = $3', [entryIds[i], STUDENTS[i], playerId]);
  }
  const item = {
    id: randomUUID(),
    type: 'single',
    prompt: 'Which glassware delivers 10.0 mL most precisely?',
    options: [{ id: randomUUID(), text: 'Beaker' }, { id: randomUUID(), text: 'Volumetric pipette' }],
    explanation: 'It is calibrated to one volume.',
    tags: ['glassware'],
    imageId: null,
  };
  const single = { ...item, key: { type: 'single', correctOptionId: item.options[1].id } };
  await db.query('UPDATE sessions SET items = items || $1::jsonb, item_ids = item_ids || $2::uuid[] WHERE id = $3', [JSON.stringify([single]), [single.id], sessionId]);
  await db.query(`INSERT INTO session_rounds (session_id, "index", item_id, status) VALUES ($1, 1, $2, 'revealed')`, [sessionId, single.id]);
  for (const [i, playerId] of playerIds.entries()) {
    const right = i !== 0;
    await db.query(
      `INSERT INTO responses (session_id, round_index, player_id, client_message_id, kind, response, locked, credit, correct, points, final, elapsed_ms, received_at)
       VALUES ($1, 1, $2, 'm2', 'answer', $3::jsonb, true, $4, $5, $6, true, 1000, now())`,
      [sessionId, playerId, JSON.stringify({ type: 'single', optionId: item.options[right ? 1 : 0].id }), right ? 1 : 0, right, right ? 1000 : 0],
    );
  }
  return single;
}

describe(`${CatchupService.name} (integration: REST + PostgreSQL)`, () => {
  let ctx: TestContext;
  let http: App;
  let clock: CatchupClock;
  let now: number;

  beforeAll(async () => {
    ctx = await createTestApp();
    http = ctx.app.getHttpServer();
    clock = ctx.app.get(CATCHUP_CLOCK);
  });
  afterAll(async () => {
    jest.restoreAllMocks();
    await ctx.close();
  });
  beforeEach(async () => {
    await resetDatabase(ctx.db);
    now = Date.UTC(2026, 11, 1, 9, 0, 0);
    jest.spyOn(clock, 'now').mockImplementation(() => now);
  });

  async function endedClassSession() {
    const school = await makeSchool(ctx.db);
    const teacher = await makeUser(ctx.db, school);
    const stranger = await makeUser(ctx.db, school);
    const agent = await signedIn(http, teacher);
    const cls = (await agent.post('/api/classes').send({ name: 'Chemistry', period: '2' }).expect(201)).body;
    const entries: { id: string; displayName: string }[] = [];
    for (const displayName of STUDENTS) entries.push((await agent.post(`/api/classes/${cls.id}/roster`).send({ displayName }).expect(201)).body);
    const { sessionId, playerIds } = await makeEndedSession(ctx.db, { school, owner: teacher, endedAt: new Date(now - DAY_MS), players: 3, classId: cls.id });
    const single = await addRosterAndSingleItem(ctx.db, sessionId, playerIds, entries.map((e) => e.id));
    const [tf] = (await ctx.db.query('SELECT items FROM sessions WHERE id = $1', [sessionId]))[0].items;
    const [ana, ben] = entries;
    return { school, teacher, stranger, agent, sessionId, single, tf, ana, ben };
  }

  async function started(code: string, rosterEntryId: string) {
    return (await request(http).post(`/api/play/catchups/${code}/start`).send({ rosterEntryId }).expect(200)).body;
  }
  const answer = (token: string, itemId: string, response: object) => request(http).post('/api/play/catchups/answers').send({ token, itemId, response });

  it('makes one card per missed item of each roster student and lists only those students', async () => {
    const { agent, sessionId } = await endedClassSession();
    const created = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    expect(created).toEqual({ id: expect.any(String), code: expect.stringMatching(/^[A-HJKMNP-Z2-9]{6}$/), cardCount: 2 });
    const info = (await request(http).get(`/api/play/catchups/${created.code.toLowerCase()}`).expect(200)).body;
    expect(info.students.map((s: { displayName: string }) => s.displayName)).toEqual(['Ana P.', 'Ben Q.']);
  });

  it('gives a student only their own missed items, without keys or explanations', async () => {
    const { agent, sessionId, tf, ben } = await endedClassSession();
    const { code } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    const body = await started(code, ben.id);
    expect(body.displayName).toBe('Ben Q.');
    expect(body.items).toEqual([{ itemId: tf.id, box: 1, type: 'truefalse', prompt: tf.prompt, options: [], unitHint: null, imageUrl: null }]);
    expect(JSON.stringify(body.items)).not.toMatch(/"key"|explanation/);
    expect(body.token.split('.')).toHaveLength(3);
  });

  it('moves a card by the Leitner rule: right to box 2 (due in 2 days), wrong back to box 1 (due in 1 day)', async () => {
    // Boxes and intervals 1, 2, 4, 8, 16 days: Leitner's rule (Wikipedia "Leitner system"), intervals per DESIGN.md §6.
    const { agent, sessionId, tf, single, ana, ben } = await endedClassSession();
    const { id, code } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    const benToken = (await started(code, ben.id)).token;

    const right = (await answer(benToken, tf.id, { type: 'truefalse', value: false }).expect(200)).body;
    expect(right).toMatchObject({ credit: 1, correct: true, key: { type: 'truefalse', value: false }, box: 2, dueAt: new Date(now + 2 * DAY_MS).toISOString() });
    expect(right.nextDueAt).toBe(right.dueAt);

    const anaToken = (await started(code, ana.id)).token;
    const wrong = (await answer(anaToken, single.id, { type: 'single', optionId: single.options[0].id }).expect(200)).body;
    expect(wrong).toMatchObject({ credit: 0, correct: false, box: 1, explanation: 'It is calibrated to one volume.', dueAt: new Date(now + DAY_MS).toISOString() });

    now += 2 * DAY_MS; // Ben's card is due again
    expect((await started(code, ben.id)).items.map((i: { box: number }) => i.box)).toEqual([2]);
    expect((await answer(benToken, tf.id, { type: 'truefalse', value: true }).expect(200)).body).toMatchObject({ correct: false, box: 1 });

    const results = (await agent.get(`/api/sessions/${sessionId}/catchups/${id}/results`).expect(200)).body;
    const byName = new Map(results.students.map((s: { displayName: string }) => [s.displayName, s]));
    expect(byName.get('Ben Q.')).toMatchObject({ items: [{ itemId: tf.id, box: 1, attempts: 2, lastCorrect: false }] });
    expect(byName.get('Ana P.')).toMatchObject({ items: [{ itemId: single.id, box: 1, attempts: 1, lastCorrect: false }] });
  });

  it('refuses a card that is not due yet, with its review date', async () => {
    const { agent, sessionId, tf, ben } = await endedClassSession();
    const { code } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    const { token } = await started(code, ben.id);
    await answer(token, tf.id, { type: 'truefalse', value: false }).expect(200);
    now += DAY_MS; // box 2 waits two days
    const refused = await answer(token, tf.id, { type: 'truefalse', value: false }).expect(409);
    expect(refused.body).toMatchObject({ ok: false, error: 'card_not_due' });
    expect(refused.body.message).toContain('2026-12-03');
    expect((await started(code, ben.id)).items).toEqual([]);
  });

  it('refuses a forged token and another student\u2019s item', async () => {
    const { agent, sessionId, tf, single, ben } = await endedClassSession();
    const { code } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    const { token } = await started(code, ben.id);
    const [c, , mac] = token.split('.');
    expect((await answer(`${c}.${randomUUID()}.${mac}`, tf.id, { type: 'truefalse', value: false }).expect(401)).body.error).toBe('invalid_token');
    await answer(token, single.id, { type: 'single', optionId: single.options[1].id }).expect(404);
  });

  it('answers 404 to a teacher without the class, on create and on results', async () => {
    const { agent, stranger, sessionId } = await endedClassSession();
    const { id } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    const other = await signedIn(http, stranger);
    expect((await other.post(`/api/sessions/${sessionId}/catchups`).expect(404)).body.error).toBe('not_found');
    await other.get(`/api/sessions/${sessionId}/catchups/${id}/results`).expect(404);
  });

  it('refuses a session played without a class', async () => {
    const school = await makeSchool(ctx.db);
    const teacher = await makeUser(ctx.db, school);
    const { sessionId } = await makeEndedSession(ctx.db, { school, owner: teacher, endedAt: new Date(now), classId: null });
    const res = await (await signedIn(http, teacher)).post(`/api/sessions/${sessionId}/catchups`).expect(409);
    expect(res.body.error).toBe('not_a_class_session');
  });
  it('lists a session\u2019s catch-ups with box counts and accuracy, and closing stops the code but keeps the results', async () => {
    const { agent, sessionId, tf, ben } = await endedClassSession();
    expect((await agent.get(`/api/sessions/${sessionId}/catchups`).expect(200)).body).toEqual([]);
    const { id, code } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    const { token } = await started(code, ben.id);
    await answer(token, tf.id, { type: 'truefalse', value: false }).expect(200);

    const [listed] = (await agent.get(`/api/sessions/${sessionId}/catchups`).expect(200)).body;
    // Ana's card untouched in box 1; Ben's answered right, now in box 2 (Leitner's rule).
    expect(listed).toMatchObject({
      id,
      code,
      closedAt: null,
      studentCount: 2,
      startedCount: 1,
      cardCount: 2,
      clearedCount: 1,
      boxCounts: [1, 1, 0, 0, 0],
      attempts: 1,
      correctAttempts: 1,
      accuracy: { value: 1, reason: null },
    });

    now += 60_000;
    const closed = (await agent.post(`/api/sessions/${sessionId}/catchups/${id}/close`).expect(200)).body;
    expect(closed.closedAt).toBe(new Date(now).toISOString());
    now += 60_000;
    // Closing again changes nothing.
    expect((await agent.post(`/api/sessions/${sessionId}/catchups/${id}/close`).expect(200)).body.closedAt).toBe(closed.closedAt);

    expect((await request(http).get(`/api/play/catchups/${code}`).expect(404)).body.error).toBe('unknown_code');
    now += 2 * DAY_MS;
    expect((await answer(token, tf.id, { type: 'truefalse', value: false }).expect(410)).body.error).toBe('catchup_closed');
    const results = (await agent.get(`/api/sessions/${sessionId}/catchups/${id}/results`).expect(200)).body;
    expect(results.closedAt).toBe(closed.closedAt);
    expect(results.students.find((s: { displayName: string }) => s.displayName === 'Ben Q.').items[0]).toMatchObject({ attempts: 1, correctAttempts: 1, box: 2 });
    // On the class page a closed catch-up's box-1 cards are no longer open work; cleared ones still count.
    const cls = (await ctx.db.query('SELECT class_id FROM sessions WHERE id = $1', [sessionId]))[0].class_id;
    const students = (await agent.get(`/api/classes/${cls}/trends`).expect(200)).body.students as { displayName: string; openCards: number; clearedCards: number }[];
    expect(students.find((s) => s.displayName === 'Ana P.')).toMatchObject({ openCards: 0, clearedCards: 0 });
    expect(students.find((s) => s.displayName === 'Ben Q.')).toMatchObject({ openCards: 0, clearedCards: 1 });
  });

  it('answers 404 to a teacher without the class on the list and on close, and closes nothing', async () => {
    const { agent, stranger, sessionId } = await endedClassSession();
    const { id, code } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    const other = await signedIn(http, stranger);
    expect((await other.get(`/api/sessions/${sessionId}/catchups`).expect(404)).body).toMatchObject({ ok: false, error: 'not_found' });
    await other.post(`/api/sessions/${sessionId}/catchups/${id}/close`).expect(404);
    await agent.post(`/api/sessions/${sessionId}/catchups/${randomUUID()}/close`).expect(404);
    expect((await agent.post(`/api/sessions/${sessionId}/catchups/not-a-uuid/close`).expect(400)).body.ok).toBe(false);
    await request(http).get(`/api/play/catchups/${code}`).expect(200);
  });

  it('puts catch-up results into the student\u2019s history and the class page', async () => {
    const { agent, sessionId, tf, ana, ben } = await endedClassSession();
    const { code } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    const benToken = (await started(code, ben.id)).token;
    await answer(benToken, tf.id, { type: 'truefalse', value: true }).expect(200); // wrong: stays in box 1
    now += DAY_MS;
    await answer(benToken, tf.id, { type: 'truefalse', value: false }).expect(200); // right: box 2

    const cls = (await ctx.db.query('SELECT class_id FROM sessions WHERE id = $1', [sessionId]))[0].class_id;
    const history = (await agent.get(`/api/classes/${cls}/roster/${ben.id}/history`).expect(200)).body;
    expect(history).toMatchObject({ rosterEntryId: ben.id, displayName: 'Ben Q.', className: 'Chemistry · period 2', canDeleteData: true });
    // Ben answered the true/false item wrong and the single item right in the session: 1 of 2.
    expect(history.sessions).toHaveLength(1);
    expect(history.sessions[0]).toMatchObject({ sessionId, score: 1, itemCount: 2, answered: 2, percent: { value: 50 } });
    expect(history.sessions[0].missed.map((m: { itemId: string }) => m.itemId)).toEqual([tf.id]);
    expect(history.meanPercent.value).toBeCloseTo(50, 12);
    expect(history.catchups).toHaveLength(1);
    expect(history.catchups[0]).toMatchObject({ sessionId, cardCount: 1, clearedCount: 1, attempts: 2, correctAttempts: 1 });
    expect(history.catchups[0].items).toEqual([
      expect.objectContaining({ itemId: tf.id, prompt: tf.prompt, box: 2, attempts: 2, correctAttempts: 1, lastCorrect: true }),
    ]);

    const trends = (await agent.get(`/api/classes/${cls}/trends`).expect(200)).body;
    expect(trends.catchups).toHaveLength(1);
    expect(trends.catchups[0]).toMatchObject({ code, attempts: 2, correctAttempts: 1, accuracy: { value: 0.5 }, boxCounts: [1, 1, 0, 0, 0] });
    const students = new Map(trends.students.map((s: { displayName: string }) => [s.displayName, s]));
    expect([...students.keys()]).toEqual(['Ana P.', 'Ben Q.', 'Cai R.']);
    expect(students.get('Ana P.')).toMatchObject({ rosterEntryId: ana.id, sessionsPlayed: 1, openCards: 1, clearedCards: 0 });
    expect(students.get('Ben Q.')).toMatchObject({ sessionsPlayed: 1, openCards: 0, clearedCards: 1, meanPercent: { value: 50 } });
    expect(students.get('Cai R.')).toMatchObject({ sessionsPlayed: 1, openCards: 0, clearedCards: 0, meanPercent: { value: 100 } });
  });

  it('answers 404 for another teacher\u2019s class history and an entry of another class', async () => {
    const { agent, stranger, sessionId, ben } = await endedClassSession();
    const cls = (await ctx.db.query('SELECT class_id FROM sessions WHERE id = $1', [sessionId]))[0].class_id;
    const other = await signedIn(http, stranger);
    expect((await other.get(`/api/classes/${cls}/roster/${ben.id}/history`).expect(404)).body.ok).toBe(false);
    const otherClass = (await agent.post('/api/classes').send({ name: 'Physics', period: '4' }).expect(201)).body;
    expect((await agent.get(`/api/classes/${otherClass.id}/roster/${ben.id}/history`).expect(404)).body.error).toBe('not_found');
    const empty = (await agent.get(`/api/classes/${otherClass.id}/trends`).expect(200)).body;
    expect(empty).toMatchObject({ sessions: [], tags: [], catchups: [], students: [] });
  });

  it('deleting a removed earlier device of a student keeps the catch-up cards of the device that stayed', async () => {
    const { agent, sessionId, tf, ben } = await endedClassSession();
    // Ben's first phone was removed by the host; he picked his name again on another (same roster entry).
    const [removed] = await ctx.db.query(
      `INSERT INTO session_players (session_id, nickname, nickname_key, roster_entry_id, status, removed_at)
       VALUES ($1, 'Ben Q.', 'ben q. (first phone)', $2, 'removed', now()) RETURNING id`,
      [sessionId, ben.id],
    );
    const { id } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    await agent.delete(`/api/sessions/${sessionId}/players/${removed.id}/data`).expect(200);
    const results = (await agent.get(`/api/sessions/${sessionId}/catchups/${id}/results`).expect(200)).body;
    expect(results.students.find((s: { displayName: string }) => s.displayName === 'Ben Q.')?.items.map((i: { itemId: string }) => i.itemId)).toEqual([tf.id]);
  });

  it('lets a co-teacher read a student\u2019s history but not delete it', async () => {
    const { agent, stranger, sessionId, ben } = await endedClassSession();
    const cls = (await ctx.db.query('SELECT class_id FROM sessions WHERE id = $1', [sessionId]))[0].class_id;
    await agent.post(`/api/classes/${cls}/co-teachers`).send({ email: stranger.email }).expect(200);
    const co = await signedIn(http, stranger);
    const history = (await co.get(`/api/classes/${cls}/roster/${ben.id}/history`).expect(200)).body;
    expect(history).toMatchObject({ displayName: 'Ben Q.', canDeleteData: false });
    expect((await co.delete(`/api/classes/${cls}/roster/${ben.id}/data`).expect(403)).body).toMatchObject({ ok: false, error: 'forbidden' });
    expect((await co.get(`/api/classes/${cls}/roster/${ben.id}/history`).expect(200)).body.sessions).toHaveLength(1);
  });

  it('closes a catch-up once deletions leave it no cards, so its code stops working', async () => {
    const { agent, sessionId, ana, ben } = await endedClassSession();
    const { id, code } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    const cls = (await ctx.db.query('SELECT class_id FROM sessions WHERE id = $1', [sessionId]))[0].class_id;
    await agent.delete(`/api/classes/${cls}/roster/${ana.id}/data`).expect(200);
    // Ben still has his card: the catch-up stays open for him.
    expect((await request(http).get(`/api/play/catchups/${code}`).expect(200)).body.students.map((s: { displayName: string }) => s.displayName)).toEqual(['Ben Q.']);
    await agent.delete(`/api/classes/${cls}/roster/${ben.id}/data`).expect(200);
    // A closed code is no code at all (codes are unique among open catch-ups only).
    const closed = await request(http).get(`/api/play/catchups/${code}`).expect(404);
    expect(closed.body).toMatchObject({ error: 'unknown_code' });
    const listed = (await agent.get(`/api/sessions/${sessionId}/catchups`).expect(200)).body;
    expect(listed.find((c: { id: string }) => c.id === id)).toMatchObject({ closedAt: expect.any(String) });
  });

  it('closes a catch-up whose last students leave the roster (one removed, then the roster replaced by CSV)', async () => {
    const { agent, sessionId, ana } = await endedClassSession();
    const { id, code } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    const cls = (await ctx.db.query('SELECT class_id FROM sessions WHERE id = $1', [sessionId]))[0].class_id;
    await agent.delete(`/api/classes/${cls}/roster/${ana.id}`).expect(204);
    expect((await request(http).get(`/api/play/catchups/${code}`).expect(200)).body.students.map((s: { displayName: string }) => s.displayName)).toEqual(['Ben Q.']);
    await agent.post(`/api/classes/${cls}/roster/import`).field('mode', 'replace').attach('file', Buffer.from('display_name,table_group,seat_number,time_multiplier\nZoe N.,,,1\n'), { filename: 'roster.csv', contentType: 'text/csv' }).expect(200);
    await request(http).get(`/api/play/catchups/${code}`).expect(404);
    const listed = (await agent.get(`/api/sessions/${sessionId}/catchups`).expect(200)).body;
    expect(listed.find((c: { id: string }) => c.id === id)).toMatchObject({ closedAt: expect.any(String) });
  });

  it('deletes a student\u2019s catch-up cards with their session data, and the history then shows nothing of them', async () => {
    const { agent, sessionId, tf, ben } = await endedClassSession();
    const { id, code } = (await agent.post(`/api/sessions/${sessionId}/catchups`).expect(201)).body;
    await answer((await started(code, ben.id)).token, tf.id, { type: 'truefalse', value: false }).expect(200);
    const cls = (await ctx.db.query('SELECT class_id FROM sessions WHERE id = $1', [sessionId]))[0].class_id;
    await agent.delete(`/api/classes/${cls}/roster/${ben.id}/data`).expect(200);

    const results = (await agent.get(`/api/sessions/${sessionId}/catchups/${id}/results`).expect(200)).body;
    expect(results.students.map((s: { displayName: string }) => s.displayName)).toEqual(['Ana P.']);
    expect((await ctx.db.query('SELECT COUNT(*)::int AS n FROM catchup_answers'))[0].n).toBe(0);
    const history = (await agent.get(`/api/classes/${cls}/roster/${ben.id}/history`).expect(200)).body;
    expect(history).toMatchObject({ sessions: [], catchups: [], meanPercent: { value: null } });
  });
});
