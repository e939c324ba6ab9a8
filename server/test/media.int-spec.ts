import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { App } from 'supertest/types';
import { MediaEntity } from '../src/media/entities/media.entity';
import { MediaService } from '../src/media/media.service';
import { itemInputs, makeSchool, makeUser, signedIn, TINY_PNG } from './helpers/factories';
import { createTestApp, resetDatabase, TestContext } from './helpers/test-app';

describe(`${MediaService.name} (integration)`, () => {
  let ctx: TestContext;
  let http: App;
  const mediaDir = mkdtempSync(join(tmpdir(), 'covalent-media-'));

  beforeAll(async () => {
    ctx = await createTestApp({ MEDIA_DIR: mediaDir });
    http = ctx.app.getHttpServer();
  });
  afterAll(async () => {
    await ctx.close();
    rmSync(mediaDir, { recursive: true, force: true });
  });
  beforeEach(async () => {
    await resetDatabase(ctx.db);
    for (const entry of readdirSync(mediaDir)) rmSync(join(mediaDir, entry), { recursive: true, force: true });
  });

  const filesOnDisk = (): string[] => readdirSync(mediaDir, { recursive: true, withFileTypes: true }).filter((d) => d.isFile()).map((d) => d.name);

  it('stores a PNG sniffed from its bytes and serves it inline with nosniff and a closed CSP', async () => {
    const owner = await makeUser(ctx.db, await makeSchool(ctx.db));
    const agent = await signedIn(http, owner);
    // Declared as a GIF with a .txt name: the bytes decide.
    const res = await agent.post('/api/media/images').attach('file', TINY_PNG, { filename: 'diagram.txt', contentType: 'image/gif' }).expect(201);
    expect(res.body).toMatchObject({ mime: 'image/png', byteSize: TINY_PNG.length, url: `/api/media/images/${res.body.id}` });
    // SHA-256 of the same bytes, computed by Node's crypto (FIPS 180-4).
    expect(res.body.sha256).toBe(require('node:crypto').createHash('sha256').update(TINY_PNG).digest('hex'));
    const got = await agent.get(res.body.url).buffer(true).expect(200);
    expect(got.headers['content-type']).toBe('image/png');
    expect(got.headers['x-content-type-options']).toBe('nosniff');
    expect(got.headers['content-disposition']).toBe('inline');
    expect(got.headers['content-security-policy']).toBe("default-src 'none'");
    expect(Buffer.compare(got.body as Buffer, TINY_PNG)).toBe(0);
    expect(filesOnDisk()).toEqual([res.body.id]);
  });

  it('refuses a text file named .png with 415 and an image over 2 MB with 413, storing nothing', async () => {
    const owner = await makeUser(ctx.db, await makeSchool(ctx.db));
    const agent = await signedIn(http, owner);
    const spoof = await agent
      .post('/api/media/images')
      .attach('file', Buffer.from('<script>alert(1)</script>\n'), { filename: 'photo.png', contentType: 'image/png' })
      .expect(415);
    expect(spoof.body).toMatchObject({ ok: false, error: 'unsupported_image_type' });
    // A real PNG signature padded past 2 MB (2 × 1024 × 1024 bytes + 1).
    const oversized = Buffer.concat([TINY_PNG, Buffer.alloc(2 * 1024 * 1024 + 1 - TINY_PNG.length)]);
    const big = await agent.post('/api/media/images').attach('file', oversized, { filename: 'big.png', contentType: 'image/png' }).expect(413);
    expect(big.body).toMatchObject({ ok: false, error: 'file_too_large', message: expect.stringContaining('2 MB') });
    const exact = Buffer.concat([TINY_PNG, Buffer.alloc(2 * 1024 * 1024 - TINY_PNG.length)]);
    await agent.post('/api/media/images').attach('file', exact, { filename: 'edge.png' }).expect(201);
    expect(await ctx.db.getRepository(MediaEntity).count()).toBe(1);
    expect(filesOnDisk()).toHaveLength(1);
  });

  it('serves an image to its owner and to teachers of banks that use it, 404 to everyone else', async () => {
    const school = await makeSchool(ctx.db);
    const owner = await makeUser(ctx.db, school);
    const colleague = await makeUser(ctx.db, school);
    const outsider = await makeUser(ctx.db, await makeSchool(ctx.db));
    const mine = await signedIn(http, owner);
    const image = (await mine.post('/api/media/images').attach('file', TINY_PNG, 'a.png').expect(201)).body;
    const theirs = await signedIn(http, colleague);
    const other = await signedIn(http, outsider);
    await theirs.get(image.url).expect(404);
    await other.get(image.url).expect(404);
    const bank = (await mine.post('/api/banks').send({ title: 'With a diagram' }).expect(201)).body;
    await mine.post(`/api/banks/${bank.id}/items`).send({ ...itemInputs.truefalse(), imageId: image.id }).expect(201);
    await mine.post(`/api/banks/${bank.id}/shares`).send({ email: colleague.email, access: 'view' }).expect(200);
    await theirs.get(image.url).expect(200);
    await other.get(image.url).expect(404);
    // Another school's teacher cannot attach it to an item of theirs either.
    const foreignBank = (await other.post('/api/banks').send({ title: 'Elsewhere' }).expect(201)).body;
    const refused = await other.post(`/api/banks/${foreignBank.id}/items`).send({ ...itemInputs.truefalse(), imageId: image.id }).expect(400);
    expect(refused.body.details).toEqual([{ field: 'imageId', message: expect.any(String) }]);
    await mine.get('/api/media/images/not-a-uuid').expect(400);
  });
});
