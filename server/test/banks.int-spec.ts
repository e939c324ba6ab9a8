import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { App } from 'supertest/types';
import { BankEntity } from '../src/banks/entities/bank.entity';
import { ItemEntity } from '../src/banks/entities/item.entity';
import { BanksService } from '../src/banks/banks.service';
import { itemInputs, makeSchool, makeUser, signedIn } from './helpers/factories';
import { createTestApp, resetDatabase, TestContext } from './helpers/test-app';

const FIXTURES = join(__dirname, '..', '..', 'fixtures');
const csvFile = (text: string) => Buffer.from(text, 'utf8');
const HEADER =
  'type,prompt,option_a,option_b,option_c,option_d,option_e,option_f,option_g,option_h,correct,order,numeric_value,numeric_unit,tolerance,tolerance_kind,sig_figs,accepted_answers,typo_tolerance,explanation,tags';

describe(`${BanksService.name} (integration)`, () => {
  let ctx: TestContext;
  let http: App;

  beforeAll(async () => {
    ctx = await createTestApp();
    http = ctx.app.getHttpServer();
  });
  afterAll(() => ctx.close());
  beforeEach(() => resetDatabase(ctx.db));

  async function school() {
    const s = await makeSchool(ctx.db);
    const owner = await makeUser(ctx.db, s);
    const colleague = await makeUser(ctx.db, s);
    const admin = await makeUser(ctx.db, s, 'admin');
    return { s, owner, colleague, admin, as: (u: typeof owner) => signedIn(http, u) };
  }

  async function bankWithItems(agent: Awaited<ReturnType<typeof signedIn>>, n = 3) {
    const bank = (await agent.post('/api/banks').send({ title: 'Lab entry & exit procedures', tags: ['procedures'] }).expect(201)).body;
    const inputs = Object.values(itemInputs).slice(0, n);
    const items = [];
    for (const make of inputs) items.push((await agent.post(`/api/banks/${bank.id}/items`).send(make()).expect(201)).body);
    return { bank, items };
  }

  it('creates, edits details of, lists, archives and deletes a bank', async () => {
    const { owner, as } = await school();
    const agent = await as(owner);
    const created = await agent
      .post('/api/banks')
      .send({ title: '  Safety equipment ', description: 'Week 1', tags: ['safety'], standardsCode: 'LAB-1' })
      .expect(201);
    expect(created.body).toMatchObject({ title: 'Safety equipment', access: 'owner', itemCount: 0, standardsCode: 'LAB-1', archivedAt: null });
    const patched = await agent.patch(`/api/banks/${created.body.id}`).send({ title: 'Safety kit', tags: ['safety', 'ppe'], standardsCode: null }).expect(200);
    expect(patched.body).toMatchObject({ title: 'Safety kit', tags: ['safety', 'ppe'], standardsCode: null, description: 'Week 1' });
    await agent.post(`/api/banks/${created.body.id}/archive`).expect(200);
    expect((await agent.get('/api/banks').expect(200)).body).toEqual([]);
    expect((await agent.get('/api/banks?archived=true').expect(200)).body.map((b: { id: string }) => b.id)).toEqual([created.body.id]);
    await agent.post(`/api/banks/${created.body.id}/unarchive`).expect(200);
    await agent.delete(`/api/banks/${created.body.id}`).expect(204);
    await agent.get(`/api/banks/${created.body.id}`).expect(404);
  });

  it('sorts by title, item count and update time, and filters by title substring and tag', async () => {
    const { owner, as } = await school();
    const agent = await as(owner);
    const mk = async (title: string, tags: string[], items: number) => {
      const b = (await agent.post('/api/banks').send({ title, tags }).expect(201)).body;
      for (let i = 0; i < items; i++) await agent.post(`/api/banks/${b.id}/items`).send(itemInputs.truefalse()).expect(201);
      return b.id as string;
    };
    const beta = await mk('beta measurement', ['numbers'], 2);
    const alpha = await mk('Alpha norms', ['norms'], 0);
    const gamma = await mk('Gamma safety', ['norms'], 3);
    const titles = (await agent.get('/api/banks?sort=title').expect(200)).body.map((b: { id: string }) => b.id);
    expect(titles).toEqual([alpha, beta, gamma]); // case-insensitive title order
    const byCount = (await agent.get('/api/banks?sort=itemCount&dir=desc').expect(200)).body;
    expect(byCount.map((b: { id: string; itemCount: number }) => [b.id, b.itemCount])).toEqual([[gamma, 3], [beta, 2], [alpha, 0]]);
    await agent.patch(`/api/banks/${alpha}`).send({ description: 'touched last' }).expect(200);
    expect((await agent.get('/api/banks?sort=updatedAt').expect(200)).body[0].id).toBe(alpha);
    expect((await agent.get('/api/banks?q=SAFE').expect(200)).body.map((b: { id: string }) => b.id)).toEqual([gamma]);
    expect((await agent.get('/api/banks?q=%25').expect(200)).body).toEqual([]); // "%" is literal, not a wildcard
    const tagged = (await agent.get('/api/banks?tag=norms&sort=title').expect(200)).body.map((b: { id: string }) => b.id);
    expect(tagged).toEqual([alpha, gamma]);
    await agent.get('/api/banks?sort=colour').expect(400);
  });

  it('answers 404 to another teacher for the bank, its items and its export, until it is shared', async () => {
    const { owner, colleague, as } = await school();
    const other = await makeUser(ctx.db, await makeSchool(ctx.db));
    const mine = await as(owner);
    const { bank, items } = await bankWithItems(mine, 2);
    for (const agent of [await as(colleague), await as(other)]) {
      for (const path of [`/api/banks/${bank.id}`, `/api/banks/${bank.id}/items`, `/api/banks/${bank.id}/items/${items[0].id}`, `/api/banks/${bank.id}/export`]) {
        const res = await agent.get(path).expect(404);
        expect(res.body).toMatchObject({ ok: false, error: 'not_found' });
      }
      await agent.patch(`/api/banks/${bank.id}`).send({ title: 'mine now' }).expect(404);
      expect((await agent.get('/api/banks').expect(200)).body).toEqual([]);
    }
    // A teacher of another school cannot be shared with: they look like nobody.
    await mine.post(`/api/banks/${bank.id}/shares`).send({ email: other.email, access: 'view' }).expect(404);
    await mine.post(`/api/banks/${bank.id}/shares`).send({ email: colleague.email, access: 'view' }).expect(200);
    const shared = await as(colleague);
    expect((await shared.get(`/api/banks/${bank.id}`).expect(200)).body).toMatchObject({ access: 'view', shares: [] });
  });

  it('lets a view share read but not edit (403), an edit share edit items and details but not delete or share', async () => {
    const { s, owner, colleague, admin, as } = await school();
    const viewer = await makeUser(ctx.db, s);
    const mine = await as(owner);
    const { bank, items } = await bankWithItems(mine, 2);
    await mine.post(`/api/banks/${bank.id}/shares`).send({ userId: viewer.id, access: 'view' }).expect(200);
    await mine.post(`/api/banks/${bank.id}/shares`).send({ email: colleague.email, access: 'edit' }).expect(200);

    const view = await as(viewer);
    expect((await view.get(`/api/banks/${bank.id}/items`).expect(200)).body).toHaveLength(2);
    expect((await view.patch(`/api/banks/${bank.id}`).send({ title: 'x' }).expect(403)).body).toMatchObject({ ok: false, error: 'forbidden' });
    await view.post(`/api/banks/${bank.id}/items`).send(itemInputs.text()).expect(403);
    await view.put(`/api/banks/${bank.id}/items/${items[0].id}`).send(itemInputs.text()).expect(403);
    await view.delete(`/api/banks/${bank.id}/items/${items[0].id}`).expect(403);

    const edit = await as(colleague);
    await edit.patch(`/api/banks/${bank.id}`).send({ description: 'co-written' }).expect(200);
    await edit.post(`/api/banks/${bank.id}/items`).send(itemInputs.text()).expect(201);
    await edit.delete(`/api/banks/${bank.id}`).expect(403);
    await edit.post(`/api/banks/${bank.id}/shares`).send({ userId: viewer.id, access: 'edit' }).expect(403);

    const adminAgent = await as(admin);
    expect((await adminAgent.get(`/api/banks/${bank.id}`).expect(200)).body).toMatchObject({ access: 'admin', itemCount: 3 });
    await adminAgent.patch(`/api/banks/${bank.id}`).send({ title: 'x' }).expect(403);
    expect((await adminAgent.get('/api/banks?scope=school').expect(200)).body.map((b: { id: string }) => b.id)).toEqual([bank.id]);

    await mine.delete(`/api/banks/${bank.id}/shares/${viewer.id}`).expect(204);
    await view.get(`/api/banks/${bank.id}`).expect(404);
  });

  it('stores every item type with server-made option ids and resolves "#index" key references', async () => {
    const { owner, as } = await school();
    const agent = await as(owner);
    const bank = (await agent.post('/api/banks').send({ title: 'All types' }).expect(201)).body;
    for (const [type, make] of Object.entries(itemInputs)) {
      const res = await agent.post(`/api/banks/${bank.id}/items`).send(make()).expect(201);
      expect(res.body.type).toBe(type);
      for (const o of res.body.options) expect(o.id).toMatch(/^[0-9a-f-]{36}$/);
    }
    const items = (await agent.get(`/api/banks/${bank.id}/items`).expect(200)).body;
    expect(items.map((i: { position: number }) => i.position)).toEqual([0, 1, 2, 3, 4, 5]);
    const single = items[0];
    expect(single.key.correctOptionId).toBe(single.options[1].id);
    expect(items[1].key.correctOptionIds).toEqual([items[1].options[0].id, items[1].options[2].id]);
    // Editing keeps ids the client sends back.
    const edited = { ...itemInputs.single(), options: single.options, key: { type: 'single', correctOptionId: single.options[2].id } };
    const res = await agent.put(`/api/banks/${bank.id}/items/${single.id}`).send(edited).expect(200);
    expect(res.body.options.map((o: { id: string }) => o.id)).toEqual(single.options.map((o: { id: string }) => o.id));
    expect(res.body.key.correctOptionId).toBe(single.options[2].id);
  });

  it('refuses an invalid item with field-level details from validateItemContent', async () => {
    const { owner, as } = await school();
    const agent = await as(owner);
    const bank = (await agent.post('/api/banks').send({ title: 'Bad items' }).expect(201)).body;
    const numeric = itemInputs.numeric();
    const bad = { ...numeric, prompt: ' ', key: { ...numeric.key, value: 'two point eight', unit: 'furlongs per wibble', tolerance: { kind: 'relative', value: 0 }, sigFigs: 0 } };
    const res = await agent.post(`/api/banks/${bank.id}/items`).send(bad).expect(400);
    expect(res.body).toMatchObject({ ok: false, error: 'validation_failed' });
    expect(res.body.details.map((d: { field: string }) => d.field).sort()).toEqual(
      ['key.sigFigs', 'key.tolerance.value', 'key.unit', 'key.value', 'prompt'].sort(),
    );
    const choice = { ...itemInputs.single(), options: [{ text: 'Same' }, { text: 'same ' }], key: { type: 'single', correctOptionId: 'nope' } };
    const res2 = await agent.post(`/api/banks/${bank.id}/items`).send(choice).expect(400);
    expect(res2.body.details.map((d: { field: string }) => d.field)).toEqual(['options[1].text', 'key.correctOptionId']);
    const mismatched = { ...itemInputs.truefalse(), key: { type: 'text', accepted: ['x'] } };
    expect((await agent.post(`/api/banks/${bank.id}/items`).send(mismatched).expect(400)).body.details[0].field).toBe('key.type');
    await agent.post(`/api/banks/${bank.id}/items`).send({ ...itemInputs.text(), type: 'essay' }).expect(400);
    expect(await ctx.db.getRepository(ItemEntity).count()).toBe(0);
  });

  it('reorders items with the full id list and refuses a partial list', async () => {
    const { owner, as } = await school();
    const agent = await as(owner);
    const { bank, items } = await bankWithItems(agent, 4);
    const ids = items.map((i: { id: string }) => i.id);
    const wanted = [ids[2], ids[0], ids[3], ids[1]];
    const res = await agent.put(`/api/banks/${bank.id}/items/order`).send({ itemIds: wanted }).expect(200);
    expect(res.body.map((i: { id: string }) => i.id)).toEqual(wanted);
    expect(res.body.map((i: { position: number }) => i.position)).toEqual([0, 1, 2, 3]);
    const partial = await agent.put(`/api/banks/${bank.id}/items/order`).send({ itemIds: wanted.slice(1) }).expect(400);
    expect(partial.body.details).toEqual([{ field: 'itemIds', message: expect.stringContaining('exactly once') }]);
    await agent.put(`/api/banks/${bank.id}/items/order`).send({ itemIds: [...wanted.slice(1), wanted[1]] }).expect(400);
    // Deleting keeps positions dense.
    await agent.delete(`/api/banks/${bank.id}/items/${wanted[1]}`).expect(204);
    const after = (await agent.get(`/api/banks/${bank.id}/items`).expect(200)).body;
    expect(after.map((i: { id: string; position: number }) => [i.id, i.position])).toEqual([[wanted[0], 0], [wanted[2], 1], [wanted[3], 2]]);
  });

  it('duplicates a bank with all its items for the caller, even from a view share', async () => {
    const { owner, colleague, as } = await school();
    const mine = await as(owner);
    const { bank, items } = await bankWithItems(mine, 3);
    await mine.post(`/api/banks/${bank.id}/shares`).send({ email: colleague.email, access: 'view' }).expect(200);
    const theirs = await as(colleague);
    const copy = (await theirs.post(`/api/banks/${bank.id}/duplicate`).send({}).expect(201)).body;
    expect(copy).toMatchObject({ title: 'Lab entry & exit procedures (copy)', ownerId: colleague.id, access: 'owner', itemCount: 3, tags: ['procedures'] });
    const copied = (await theirs.get(`/api/banks/${copy.id}/items`).expect(200)).body;
    const strip = (i: Record<string, unknown>) => ({ type: i.type, prompt: i.prompt, options: i.options, key: i.key, position: i.position });
    expect(copied.map(strip)).toEqual(items.map(strip));
    expect(copied.map((i: { id: string }) => i.id)).not.toEqual(items.map((i: { id: string }) => i.id));
  });

  describe('CSV', () => {
    const upload = (agent: Awaited<ReturnType<typeof signedIn>>, path: string, bytes: Buffer, name = 'bank.csv') =>
      agent.post(path).attach('file', bytes, { filename: name, contentType: 'text/csv' });

    it('imports the sample bank with one item of every type', async () => {
      const { owner, as } = await school();
      const agent = await as(owner);
      const res = await upload(agent, '/api/banks/import', readFileSync(join(FIXTURES, 'csv', 'sample-bank.csv')), 'sample-bank.csv').expect(201);
      expect(res.body.imported).toBe(6);
      const detail = (await agent.get(`/api/banks/${res.body.targetId}`).expect(200)).body;
      expect(detail.title).toBe('sample-bank');
      expect(detail.items.map((i: { type: string }) => i.type)).toEqual(['single', 'multi', 'truefalse', 'order', 'numeric', 'text']);
      const order = detail.items[3];
      // "B;D;C;A": the key lists option ids in that letter order.
      expect(order.key.sequence).toEqual([1, 3, 2, 0].map((i) => order.options[i].id));
      expect(detail.items[4].key).toEqual({ type: 'numeric', value: '2.80', unit: 'g/mL', tolerance: { kind: 'absolute', value: 0.01 }, sigFigs: 3 });
    });

    it('imports every demo bank cleanly: four banks, 40+ items, every type', async () => {
      const { owner, as } = await school();
      const agent = await as(owner);
      const dir = join(FIXTURES, 'demo', 'banks');
      const types = new Set<string>();
      let total = 0;
      for (const name of readdirSync(dir).filter((f) => f.endsWith('.csv'))) {
        const res = await upload(agent, '/api/banks/import', readFileSync(join(dir, name)), name);
        expect({ name, status: res.status, details: res.body.details }).toEqual({ name, status: 201, details: undefined });
        total += res.body.imported;
        for (const item of (await agent.get(`/api/banks/${res.body.targetId}/items`)).body) types.add(item.type);
      }
      expect((await agent.get('/api/banks').expect(200)).body).toHaveLength(4);
      expect(total).toBeGreaterThanOrEqual(40);
      expect([...types].sort()).toEqual(['multi', 'numeric', 'order', 'single', 'text', 'truefalse']);
    });

    it('round-trips export → import exactly', async () => {
      const { owner, as } = await school();
      const agent = await as(owner);
      const first = await upload(agent, '/api/banks/import', readFileSync(join(FIXTURES, 'demo', 'banks', 'significant-figures-measurement.csv'))).expect(201);
      const { bank } = await bankWithItems(agent, 6); // API-made items too (with "#index" keys)
      for (const id of [first.body.targetId, bank.id]) {
        const exported = await agent.get(`/api/banks/${id}/export`).expect(200);
        expect(exported.headers['content-type']).toBe('text/csv; charset=utf-8');
        expect(exported.headers['content-disposition']).toMatch(/^attachment; filename=".+\.csv"$/);
        const again = await upload(agent, '/api/banks/import', Buffer.from(exported.text, 'utf8')).expect(201);
        const reexported = await agent.get(`/api/banks/${again.body.targetId}/export`).expect(200);
        expect(reexported.text).toBe(exported.text);
        // Content equal up to option ids: map each id to its option's index.
        const norm = (items: { options: { id: string }[]; key: unknown }[]) =>
          items.map((i) => {
            const ids = i.options.map((o) => o.id);
            return JSON.parse(JSON.stringify({ ...i, id: 0, bankId: 0, createdAt: 0, updatedAt: 0 }), (k, v) => (typeof v === 'string' && ids.includes(v) ? `#${ids.indexOf(v)}` : v));
          });
        const a = (await agent.get(`/api/banks/${id}/items`)).body;
        const b = (await agent.get(`/api/banks/${again.body.targetId}/items`)).body;
        expect(norm(b)).toEqual(norm(a));
      }
    });

    it('reports every bad cell by row and column and writes nothing', async () => {
      const { owner, as } = await school();
      const agent = await as(owner);
      const { bank } = await bankWithItems(agent, 1);
      const csv = [
        HEADER,
        'single,Pick one,Yes,No,,,,,,,A,,,,,,,,,,',
        'single,Pick one,Yes,No,,,,,,,C,,,,,,,,,,',
        'truefalse,Is it?,,,,,,,,,maybe,,,,,,,,,,',
        'numeric,How much?,,,,,,,,,,,abc,g,0.1,sideways,,,,,',
        'essay,Write,,,,,,,,,,,,,,,,,,,',
      ].join('\n');
      const res = await upload(agent, `/api/banks/${bank.id}/items/import`, csvFile(csv)).expect(400);
      expect(res.body).toMatchObject({ ok: false, error: 'validation_failed' });
      expect(res.body.details.map((d: { field: string }) => d.field)).toEqual([
        'row 3, column correct',
        'row 4, column correct',
        'row 5, column tolerance_kind',
        'row 5, column numeric_value',
        'row 6, column type',
      ]);
      expect(await ctx.db.getRepository(ItemEntity).count({ where: { bankId: bank.id } })).toBe(1);
      await upload(agent, '/api/banks/import', csvFile(csv)).expect(400);
      expect(await ctx.db.getRepository(BankEntity).count()).toBe(1);
    });

    it('refuses wrong headers, non-UTF-8, too many rows, a 20 MB file, and a missing file', async () => {
      const { owner, as } = await school();
      const agent = await as(owner);
      const header = await upload(agent, '/api/banks/import', csvFile('kind,question,answer\nsingle,Q,A\n')).expect(400);
      expect(header.body.error).toBe('csv_bad_header');
      expect(header.body.details).toEqual(expect.arrayContaining([{ field: 'row 1, column type', message: 'The column "type" is missing.' }]));
      // "Café" in Latin-1: 0xE9 alone is not valid UTF-8 (RFC 3629 §3).
      const latin1 = Buffer.concat([Buffer.from(`${HEADER}\ntruefalse,Caf`), Buffer.from([0xe9]), Buffer.from(' is open,,,,,,,,,true\n')]);
      expect((await upload(agent, '/api/banks/import', latin1).expect(400)).body.error).toBe('csv_not_utf8');
      const many = [HEADER, ...Array.from({ length: 501 }, (_, i) => `truefalse,Statement ${i},,,,,,,,,true`)].join('\n');
      expect((await upload(agent, '/api/banks/import', csvFile(many)).expect(400)).body.error).toBe('csv_too_many_rows');
      const huge = Buffer.alloc(20 * 1024 * 1024, 'a');
      const big = await upload(agent, '/api/banks/import', huge).expect(413);
      expect(big.body).toMatchObject({ ok: false, error: 'file_too_large' });
      expect((await agent.post('/api/banks/import').field('title', 'x').expect(400)).body.error).toBe('file_missing');
      expect(await ctx.db.getRepository(BankEntity).count()).toBe(0);
    });
  });
});
