import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import * as path from 'node:path';
import { DataSource } from 'typeorm';
import { SESSION_COOKIE } from '../src/auth/auth.constants';
import { SIGN_ON_FLOW_COOKIE } from '../src/auth/oidc/sign-on-flow';
import type { UserEntity } from '../src/users/entities/user.entity';
import { makeSchool, makeUser } from './helpers/factories';
import { freePort, openDatabase, ServerProcess } from './helpers/server-process';

/**
 * School sign-on end to end: the real local OpenID provider (server/dev/oidc-provider.mjs) and the
 * real built server, each a child process, driven the way a browser would, redirect by redirect.
 */

const PROVIDER_SCRIPT = path.resolve(__dirname, '../dev/oidc-provider.mjs');
const CLIENT_ID = 'covalent-int-test';
const CLIENT_SECRET = 'int-test-client-secret-never-in-a-browser';
const PASSWORD = 'int-test-sign-on-passphrase';

interface ProviderProcess {
  issuer: string;
  child: ChildProcess;
  output: string[];
  exited: Promise<number | null>;
}

/** Starts the provider and waits for its ready line. */
async function startProvider(port: number, env: Record<string, string>): Promise<ProviderProcess> {
  const child = spawn(process.execPath, [PROVIDER_SCRIPT, String(port)], {
    env: { PATH: process.env.PATH ?? '', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const output: string[] = [];
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`the provider did not start:\n${output.join('')}`)), 20_000);
    const onData = (chunk: Buffer) => {
      output.push(chunk.toString());
      if (output.join('').includes('oidc provider: issuer')) {
        clearTimeout(timer);
        resolve();
      }
    };
    child.stdout!.on('data', onData);
    child.stderr!.on('data', (chunk: Buffer) => output.push(chunk.toString()));
    void exited.then((code) => reject(new Error(`the provider exited (${code}):\n${output.join('')}`)));
  });
  return { issuer: `http://127.0.0.1:${port}`, child, output, exited };
}

/** Cookies the way a browser keeps them: per host (not per port), with a path, dropped when expired. */
class CookieJar {
  private readonly cookies = new Map<string, { host: string; name: string; value: string; path: string; attrs: string }>();

  store(url: string, res: Response): void {
    const host = new URL(url).hostname;
    for (const line of res.headers.getSetCookie()) {
      const [pair, ...attrs] = line.split(';').map((s) => s.trim());
      const eq = pair.indexOf('=');
      const name = pair.slice(0, eq);
      const value = pair.slice(eq + 1);
      const pathAttr = attrs.find((a) => /^path=/i.test(a))?.slice(5) ?? '/';
      const key = `${host}|${pathAttr}|${name}`;
      const maxAge = attrs.find((a) => /^max-age=/i.test(a));
      const expires = attrs.find((a) => /^expires=/i.test(a));
      const gone = (maxAge && Number(maxAge.slice(8)) <= 0) || (expires && Date.parse(expires.slice(8)) <= Date.now()) || value === '';
      if (gone) this.cookies.delete(key);
      else this.cookies.set(key, { host, name, value, path: pathAttr, attrs: attrs.join('; ') });
    }
  }

  header(url: string): string {
    const u = new URL(url);
    return [...this.cookies.values()]
      .filter((c) => c.host === u.hostname && (u.pathname === c.path || u.pathname.startsWith(c.path.endsWith('/') ? c.path : `${c.path}/`)))
      .map((c) => `${c.name}=${c.value}`)
      .join('; ');
  }

  get(name: string): { value: string; attrs: string } | undefined {
    return [...this.cookies.values()].find((c) => c.name === name);
  }

  set(name: string, value: string, cookiePath: string): void {
    this.cookies.set(`127.0.0.1|${cookiePath}|${name}`, { host: '127.0.0.1', name, value, path: cookiePath, attrs: '' });
  }

  clone(): CookieJar {
    const copy = new CookieJar();
    for (const [k, v] of this.cookies) copy.cookies.set(k, { ...v });
    return copy;
  }
}

