import { DebriefService } from '../src/debrief/debrief.service';
import { PlayerDataService } from '../src/retention/player-data.service';
import { DAY_MS } from '../src/retention/retention.constants';
import { RetentionService } from '../src/retention/retention.service';
import { SchoolEntity } from '../src/users/entities/school.entity';
import { makeEndedSession, makeSchool, makeUser, signedIn } from './helpers/factories';
import { createTestApp, FakeClock, resetDatabase, type TestContext } from './helpers/test-app';

describe(`${RetentionService.name} (integration: PostgreSQL)`, () => {
  let ctx: TestContext;

  beforeAll(async () => {
    ctx = await createTestApp();
  });
  afterAll(async () => {
    await ctx.close();
  });
  beforeEach(async () => {
    await resetDatabase(ctx.db);
  });

  const count = async (sql: string, params: unknown[]) => ((await ctx.db.query(sql, params)) as { n: number }[])[0].n;

  it("deletes responses and players of sessions older than the school's retentionDays and keeps newer ones", async () => {
    const now = Date.parse('2026-06-30T12:00:00Z');
    const clock = new FakeClock(now);
    const job = new RetentionService(ctx.db, ctx.app.get(PlayerDataService), clock);
    const school = await makeSchool(ctx.db);
    await ctx.db.getRepository(SchoolEntity).update({ id: school.id }, { retentionDays: 30 });
    const teacher = await makeUser(ctx.db, school);
    const old = await makeEndedSession(ctx.db, { school, owner: teacher, endedAt: new Date(now - 31 * DAY_MS), players: 2 });
    const recent = await makeEndedSession(ctx.db, { school, owner: teacher, endedAt: new Date(now - 29 * DAY_MS), players: 2 });
    // Another school keeps a year: a 31-day-old session there stays.
    const longSchool = await makeSchool(ctx.db);
    const other = await makeEndedSession(ctx.db, { school: longSchool, owner: await makeUser(ctx.db, longSchool), endedAt: new Date(now - 31 * DAY_MS) });

    expect(await job.runOnce()).toEqual({ sessions: 1, players: 2, responses: 2 });
    const responses = (id: string) => count('SELECT count(*)::int AS n FROM responses WHERE session_id = $1', [id]);
    expect(await responses(old.sessionId)).toBe(0);
    expect(await responses(recent.sessionId)).toBe(2);
    expect(await responses(other.sessionId)).toBe(2);
    expect(await count("SELECT count(*)::int AS n FROM session_players WHERE session_id = $1 AND nickname = 'Removed student'", [old.sessionId])).toBe(2);
    expect(await count('SELECT count(*)::int AS n FROM sessions WHERE id = $1', [old.sessionId])).toBe(1); // the session stays

    const agent = await signedIn(ctx.app.getHttpServer(), teacher);
    const d = (await agent.get(`/api/sessions/${old.sessionId}/debrief`).expect(200)).body;
    expect(d).toMatchObject({ playerCount: 0, removedCount: 2, classAccuracy: { value: null } });
    expect((await agent.get(`/api/sessions/${recent.sessionId}/debrief`).expect(200)).body).toMatchObject({ playerCount: 2, removedCount: 0 });

    // A second run finds nothing new; two days later the "recent" one is due.
    expect(await job.runOnce()).toEqual({ sessions: 0, players: 0, responses: 0 });
    clock.advance(2 * DAY_MS);
    expect(await job.runOnce()).toEqual({ sessions: 1, players: 2, responses: 2 });
    expect(await responses(recent.sessionId)).toBe(0);
  });

  it('schedules itself at boot on a daily, unref’d timer (never keeps the process alive)', () => {
    const job = ctx.app.get(RetentionService) as unknown as { timer: NodeJS.Timeout | null };
    expect(job.timer).not.toBeNull();
    expect(job.timer?.hasRef()).toBe(false);
    expect(ctx.app.get(DebriefService)).toBeDefined();
  });
});
