// A local OpenID provider for development and tests (like the mail catcher, a dev process the
// scripts start): `node server/dev/oidc-provider.mjs <port>`. Issuer http://127.0.0.1:<port>,
// one confidential client, accounts from fixtures/demo/sign-on.json (demo only), and a small
// login page of its own. Never for real use: keys and cookie secrets are made up at every start
// and everything lives in memory.
//
// Environment (the scripts pass the same values to the Covalent server):
//   OIDC_CLIENT_ID, OIDC_CLIENT_SECRET  the one client
//   OIDC_REDIRECT_URI                   its redirect URI (comma-separated for several)
//   OIDC_ACCOUNTS_FILE                  accounts JSON (default: fixtures/demo/sign-on.json)
import { generateKeyPairSync, randomBytes, timingSafeEqual, createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import Provider from 'oidc-provider';

const here = dirname(fileURLToPath(import.meta.url));
const HOST = '127.0.0.1';
const port = Number(process.argv[2] ?? 9090);
if (!Number.isInteger(port) || port < 1 || port > 65535) {
  console.error(`usage: node server/dev/oidc-provider.mjs <port> (got ${process.argv[2]})`);
  process.exit(2);
}
const issuer = `http://${HOST}:${port}`;
const clientId = process.env.OIDC_CLIENT_ID || 'covalent-local';
const clientSecret = process.env.OIDC_CLIENT_SECRET || 'covalent-local-sign-on-secret-dev-only';
const redirectUris = (process.env.OIDC_REDIRECT_URI || 'http://127.0.0.1:3000/api/auth/sign-on/callback')
  .split(',')
  .map((u) => u.trim())
  .filter(Boolean);
const accountsFile = process.env.OIDC_ACCOUNTS_FILE || resolve(here, '../../fixtures/demo/sign-on.json');

/** @typedef {{ login: string, password: string, email: string, email_verified: boolean, name: string }} DemoAccount */
/** @type {DemoAccount[]} */
const accounts = JSON.parse(readFileSync(accountsFile, 'utf8')).accounts;
for (const a of accounts) {
  if (!a.login || !a.password || !a.email || typeof a.email_verified !== 'boolean' || !a.name) {
    console.error(`${accountsFile}: every account needs login, password, email, email_verified and name`);
    process.exit(2);
  }
}
// The subject is the login name: stable for one account, never reassigned (OIDC Core 1.0 §2, "sub").
const bySub = new Map(accounts.map((a) => [a.login.toLowerCase(), a]));

const sha = (s) => createHash('sha256').update(s).digest();
/** The account for a login name and password, or null; compares digests so timing says nothing. */
function checkLogin(login, password) {
  const account = bySub.get(String(login ?? '').trim().toLowerCase());
  const ok = timingSafeEqual(sha(String(password ?? '')), sha(account?.password ?? randomBytes(16).toString('hex')));
  return account && ok ? account : null;
}

const { privateKey } = generateKeyPairSync('rsa', { modulusLength: 2048 });
const signingKey = { ...privateKey.export({ format: 'jwk' }), kid: `dev-${randomBytes(4).toString('hex')}`, use: 'sig', alg: 'RS256' };

const esc = (s) => String(s ?? '').replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
function page(title, body) {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${esc(title)}</title>
<style>
  body { font-family: system-ui, sans-serif; background: #f4f2ee; color: #1f2523; margin: 0; }
  main { max-width: 24rem; margin: 3rem auto; background: #fff; padding: 2rem; border-radius: 8px; border: 1px solid #d9d4cc; }
  label { display: block; margin-top: 1rem; font-weight: 600; }
  input { display: block; width: 100%; box-sizing: border-box; padding: .5rem; font-size: 1rem; margin-top: .25rem; }
  button { margin-top: 1.25rem; padding: .6rem 1.2rem; font-size: 1rem; }
  .note { color: #5b625f; font-size: .9rem; }
  [role=alert] { background: #fdecea; border: 1px solid #e0a39c; padding: .75rem; border-radius: 6px; }
</style></head>
<body><main>${body}</main></body></html>`;
}

function loginPage(uid, { error, login } = {}) {
  return page(
    'School sign-on (demo provider)',
    `<h1>School sign-on</h1>
<p class="note">Local demo provider for Covalent development. Demo accounts only.</p>
${error ? `<p role="alert">${esc(error)}</p>` : ''}
<form method="post" action="/interaction/${esc(uid)}/login" autocomplete="off">
  <label for="login">Login name</label>
  <input id="login" name="login" value="${esc(login)}" required autofocus autocapitalize="none" spellcheck="false">
  <label for="password">Password</label>
  <input id="password" name="password" type="password" required>
  <button type="submit">Sign in</button>
</form>
<form method="post" action="/interaction/${esc(uid)}/abort"><button type="submit">Cancel</button></form>`,
  );
}

/** Everything in memory, on purpose: a restart of the demo provider forgets its sessions and codes. */
const store = new Map();
class MemoryAdapter {
  constructor(model) {
    this.model = model;
  }
  key(id) {
    return `${this.model}:${id}`;
  }
  async upsert(id, payload, expiresIn) {
    if (store.size > 5000) for (const [k, e] of store) if (e.expiresAt <= Date.now()) store.delete(k);
    store.set(this.key(id), { payload, expiresAt: expiresIn ? Date.now() + expiresIn * 1000 : Infinity });
    if (payload.grantId) store.set(`grant:${payload.grantId}:${this.key(id)}`, { payload: {}, expiresAt: Infinity });
    if (payload.uid) store.set(`uid:${this.model}:${payload.uid}`, { payload: { id }, expiresAt: Infinity });
  }
  async find(id) {
    const entry = store.get(this.key(id));
    if (!entry || entry.expiresAt <= Date.now()) return undefined;
    return entry.payload;
  }
  async findByUid(uid) {
    const ref = store.get(`uid:${this.model}:${uid}`);
    return ref ? this.find(ref.payload.id) : undefined;
  }
  async findByUserCode() {
    return undefined; // no device flow here
  }
  async consume(id) {
    const entry = store.get(this.key(id));
    if (entry) entry.payload.consumed = Math.floor(Date.now() / 1000);
  }
  async destroy(id) {
    store.delete(this.key(id));
  }
  async revokeByGrantId(grantId) {
    for (const k of [...store.keys()]) {
      if (k.startsWith(`grant:${grantId}:`)) {
        store.delete(k.slice(`grant:${grantId}:`.length));
        store.delete(k);
      }
    }
  }
}

const provider = new Provider(issuer, {
  adapter: MemoryAdapter,
  clients: [
    {
      client_id: clientId,
      client_secret: clientSecret,
      redirect_uris: redirectUris,
      response_types: ['code'],
      grant_types: ['authorization_code'],
      token_endpoint_auth_method: 'client_secret_basic',
    },
  ],
  jwks: { keys: [signingKey] },
  cookies: { keys: [randomBytes(32).toString('base64url')] },
  responseTypes: ['code'],
  scopes: ['openid', 'email', 'profile'],
  claims: { openid: ['sub'], email: ['email', 'email_verified'], profile: ['name'] },
  // Put the granted email/profile claims in the ID token, as school providers commonly do.
  conformIdTokenClaims: false,
  // RFC 7636: every authorization request must carry a code_challenge (S256 is the only method allowed).
  pkce: { required: () => true },
  features: { devInteractions: { enabled: false } },
  interactions: { url: (_ctx, interaction) => `/interaction/${interaction.uid}` },
  ttl: {
    AccessToken: 600,
    AuthorizationCode: 60,
    IdToken: 600,
    Interaction: 600,
    Session: 3600,
    Grant: 3600,
  },
  async findAccount(_ctx, sub) {
    const a = bySub.get(sub);
    if (!a) return undefined;
    return {
      accountId: sub,
      async claims() {
        return { sub, email: a.email, email_verified: a.email_verified, name: a.name };
      },
    };
  },
  async renderError(ctx, out) {
    ctx.type = 'html';
    ctx.body = page('Sign-on problem', `<h1>Sign-on problem</h1><p role="alert">${esc(out.error_description || out.error)}</p>`);
  },
});

/** A grant for everything the client asked for: the demo provider's one client is first-party. */
async function grantFor(details, accountId) {
  const grant = details.grantId
    ? await provider.Grant.find(details.grantId)
    : new provider.Grant({ accountId, clientId: details.params.client_id });
  const missing = details.prompt.details ?? {};
  grant.addOIDCScope([...(missing.missingOIDCScope ?? String(details.params.scope ?? '').split(' '))].join(' '));
  if (missing.missingOIDCClaims) grant.addOIDCClaims(missing.missingOIDCClaims);
  return grant.save();
}

function readForm(req) {
  return new Promise((resolveBody, reject) => {
    let raw = '';
    req.setEncoding('utf8');
    req.on('data', (chunk) => {
      raw += chunk;
      if (raw.length > 10_000) reject(new Error('form too large'));
    });
    req.on('end', () => resolveBody(new URLSearchParams(raw)));
    req.on('error', reject);
  });
}

function send(res, status, html) {
  res.statusCode = status;
  res.setHeader('content-type', 'text/html; charset=utf-8');
  res.setHeader('cache-control', 'no-store');
  res.end(html);
}

const expired = () =>
  page('Sign-on expired', '<h1>Sign-on expired</h1><p role="alert">This sign-on page has expired. Go back to Covalent and start again.</p>');

async function interaction(req, res, uid, action) {
  let details;
  try {
    details = await provider.interactionDetails(req, res);
  } catch {
    return send(res, 400, expired());
  }
  if (details.uid !== uid) return send(res, 400, expired());

  if (req.method === 'GET' && !action) {
    if (details.prompt.name === 'login') return send(res, 200, loginPage(uid));
    // Already signed in at the provider: only the consent step is left, which this client skips.
    const grantId = await grantFor(details, details.session.accountId);
    return provider.interactionFinished(req, res, { consent: { grantId } }, { mergeWithLastSubmission: true });
  }
  if (req.method === 'POST' && action === 'login') {
    const form = await readForm(req);
    const account = checkLogin(form.get('login'), form.get('password'));
    if (!account) {
      return send(res, 401, loginPage(uid, { error: 'That login name and password do not match a school account.', login: form.get('login') }));
    }
    const accountId = account.login.toLowerCase();
    const grantId = await grantFor(details, accountId);
    return provider.interactionFinished(req, res, { login: { accountId }, consent: { grantId } }, { mergeWithLastSubmission: false });
  }
  if (req.method === 'POST' && action === 'abort') {
    return provider.interactionFinished(
      req,
      res,
      { error: 'access_denied', error_description: 'The sign-in was cancelled.' },
      { mergeWithLastSubmission: false },
    );
  }
  return send(res, 405, page('Not allowed', '<p>Not allowed.</p>'));
}

const oidcCallback = provider.callback();
const server = createServer((req, res) => {
  const m = /^\/interaction\/([\w-]+)(?:\/(login|abort))?\/?(?:\?.*)?$/.exec(req.url ?? '');
  if (m) {
    interaction(req, res, m[1], m[2]).catch((err) => {
      console.error(err);
      if (!res.headersSent) send(res, 500, page('Error', '<p role="alert">The demo provider failed; see its output.</p>'));
    });
    return;
  }
  oidcCallback(req, res);
});

server.listen(port, HOST, () => {
  console.log(`oidc provider: issuer ${issuer}, client ${clientId}, ${accounts.length} demo accounts from ${accountsFile}`);
});
server.on('error', (err) => {
  console.error(`oidc provider: ${err.message}`);
  process.exit(1);
});

function stop() {
  server.close(() => process.exit(0));
  server.closeAllConnections();
  setTimeout(() => process.exit(0), 2000).unref();
}
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