/** One request as a browser sends it (its cookies, no automatic redirects). */
async function go(jar: CookieJar, url: string, init: { method?: string; form?: Record<string, string> } = {}): Promise<Response> {
  const headers: Record<string, string> = {};
  const cookie = jar.header(url);
  if (cookie) headers.cookie = cookie;
  if (init.form) headers['content-type'] = 'application/x-www-form-urlencoded';
  const res = await fetch(url, {
    method: init.method ?? 'GET',
    redirect: 'manual',
    headers,
    body: init.form ? new URLSearchParams(init.form).toString() : undefined,
  });
  jar.store(url, res);
  return res;
}

const locationOf = (res: Response, base: string): string => new URL(res.headers.get('location') ?? '', base).href;
const isRedirect = (res: Response) => res.status >= 300 && res.status < 400;

describe('School sign-on through OpenID Connect (integration, real provider and server)', () => {
  let db: DataSource;
  let provider: ProviderProcess;
  let server: ServerProcess;
  let accountsDir: string;
  let teacher: UserEntity;
  let mixedCaseTeacher: UserEntity;
  let deactivated: UserEntity;
  let unverifiedTarget: UserEntity;

  const uniqueEmail = (tag: string) => `sign-on-${tag}-${randomUUID().slice(0, 8)}@school.example`;

  beforeAll(async () => {
    db = await openDatabase();
    const school = await makeSchool(db);
    teacher = await makeUser(db, school, 'teacher', { email: uniqueEmail('teacher'), displayName: 'Ms. Sign-on Teacher' });
    mixedCaseTeacher = await makeUser(db, school, 'teacher', { email: uniqueEmail('mixed') });
    deactivated = await makeUser(db, school, 'teacher', { email: uniqueEmail('gone'), active: false });
    unverifiedTarget = await makeUser(db, school, 'teacher', { email: uniqueEmail('target') });

    accountsDir = mkdtempSync(path.join(tmpdir(), 'covalent-sign-on-'));
    const account = (login: string, email: string, email_verified = true) => ({ login, password: PASSWORD, email, email_verified, name: `Person ${login}` });
    writeFileSync(
      path.join(accountsDir, 'accounts.json'),
      JSON.stringify({
        accounts: [
          account('teacher', teacher.email),
          account('mixedcase', mixedCaseTeacher.email.toUpperCase()),
          account('gone', deactivated.email),
          account('unverified', unverifiedTarget.email, false),
          account('stranger', uniqueEmail('stranger')),
        ],
      }),
    );

    const serverPort = await freePort();
    const redirectUri = `http://127.0.0.1:${serverPort}/api/auth/sign-on/callback`;
    provider = await startProvider(await freePort(), {
      OIDC_CLIENT_ID: CLIENT_ID,
      OIDC_CLIENT_SECRET: CLIENT_SECRET,
      OIDC_REDIRECT_URI: redirectUri,
      OIDC_ACCOUNTS_FILE: path.join(accountsDir, 'accounts.json'),
    });
    server = await ServerProcess.start(
      { OIDC_ISSUER: provider.issuer, OIDC_CLIENT_ID: CLIENT_ID, OIDC_CLIENT_SECRET: CLIENT_SECRET },
      { port: serverPort },
    );
  }, 60_000);

  afterAll(async () => {
    await server?.stop();
    provider?.child.kill('SIGTERM');
    await provider?.exited;
    await db?.destroy();
    if (accountsDir) rmSync(accountsDir, { recursive: true, force: true });
  });

  /** From `GET /api/auth/sign-on` through the provider's login form to the callback URL it sends the browser back to. */
  async function throughProvider(login: string, password = PASSWORD, startPath = '/api/auth/sign-on') {
    const jar = new CookieJar();
    const start = await go(jar, `${server.url}${startPath}`);
    expect(start.status).toBe(302);
    const authorizeUrl = locationOf(start, server.url);
    let res = await go(jar, authorizeUrl);
    let url = authorizeUrl;
    while (isRedirect(res)) {
      url = locationOf(res, url);
      res = await go(jar, url);
    }
    expect(res.status).toBe(200);
    const form = await res.text();
    const action = /action="([^"]*\/login)"/.exec(form)?.[1];
    if (!action) throw new Error(`no login form at ${url}:\n${form}`);
    const loginRes = await go(jar, new URL(action, url).href, { method: 'POST', form: { login, password } });
    let callbackUrl: string | null = null;
    res = loginRes;
    url = new URL(action, url).href;
    while (isRedirect(res)) {
      url = locationOf(res, url);
      if (url.startsWith(server.url)) {
        callbackUrl = url;
        break;
      }
      res = await go(jar, url);
    }
    return { jar, start, authorizeUrl, loginForm: form, loginRes, callbackUrl };
  }

  async function expectRefused(jar: CookieJar, callbackUrl: string, error: string): Promise<void> {
    const res = await go(jar, callbackUrl);
    expect(res.status).toBe(302);
    expect(res.headers.get('location')).toBe(`${server.url}/sign-in?error=${error}`);
    expect(res.headers.getSetCookie().some((c) => c.startsWith(`${SESSION_COOKIE}=`))).toBe(false);
    expect((await go(jar, `${server.url}/api/me`)).status).toBe(401);
  }

  it('signs a teacher on with the code flow, state, nonce and PKCE, into the same cookie session as a password sign-in', async () => {
    const { jar, start, authorizeUrl, loginForm, callbackUrl } = await throughProvider('teacher');

    // The authorization request (OpenID Connect Core 1.0 §3.1.2.1; RFC 7636 §4.3).
    const authorize = new URL(authorizeUrl);
    expect(authorize.origin + authorize.pathname).toBe(`${provider.issuer}/auth`);
    const q = authorize.searchParams;
    expect(q.get('response_type')).toBe('code');
    expect(q.get('client_id')).toBe(CLIENT_ID);
    expect(q.get('redirect_uri')).toBe(`${server.url}/api/auth/sign-on/callback`);
    expect(q.get('scope')?.split(' ').sort()).toEqual(['email', 'openid', 'profile']);
    expect(q.get('state')).toMatch(/^[\w-]{32,}$/);
    expect(q.get('nonce')).toMatch(/^[\w-]{32,}$/);
    expect(q.get('code_challenge')).toMatch(/^[\w-]{43}$/);
    expect(q.get('code_challenge_method')).toBe('S256');
    expect(authorizeUrl).not.toContain(CLIENT_SECRET);
    // The flow cookie: httpOnly, only for the sign-on routes, the verifier not readable in it.
    const flowCookie = start.headers.getSetCookie().find((c) => c.startsWith(`${SIGN_ON_FLOW_COOKIE}=`))!;
    expect(flowCookie).toMatch(/HttpOnly/i);
    expect(flowCookie).toMatch(/Path=\/api\/auth\/sign-on/);
    expect(flowCookie).toMatch(/SameSite=Lax/i);
    expect(flowCookie).not.toContain(q.get('state')!);

    // The provider's own login page has labelled fields.
    expect(loginForm).toMatch(/<label for="login">Login name<\/label>/);
    expect(loginForm).toMatch(/<label for="password">Password<\/label>/);

    // The authorization response carries the code, our state and the issuer (RFC 9207).
    expect(callbackUrl).not.toBeNull();
    const back = new URL(callbackUrl!);
    expect(back.pathname).toBe('/api/auth/sign-on/callback');
    expect(back.searchParams.get('code')).toBeTruthy();
    expect(back.searchParams.get('state')).toBe(q.get('state'));
    expect(back.searchParams.get('iss')).toBe(provider.issuer);

    const beforeCallback = jar.clone();
    const done = await go(jar, callbackUrl!);
    expect(done.status).toBe(302);
    expect(done.headers.get('location')).toBe(`${server.url}/`);
    const session = done.headers.getSetCookie().find((c) => c.startsWith(`${SESSION_COOKIE}=`))!;
    expect(session).toMatch(/HttpOnly/i);
    expect(session).toMatch(/SameSite=Lax/i);
    expect(session).toMatch(/Path=\//);
    expect(jar.get(SIGN_ON_FLOW_COOKIE)).toBeUndefined(); // spent

    const me = await go(jar, `${server.url}/api/me`);
    expect(me.status).toBe(200);
    expect(await me.json()).toMatchObject({ id: teacher.id, email: teacher.email, displayName: 'Ms. Sign-on Teacher', role: 'teacher' });

    // Single use: the same callback with the same flow cookie is refused, and makes no session.
    await expectRefused(beforeCallback, callbackUrl!, 'sign_on_expired');
    // Signing out ends the sign-on session like any other.
    expect((await go(jar, `${server.url}/api/auth/sign-out`, { method: 'POST' })).status).toBe(204);
    expect((await go(jar, `${server.url}/api/me`)).status).toBe(401);
  });

  it('matches the e-mail case-insensitively and returns to the in-app page named in ?next=', async () => {
    const { jar, callbackUrl } = await throughProvider('mixedcase', PASSWORD, `/api/auth/sign-on?next=${encodeURIComponent('/banks')}`);
    const done = await go(jar, callbackUrl!);
    expect(done.headers.get('location')).toBe(`${server.url}/banks`);
    expect(await (await go(jar, `${server.url}/api/me`)).json()).toMatchObject({ id: mixedCaseTeacher.id });
  });

  it('refuses a provider account whose e-mail has no Covalent account, and creates none', async () => {
    const { jar, callbackUrl } = await throughProvider('stranger');
    await expectRefused(jar, callbackUrl!, 'no_account');
    const count = await db.query(`SELECT count(*)::int AS n FROM users WHERE email LIKE 'sign-on-stranger-%'`);
    expect(count[0].n).toBe(0);
  });

  it('refuses a deactivated account', async () => {
    const { jar, callbackUrl } = await throughProvider('gone');
    await expectRefused(jar, callbackUrl!, 'account_deactivated');
  });

  it('refuses an unverified e-mail even when it matches an active account (OIDC Core 1.0 §5.1, email_verified)', async () => {
    const { jar, callbackUrl } = await throughProvider('unverified');
    await expectRefused(jar, callbackUrl!, 'email_unverified');
  });

  it('refuses a tampered state (OIDC Core 1.0 §3.1.2.7, RFC 6749 §10.12) and a duplicated one, then still accepts the real answer', async () => {
    const { jar, callbackUrl } = await throughProvider('teacher');
    const tampered = new URL(callbackUrl!);
    tampered.searchParams.set('state', `${tampered.searchParams.get('state')}x`);
    await expectRefused(jar.clone(), tampered.href, 'state_mismatch');
    const doubled = new URL(callbackUrl!);
    doubled.searchParams.append('state', doubled.searchParams.get('state')!);
    await expectRefused(jar.clone(), doubled.href, 'state_mismatch');
    // A forged answer does not spend the real one.
    const done = await go(jar, callbackUrl!);
    expect(done.headers.get('location')).toBe(`${server.url}/`);
  });

  it('refuses a tampered flow cookie and a callback without one', async () => {
    const { jar, callbackUrl } = await throughProvider('teacher');
    const flow = jar.get(SIGN_ON_FLOW_COOKIE)!.value;
    const flipped = flow.slice(0, -2) + (flow.at(-2) === 'A' ? 'B' : 'A') + flow.at(-1);
    const forged = jar.clone();
    forged.set(SIGN_ON_FLOW_COOKIE, flipped, '/api/auth/sign-on');
    await expectRefused(forged, callbackUrl!, 'sign_on_expired');
    await expectRefused(new CookieJar(), callbackUrl!, 'sign_on_expired');
  });

  it('answers bad input on the callback with the sign-in page, never a 500', async () => {
    // Each case gets a flow of its own: a callback that matches the state spends it.
    const freshFlow = async () => {
      const jar = new CookieJar();
      const start = await go(jar, `${server.url}/api/auth/sign-on`);
      return { jar, state: new URL(locationOf(start, server.url)).searchParams.get('state')! };
    };
    const callback = (query: string) => `${server.url}/api/auth/sign-on/callback?${query}`;
    await expectRefused(new CookieJar(), callback(''), 'sign_on_expired');
    await expectRefused(new CookieJar(), callback('code=%E0%A4%A&state=%%%'), 'sign_on_expired');
    let f = await freshFlow();
    await expectRefused(f.jar, callback(`state=${f.state}`), 'sign_on_invalid');
    // A made-up code is refused by the provider's token endpoint (invalid_grant).
    f = await freshFlow();
    await expectRefused(f.jar, callback(`code=not-a-real-code&state=${f.state}&iss=${encodeURIComponent(provider.issuer)}`), 'provider_error');
    f = await freshFlow();
    await expectRefused(f.jar, callback(`error=server_error&state=${f.state}`), 'provider_error');
    f = await freshFlow();
    const kept = f.jar.clone();
    await expectRefused(f.jar, callback(`error=access_denied&state=${f.state}`), 'sign_on_cancelled');
    // Even the browser's copy of the flow cookie cannot be used again: its state is spent.
    await expectRefused(kept, callback(`error=access_denied&state=${f.state}`), 'sign_on_expired');
  });

  it("refuses a wrong password on the provider's page with its own message and never reaches Covalent", async () => {
    const { loginRes, callbackUrl } = await throughProvider('teacher', 'not the password');
    expect(loginRes.status).toBe(401);
    expect(await loginRes.text()).toContain('That login name and password do not match a school account.');
    expect(callbackUrl).toBeNull();
  });

  it("treats Cancel at the provider as a cancelled sign-on (the provider's access_denied)", async () => {
    const jar = new CookieJar();
    const start = await go(jar, `${server.url}/api/auth/sign-on`);
    let url = locationOf(start, server.url);
    let res = await go(jar, url);
    while (isRedirect(res)) {
      url = locationOf(res, url);
      res = await go(jar, url);
    }
    const abort = /action="([^"]*\/abort)"/.exec(await res.text())![1];
    url = new URL(abort, url).href;
    res = await go(jar, url, { method: 'POST' });
    while (isRedirect(res) && !locationOf(res, url).startsWith(server.url)) {
      url = locationOf(res, url);
      res = await go(jar, url);
    }
    const callbackUrl = locationOf(res, url);
    expect(new URL(callbackUrl).searchParams.get('error')).toBe('access_denied');
    await expectRefused(jar, callbackUrl, 'sign_on_cancelled');
  });

  it('the provider requires PKCE: an authorization request without a code_challenge is refused (RFC 7636 §4.4.1)', async () => {
    const url = new URL(`${provider.issuer}/auth`);
    url.search = new URLSearchParams({
      client_id: CLIENT_ID,
      response_type: 'code',
      scope: 'openid email',
      redirect_uri: `${server.url}/api/auth/sign-on/callback`,
      state: 'some-state',
      nonce: 'some-nonce',
    }).toString();
    const res = await fetch(url, { redirect: 'manual' });
    const back = new URL(res.headers.get('location')!);
    expect(back.searchParams.get('error')).toBe('invalid_request');
    expect(back.searchParams.get('error_description')).toMatch(/PKCE/);
  });

  it('tells the host app that sign-on is available', async () => {
    const res = await fetch(`${server.url}/api/auth/config`);
    expect(await res.json()).toEqual({ signOn: true });
  });

  it('is off without OIDC_ISSUER: 404 in the one error shape, and the host app is told', async () => {
    const plain = await ServerProcess.start();
    try {
      const res = await fetch(`${plain.url}/api/auth/sign-on`, { redirect: 'manual' });
      expect(res.status).toBe(404);
      expect(await res.json()).toEqual({ ok: false, error: 'sign_on_unavailable', message: expect.any(String) });
      expect((await fetch(`${plain.url}/api/auth/sign-on/callback?code=x&state=y`, { redirect: 'manual' })).status).toBe(404);
      expect(await (await fetch(`${plain.url}/api/auth/config`)).json()).toEqual({ signOn: false });
    } finally {
      await plain.stop();
    }
  }, 30_000);

  it('sends the browser back with a clear code when the provider cannot be reached', async () => {
    const nowhere = `http://127.0.0.1:${await freePort()}`;
    const down = await ServerProcess.start({ OIDC_ISSUER: nowhere, OIDC_CLIENT_ID: CLIENT_ID, OIDC_CLIENT_SECRET: CLIENT_SECRET });
    try {
      const res = await fetch(`${down.url}/api/auth/sign-on`, { redirect: 'manual' });
      expect(res.status).toBe(302);
      expect(res.headers.get('location')).toBe(`${down.url}/sign-in?error=provider_unreachable`);
    } finally {
      await down.stop();
    }
  }, 30_000);

  it('the provider stops cleanly on SIGTERM', async () => {
    const p = await startProvider(await freePort(), { OIDC_ACCOUNTS_FILE: path.join(accountsDir, 'accounts.json') });
    p.child.kill('SIGTERM');
    expect(await p.exited).toBe(0);
  }, 30_000);
});
