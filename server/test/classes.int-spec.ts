import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { App } from 'supertest/types';
import { ClassesService } from '../src/classes/classes.service';
import { PairRuleEntity } from '../src/classes/entities/pair-rule.entity';
import { RosterEntryEntity } from '../src/classes/entities/roster-entry.entity';
import { makeSchool, makeUser, rosterCsv, signedIn } from './helpers/factories';
import { createTestApp, resetDatabase, TestContext } from './helpers/test-app';

const FIXTURES = join(__dirname, '..', '..', 'fixtures');

describe(`${ClassesService.name} (integration)`, () => {
  let ctx: TestContext;
  let http: App;

  beforeAll(async () => {
    ctx = await createTestApp();
    http = ctx.app.getHttpServer();
  });
  afterAll(() => ctx.close());
  beforeEach(() => resetDatabase(ctx.db));

  type Agent = Awaited<ReturnType<typeof signedIn>>;
  const upload = (agent: Agent, classId: string, bytes: Buffer, mode?: string) => {
    const req = agent.post(`/api/classes/${classId}/roster/import`);
    if (mode) req.field('mode', mode);
    return req.attach('file', bytes, { filename: 'roster.csv', contentType: 'text/csv' });
  };

  async function setup() {
    const school = await makeSchool(ctx.db);
    const owner = await makeUser(ctx.db, school);
    const coTeacher = await makeUser(ctx.db, school);
    const mine = await signedIn(http, owner);
    const cls = (await mine.post('/api/classes').send({ name: 'Chemistry', period: '2', term: 'Fall' }).expect(201)).body;
    return { school, owner, coTeacher, mine, cls };
  }

  it('creates, edits and archives a class with period and term', async () => {
    const { mine, cls } = await setup();
    expect(cls).toMatchObject({ name: 'Chemistry', period: '2', term: 'Fall', access: 'owner', rosterCount: 0, roster: [], archivedAt: null });
    const edited = (await mine.patch(`/api/classes/${cls.id}`).send({ period: '3', term: 'Spring' }).expect(200)).body;
    expect(edited).toMatchObject({ name: 'Chemistry', period: '3', term: 'Spring' });
    await mine.post(`/api/classes/${cls.id}/archive`).expect(200);
    expect((await mine.get('/api/classes').expect(200)).body).toEqual([]);
    expect((await mine.get('/api/classes?archived=true').expect(200)).body[0]).toMatchObject({ id: cls.id, archivedAt: expect.any(String) });
    await mine.post(`/api/classes/${cls.id}/unarchive`).expect(200);
    await mine.patch(`/api/classes/${cls.id}`).send({ name: '' }).expect(400);
  });

  it('answers 404 to another teacher for the class and its roster; a co-teacher reads but cannot edit (403)', async () => {
    const { school, coTeacher, mine, cls } = await setup();
    const stranger = await makeUser(ctx.db, school);
    const outsider = await makeUser(ctx.db, await makeSchool(ctx.db));
    const entry = (await mine.post(`/api/classes/${cls.id}/roster`).send({ displayName: 'Mateo R.', tableGroup: '1' }).expect(201)).body;
    for (const u of [stranger, outsider]) {
      const a = await signedIn(http, u);
      await a.get(`/api/classes/${cls.id}`).expect(404);
      await a.get(`/api/classes/${cls.id}/roster`).expect(404);
      await a.patch(`/api/classes/${cls.id}`).send({ name: 'Taken' }).expect(404);
      expect((await a.get('/api/classes').expect(200)).body).toEqual([]);
    }
    await mine.post(`/api/classes/${cls.id}/co-teachers`).send({ email: outsider.email }).expect(404);
    const added = (await mine.post(`/api/classes/${cls.id}/co-teachers`).send({ email: coTeacher.email }).expect(200)).body;
    expect(added.coTeachers).toEqual([{ userId: coTeacher.id, displayName: coTeacher.displayName, email: coTeacher.email }]);
    const co = await signedIn(http, coTeacher);
    expect((await co.get(`/api/classes/${cls.id}`).expect(200)).body).toMatchObject({ access: 'co-teacher', rosterCount: 1 });
    expect((await co.get('/api/classes').expect(200)).body.map((c: { id: string }) => c.id)).toEqual([cls.id]);
    await co.patch(`/api/classes/${cls.id}`).send({ name: 'Mine' }).expect(403);
    await co.post(`/api/classes/${cls.id}/roster`).send({ displayName: 'Amara O.' }).expect(403);
    await co.patch(`/api/classes/${cls.id}/roster/${entry.id}`).send({ timeMultiplier: 2 }).expect(403);
    await upload(co, cls.id, rosterCsv([['Amara O.', '1', '', '']])).expect(403);
    await mine.delete(`/api/classes/${cls.id}/co-teachers/${coTeacher.id}`).expect(204);
    await co.get(`/api/classes/${cls.id}`).expect(404);
  });

  it('keeps roster entries with table group, seat and only the allowed time multipliers', async () => {
    const { mine, cls } = await setup();
    const a = (await mine.post(`/api/classes/${cls.id}/roster`).send({ displayName: 'Priya S.', tableGroup: '2', seatNumber: 3, timeMultiplier: 1.5 }).expect(201)).body;
    expect(a).toMatchObject({ displayName: 'Priya S.', tableGroup: '2', seatNumber: 3, timeMultiplier: 1.5 });
    const bad = await mine.post(`/api/classes/${cls.id}/roster`).send({ displayName: 'Finn W.', timeMultiplier: 3 }).expect(400);
    expect(bad.body.details).toEqual([{ field: 'timeMultiplier', message: expect.stringContaining('1, 1.25, 1.5, 2') }]);
    expect((await mine.post(`/api/classes/${cls.id}/roster`).send({ displayName: 'priya  s.' }).expect(409)).body.error).toBe('name_taken');
    const b = (await mine.patch(`/api/classes/${cls.id}/roster/${a.id}`).send({ timeMultiplier: 1.25, seatNumber: null }).expect(200)).body;
    expect(b).toMatchObject({ timeMultiplier: 1.25, seatNumber: null });
    const stored = await ctx.db.getRepository(RosterEntryEntity).findOneByOrFail({ id: a.id });
    expect(stored.timeMultiplier).toBe(1.25); // numeric column read back as a number
    await mine.delete(`/api/classes/${cls.id}/roster/${a.id}`).expect(204);
    expect((await mine.get(`/api/classes/${cls.id}/roster`).expect(200)).body).toEqual([]);
  });

  it('stores keep-apart and keep-together pairs, one rule per pair, only within the class', async () => {
    const { mine, cls } = await setup();
    const other = (await mine.post('/api/classes').send({ name: 'Other' }).expect(201)).body;
    const add = async (classId: string, name: string) => (await mine.post(`/api/classes/${classId}/roster`).send({ displayName: name }).expect(201)).body.id;
    const x = await add(cls.id, 'Mateo R.');
    const y = await add(cls.id, 'Amara O.');
    const z = await add(other.id, 'Lucas B.');
    const apart = (await mine.post(`/api/classes/${cls.id}/pairs`).send({ kind: 'apart', entryAId: y, entryBId: x }).expect(201)).body;
    expect(apart).toMatchObject({ kind: 'apart', entryAId: [x, y].sort()[0], entryBId: [x, y].sort()[1] });
    const together = (await mine.post(`/api/classes/${cls.id}/pairs`).send({ kind: 'together', entryAId: x, entryBId: y }).expect(201)).body;
    expect(together.id).toBe(apart.id);
    expect((await mine.get(`/api/classes/${cls.id}/pairs`).expect(200)).body).toEqual([expect.objectContaining({ kind: 'together' })]);
    await mine.post(`/api/classes/${cls.id}/pairs`).send({ kind: 'apart', entryAId: x, entryBId: z }).expect(404);
    await mine.post(`/api/classes/${cls.id}/pairs`).send({ kind: 'apart', entryAId: x, entryBId: x }).expect(400);
    await mine.post(`/api/classes/${cls.id}/pairs`).send({ kind: 'near', entryAId: x, entryBId: y }).expect(400);
    await mine.delete(`/api/classes/${cls.id}/roster/${x}`).expect(204);
    expect(await ctx.db.getRepository(PairRuleEntity).count()).toBe(0); // the rule goes with the student
  });

  it('imports the sample roster and both demo rosters cleanly', async () => {
    const { mine, cls } = await setup();
    const sample = await upload(mine, cls.id, readFileSync(join(FIXTURES, 'csv', 'sample-roster.csv'))).expect(200);
    expect(sample.body).toEqual({ targetId: cls.id, imported: 7 });
    const roster = (await mine.get(`/api/classes/${cls.id}/roster`).expect(200)).body;
    expect(roster.find((e: { displayName: string }) => e.displayName === 'Zara K.')).toMatchObject({ tableGroup: '2', seatNumber: 2, timeMultiplier: 2 });
    expect(roster.find((e: { displayName: string }) => e.displayName === 'Diego M.')).toMatchObject({ seatNumber: null, timeMultiplier: 1 });
    for (const name of ['chemistry-period-2.csv', 'chemistry-period-5.csv']) {
      const c = (await mine.post('/api/classes').send({ name: 'Chemistry' }).expect(201)).body;
      const res = await upload(mine, c.id, readFileSync(join(FIXTURES, 'demo', 'rosters', name)));
      expect({ name, status: res.status, details: res.body.details }).toEqual({ name, status: 200, details: undefined });
      const entries: { tableGroup: string; timeMultiplier: number }[] = (await mine.get(`/api/classes/${c.id}/roster`)).body;
      expect(entries.length).toBeGreaterThanOrEqual(24);
      expect(entries.length).toBeLessThanOrEqual(32);
      const tables = new Map<string, number>();
      for (const e of entries) tables.set(e.tableGroup, (tables.get(e.tableGroup) ?? 0) + 1);
      expect([...tables.values()].every((n) => n === 4)).toBe(true);
      expect(entries.some((e) => e.timeMultiplier > 1)).toBe(true);
    }
  });

  it('reports bad roster rows by row and column, writes nothing, and replaces a roster when asked', async () => {
    const { mine, cls } = await setup();
    await upload(mine, cls.id, rosterCsv([['Mateo R.', '1', '1', '']])).expect(200);
    const bad = rosterCsv([
      ['Amara O.', '1', '2', '1.25'],
      ['', '1', '3', ''],
      ['Lucas B.', '1', 'four', '3'],
      ['amara o.', '2', '1', ''],
      ['Mateo R.', '2', '2', ''],
    ]);
    const res = await upload(mine, cls.id, bad).expect(400);
    expect(res.body.details.map((d: { field: string }) => d.field)).toEqual([
      'row 3, column display_name',
      'row 4, column seat_number',
      'row 4, column time_multiplier',
      'row 5, column display_name',
      'row 6, column display_name',
    ]);
    expect(await ctx.db.getRepository(RosterEntryEntity).count()).toBe(1);
    const header = await upload(mine, cls.id, Buffer.from('name,table\nMateo R.,1\n')).expect(400);
    expect(header.body.error).toBe('csv_bad_header');
    const latin1 = Buffer.concat([Buffer.from('display_name,table_group,seat_number,time_multiplier\nJos'), Buffer.from([0xe9]), Buffer.from(' P.,1,1,\n')]);
    expect((await upload(mine, cls.id, latin1).expect(400)).body.error).toBe('csv_not_utf8');
    await upload(mine, cls.id, Buffer.alloc(2 * 1024 * 1024, 'x')).expect(413);
    const replaced = await upload(mine, cls.id, rosterCsv([['Mateo R.', '3', '1', '2'], ['Hana T.', '3', '2', '']]), 'replace').expect(200);
    expect(replaced.body.imported).toBe(2);
    const names = (await mine.get(`/api/classes/${cls.id}/roster`).expect(200)).body.map((e: { displayName: string }) => e.displayName);
    expect(names.sort()).toEqual(['Hana T.', 'Mateo R.']);
  });
});
