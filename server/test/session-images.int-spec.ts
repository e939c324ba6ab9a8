import request from 'supertest';
import { App } from 'supertest/types';
import { itemInputs, makeBankWithItems, makeSchool, makeUser, sessionRequest, signedIn, TINY_PNG } from './helpers/factories';
import { createTestApp, resetDatabase, TestContext } from './helpers/test-app';

describe('Item pictures for players (integration)', () => {
  let ctx: TestContext;
  let http: App;

  beforeAll(async () => {
    ctx = await createTestApp();
    http = ctx.app.getHttpServer();
  });
  afterAll(() => ctx.close());
  beforeEach(() => resetDatabase(ctx.db));

  it("serves a session item's picture to players without a sign-in, and nothing else", async () => {
    const teacher = await makeUser(ctx.db, await makeSchool(ctx.db));
    const agent = await signedIn(http, teacher);
    const image = (await agent.post('/api/media/images').attach('file', TINY_PNG, 'tiny.png').expect(201)).body as { id: string };
    const other = (await agent.post('/api/media/images').attach('file', TINY_PNG, 'other.png').expect(201)).body as { id: string };
    const { bankId } = await makeBankWithItems(agent, [{ ...itemInputs.single(), imageId: image.id }]);
    const session = (await agent.post('/api/sessions').send(sessionRequest(bankId)).expect(201)).body as { id: string };

    const res = await request(http).get(`/api/play/sessions/${session.id}/images/${image.id}`).expect(200);
    expect(res.headers['content-type']).toBe('image/png');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(res.body as Buffer, TINY_PNG)).toBe(0);

    // An image of the school that no item of this session uses stays private.
    const refused = await request(http).get(`/api/play/sessions/${session.id}/images/${other.id}`).expect(404);
    expect(refused.body).toMatchObject({ ok: false, error: 'not_found' });
    await request(http).get(`/api/play/sessions/${session.id}/images/not-a-uuid`).expect(400);
  });
});
