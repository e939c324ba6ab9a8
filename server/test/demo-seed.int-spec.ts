import type { App } from 'supertest/types';
import { LiveSessionsService } from '../src/sessions/live/live-sessions.service';
import { seedDemoSession } from '../src/database/demo-session';
import { itemInputs, makeBankWithItems, makeSchool, makeUser, signedIn } from './helpers/factories';
import { createTestApp, resetDatabase, type TestContext } from './helpers/test-app';

const NAMES = ['Ana P.', 'Ben Q.', 'Cai R.', 'Dara S.', 'Eli T.', 'Fen U.'];

/** The demo's played session goes through the live runtime; its debrief must be a real one. */
describe(`${seedDemoSession.name} (integration: live runtime + PostgreSQL)`, () => {
  let ctx: TestContext;
  let http: App;

  beforeAll(async () => {
    ctx = await createTestApp();
    http = ctx.app.getHttpServer();
  });
  afterAll(() => ctx.close());
  afterEach(() => jest.restoreAllMocks());
  beforeEach(() => resetDatabase(ctx.db));

  it('plays an ended session with every present student answering every item once, and does it only once', async () => {
    const school = await makeSchool(ctx.db);
    const teacher = await makeUser(ctx.db, school);
    const agent = await signedIn(http, teacher);
    const cls = (await agent.post('/api/classes').send({ name: 'Chemistry', period: '5' }).expect(201)).body;
    for (const displayName of NAMES) await agent.post(`/api/classes/${cls.id}/roster`).send({ displayName }).expect(201);
    // A numeric item is left out: the demo answers choice and order items only.
    const { bankId } = await makeBankWithItems(agent, [itemInputs.single(), itemInputs.truefalse(), itemInputs.order(), itemInputs.numeric()]);

    const id = await seedDemoSession(ctx.app, teacher, cls.id, bankId, { seed: 'test-demo', absent: 2 });
    expect(id).toEqual(expect.any(String));
    const debrief = (await agent.get(`/api/sessions/${id}/debrief`).expect(200)).body;
    expect(debrief).toMatchObject({ classId: cls.id, format: 'solo', playerCount: 4, itemCount: 3, removedCount: 0 });
    expect(debrief.students.every((s: { answered: number }) => s.answered === 3)).toBe(true);
    const [{ n }] = await ctx.db.query(`SELECT COUNT(*)::int AS n FROM responses WHERE session_id = $1 AND final AND credit IS NOT NULL`, [id]);
    expect(n).toBe(4 * 3);
    // Each student's history shows it: the class page and the histories have something on first start.
    const trends = (await agent.get(`/api/classes/${cls.id}/trends`).expect(200)).body;
    expect(trends.students.filter((s: { sessionsPlayed: number }) => s.sessionsPlayed === 1)).toHaveLength(4);

    expect(await seedDemoSession(ctx.app, teacher, cls.id, bankId, { seed: 'test-demo', absent: 2 })).toBeNull();
    expect((await ctx.db.query(`SELECT COUNT(*)::int AS n FROM sessions WHERE class_id = $1`, [cls.id]))[0].n).toBe(1);
  });

  it('leaves no half-played session behind when a step fails, so the next seed can try again', async () => {
    const school = await makeSchool(ctx.db);
    const teacher = await makeUser(ctx.db, school);
    const agent = await signedIn(http, teacher);
    const cls = (await agent.post('/api/classes').send({ name: 'Chemistry', period: '5' }).expect(201)).body;
    for (const displayName of NAMES.slice(0, 3)) await agent.post(`/api/classes/${cls.id}/roster`).send({ displayName }).expect(201);
    const { bankId } = await makeBankWithItems(agent, [itemInputs.single(), itemInputs.truefalse()]);
    const live = ctx.app.get(LiveSessionsService);
    jest.spyOn(live, 'submit').mockResolvedValueOnce({ ok: false, error: 'storage_unavailable', message: 'The answer could not be saved.' });

    await expect(seedDemoSession(ctx.app, teacher, cls.id, bankId, { seed: 'fails', absent: 0 })).rejects.toThrow(/could not be saved/);
    expect((await ctx.db.query('SELECT COUNT(*)::int AS n FROM sessions WHERE class_id = $1', [cls.id]))[0].n).toBe(0);

    jest.restoreAllMocks();
    const id = await seedDemoSession(ctx.app, teacher, cls.id, bankId, { seed: 'fails', absent: 0 });
    expect((await agent.get(`/api/sessions/${id}/debrief`).expect(200)).body).toMatchObject({ playerCount: 3, itemCount: 2 });
  });
});
