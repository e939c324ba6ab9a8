import request from 'supertest';
import { App } from 'supertest/types';
import { SESSION_COOKIE } from '../src/auth/auth.constants';
import { UserEntity } from '../src/users/entities/user.entity';
import { makeSchool, makeUser, PASSWORD } from './helpers/factories';
import { createTestApp, resetDatabase, TestContext } from './helpers/test-app';

const SIGNIN_LIMIT = 5;

describe('Sign-in, roles and e-mailed links (integration)', () => {
  let ctx: TestContext;
  let http: App;

  beforeAll(async () => {
    ctx = await createTestApp({ SIGNIN_LIMIT: String(SIGNIN_LIMIT), SIGNIN_WINDOW_SECONDS: '900' });
    http = ctx.app.getHttpServer();
  });
  afterAll(() => ctx.close());
  beforeEach(async () => {
    await resetDatabase(ctx.db);
    ctx.mail.messages.length = 0;
  });

  it('signs a teacher in with an httpOnly SameSite cookie and knows them at /api/me', async () => {
    const school = await makeSchool(ctx.db);
    const teacher = await makeUser(ctx.db, school);
    const agent = request.agent(http);
    const res = await agent.post('/api/auth/sign-in').send({ email: teacher.email.toUpperCase(), password: PASSWORD }).expect(200);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toContain(`${SESSION_COOKIE}=`);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const me = await agent.get('/api/me').expect(200);
    expect(me.body).toMatchObject({ email: teacher.email, role: 'teacher', school: { id: school.id, name: school.name } });
    await agent.post('/api/auth/sign-out').expect(204);
    await agent.get('/api/me').expect(401);
  });

  it('refuses a wrong password and an unknown e-mail with the same message', async () => {
    const teacher = await makeUser(ctx.db, await makeSchool(ctx.db));
    const wrong = await request(http).post('/api/auth/sign-in').send({ email: teacher.email, password: 'not-the-right-passphrase' }).expect(401);
    const unknown = await request(http).post('/api/auth/sign-in').send({ email: 'nobody@nowhere.example', password: PASSWORD }).expect(401);
    expect(wrong.body).toEqual({ ok: false, error: 'invalid_credentials', message: expect.any(String) });
    expect(unknown.body.message).toBe(wrong.body.message);
  });

  it('trips the sign-in rate limit for one address and e-mail, not for another e-mail', async () => {
    const teacher = await makeUser(ctx.db, await makeSchool(ctx.db));
    for (let i = 0; i < SIGNIN_LIMIT; i++) {
      await request(http).post('/api/auth/sign-in').send({ email: teacher.email, password: `wrong-guess-number-${i}` }).expect(401);
    }
    const blocked = await request(http).post('/api/auth/sign-in').send({ email: teacher.email, password: PASSWORD }).expect(429);
    expect(blocked.body).toMatchObject({ ok: false, error: 'rate_limited' });
    const other = await makeUser(ctx.db, await makeSchool(ctx.db));
    await request(http).post('/api/auth/sign-in').send({ email: other.email, password: PASSWORD }).expect(200);
  });

  it('gives a teacher 403 on admin routes and nothing without a sign-in', async () => {
    const teacher = await makeUser(ctx.db, await makeSchool(ctx.db));
    await request(http).get('/api/admin/users').expect(401);
    const agent = request.agent(http);
    await agent.post('/api/auth/sign-in').send({ email: teacher.email, password: PASSWORD }).expect(200);
    const res = await agent.get('/api/admin/users').expect(403);
    expect(res.body).toMatchObject({ ok: false, error: 'forbidden' });
    await agent.post('/api/admin/users/invitations').send({ email: 'x@y.example', displayName: 'X' }).expect(403);
  });

  it("keeps an admin of another school away from your school's teachers", async () => {
    const mine = await makeSchool(ctx.db);
    const theirs = await makeSchool(ctx.db);
    const myTeacher = await makeUser(ctx.db, mine);
    const otherAdmin = await makeUser(ctx.db, theirs, 'admin');
    const agent = request.agent(http);
    await agent.post('/api/auth/sign-in').send({ email: otherAdmin.email, password: PASSWORD }).expect(200);
    const list = await agent.get('/api/admin/users').expect(200);
    expect(list.body.map((u: { id: string }) => u.id)).not.toContain(myTeacher.id);
    await agent.post(`/api/admin/users/${myTeacher.id}/deactivate`).expect(404);
    const still = await ctx.db.getRepository(UserEntity).findOneByOrFail({ id: myTeacher.id });
    expect(still.active).toBe(true);
  });

  it('lets an admin deactivate a teacher, which ends their sessions, and reactivate them', async () => {
    const school = await makeSchool(ctx.db);
    const admin = await makeUser(ctx.db, school, 'admin');
    const teacher = await makeUser(ctx.db, school);
    const teacherAgent = request.agent(http);
    await teacherAgent.post('/api/auth/sign-in').send({ email: teacher.email, password: PASSWORD }).expect(200);
    const adminAgent = request.agent(http);
    await adminAgent.post('/api/auth/sign-in').send({ email: admin.email, password: PASSWORD }).expect(200);
    const off = await adminAgent.post(`/api/admin/users/${teacher.id}/deactivate`).expect(200);
    expect(off.body).toMatchObject({ id: teacher.id, active: false });
    await teacherAgent.get('/api/me').expect(401);
    const refused = await request(http).post('/api/auth/sign-in').send({ email: teacher.email, password: PASSWORD }).expect(403);
    expect(refused.body.error).toBe('account_deactivated');
    await adminAgent.post(`/api/admin/users/${teacher.id}/reactivate`).expect(200);
    await request(http).post('/api/auth/sign-in').send({ email: teacher.email, password: PASSWORD }).expect(200);
    await adminAgent.post(`/api/admin/users/${admin.id}/deactivate`).expect(409);
  });

  it('lets an admin set retention for their own school only, within bounds', async () => {
    const school = await makeSchool(ctx.db);
    const admin = await makeUser(ctx.db, school, 'admin');
    const teacher = await makeUser(ctx.db, school);
    const agent = request.agent(http);
    await agent.post('/api/auth/sign-in').send({ email: admin.email, password: PASSWORD }).expect(200);
    const res = await agent.patch('/api/admin/school').send({ retentionDays: 30 }).expect(200);
    expect(res.body).toMatchObject({ id: school.id, retentionDays: 30 });
    const bad = await agent.patch('/api/admin/school').send({ retentionDays: 0 }).expect(400);
    expect(bad.body.details).toEqual([{ field: 'retentionDays', message: expect.stringMatching(/at least one day/) }]);
    await agent.patch('/api/admin/school').send({ retentionDays: '30 days' }).expect(400);
    const teacherAgent = request.agent(http);
    await teacherAgent.post('/api/auth/sign-in').send({ email: teacher.email, password: PASSWORD }).expect(200);
    await teacherAgent.patch('/api/admin/school').send({ retentionDays: 1 }).expect(403);
    await agent.get('/api/admin/school').expect(200, { id: school.id, name: school.name, retentionDays: 30 });
  });

  const linkIn = (text: string, path: string): string => {
    const m = text.match(new RegExp(`http://127\\.0\\.0\\.1:3999${path}\\?token=([A-Za-z0-9_%-]+)`));
    if (!m) throw new Error(`no ${path} link in: ${text}`);
    return decodeURIComponent(m[1]);
  };

  it('e-mails an invitation whose link sets a password once', async () => {
    const school = await makeSchool(ctx.db);
    const admin = await makeUser(ctx.db, school, 'admin');
    const agent = request.agent(http);
    await agent.post('/api/auth/sign-in').send({ email: admin.email, password: PASSWORD }).expect(200);
    const invited = await agent.post('/api/admin/users/invitations').send({ email: 'New.Teacher@School.example', displayName: 'Jo Marsh' }).expect(201);
    expect(invited.body).toMatchObject({ email: 'new.teacher@school.example', role: 'teacher', activated: false });

    const mail = await ctx.mail.waitFor((m) => m.to.includes('new.teacher@school.example'));
    expect(mail.subject).toContain('invited you');
    const token = linkIn(mail.text, '/accept-invite');

    const newPassword = 'seven-lab-coats-on-hooks';
    const accepted = request.agent(http);
    await accepted.post('/api/auth/invitations/accept').send({ token, password: newPassword }).expect(200);
    await accepted.get('/api/me').expect(200);
    const again = await request(http).post('/api/auth/invitations/accept').send({ token, password: 'another-long-passphrase-here' }).expect(410);
    expect(again.body).toMatchObject({ ok: false, error: 'link_used' });
    await request(http).post('/api/auth/sign-in').send({ email: 'new.teacher@school.example', password: newPassword }).expect(200);
  });

  it('e-mails a password reset whose link works once and expires after an hour', async () => {
    const teacher = await makeUser(ctx.db, await makeSchool(ctx.db));
    const ack = await request(http).post('/api/auth/password-reset-requests').send({ email: teacher.email }).expect(202);
    await request(http).post('/api/auth/password-reset-requests').send({ email: 'ghost@nowhere.example' }).expect(202);
    expect(ack.body.ok).toBe(true);
    const first = linkIn((await ctx.mail.waitFor((m) => m.to.includes(teacher.email))).text, '/reset-password');

    const fresh = 'pipette-bulb-and-goggles';
    await request(http).post('/api/auth/password-reset').send({ token: first, password: fresh }).expect(200);
    const reused = await request(http).post('/api/auth/password-reset').send({ token: first, password: 'yet-another-passphrase-x' }).expect(410);
    expect(reused.body.error).toBe('link_used');
    await request(http).post('/api/auth/sign-in').send({ email: teacher.email, password: fresh }).expect(200);
    await request(http).post('/api/auth/sign-in').send({ email: teacher.email, password: PASSWORD }).expect(401);

    ctx.mail.messages.length = 0;
    await request(http).post('/api/auth/password-reset-requests').send({ email: teacher.email }).expect(202);
    const second = linkIn((await ctx.mail.waitFor((m) => m.to.includes(teacher.email))).text, '/reset-password');
    ctx.clock.advance(61 * 60 * 1000);
    const expired = await request(http).post('/api/auth/password-reset').send({ token: second, password: 'too-late-for-this-one' }).expect(410);
    expect(expired.body).toMatchObject({ ok: false, error: 'link_expired', message: expect.stringMatching(/expired/) });

    const bogus = await request(http).post('/api/auth/password-reset').send({ token: 'made-up', password: 'whatever-long-enough-1' }).expect(400);
    expect(bogus.body.error).toBe('link_invalid');
  });

  it('refuses a common or short password when setting one, and keeps the link usable', async () => {
    const teacher = await makeUser(ctx.db, await makeSchool(ctx.db));
    await request(http).post('/api/auth/password-reset-requests').send({ email: teacher.email }).expect(202);
    const token = linkIn((await ctx.mail.waitFor((m) => m.to.includes(teacher.email))).text, '/reset-password');
    // '123456789987654321' is in @zxcvbn-ts/language-common's passwords-common list.
    const common = await request(http).post('/api/auth/password-reset').send({ token, password: '123456789987654321' }).expect(400);
    expect(common.body).toMatchObject({ error: 'weak_password', details: [{ field: 'password' }] });
    await request(http).post('/api/auth/password-reset').send({ token, password: 'short' }).expect(400);
    await request(http).post('/api/auth/password-reset').send({ token, password: 'finally-a-good-passphrase' }).expect(200);
  });

  describe('bad input', () => {
    it('answers malformed JSON with 400 and the one error shape', async () => {
      const res = await request(http).post('/api/auth/sign-in').set('content-type', 'application/json').send('{"email": "a@b.example",').expect(400);
      expect(res.body).toEqual({ ok: false, error: 'malformed_json', message: expect.any(String) });
    });

    it('answers missing and mistyped fields with field-level details', async () => {
      const missing = await request(http).post('/api/auth/sign-in').send({}).expect(400);
      expect(missing.body.error).toBe('validation_failed');
      expect(missing.body.details.map((d: { field: string }) => d.field).sort()).toEqual(['email', 'password']);
      const typed = await request(http).post('/api/auth/sign-in').send({ email: 42, password: ['x'] }).expect(400);
      expect(typed.body.error).toBe('validation_failed');
      const extra = await request(http).post('/api/auth/sign-in').send({ email: 'a@b.example', password: 'p', role: 'admin' }).expect(400);
      expect(extra.body.details).toEqual(expect.arrayContaining([expect.objectContaining({ field: 'role' })]));
    });

    it('answers an oversized body with 413', async () => {
      const res = await request(http).post('/api/auth/sign-in').send({ email: 'a@b.example', password: 'x'.repeat(400_000) }).expect(413);
      expect(res.body).toMatchObject({ ok: false, error: 'payload_too_large' });
    });

    it('answers a bad id and an unknown route with 4xx, never 500', async () => {
      const school = await makeSchool(ctx.db);
      const admin = await makeUser(ctx.db, school, 'admin');
      const agent = request.agent(http);
      await agent.post('/api/auth/sign-in').send({ email: admin.email, password: PASSWORD }).expect(200);
      const bad = await agent.post('/api/admin/users/not-a-uuid/deactivate').expect(400);
      expect(bad.body.ok).toBe(false);
      const unknown = await agent.get('/api/nothing-here').expect(404);
      expect(unknown.body).toMatchObject({ ok: false, error: 'not_found' });
    });
  });

  it('reports the database in /api/health', async () => {
    await request(http).get('/api/health').expect(200, { ok: true, database: 'up' });
  });
});
