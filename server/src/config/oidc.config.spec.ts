import { validateEnv } from './env.validation';
import { oidcConfig } from './oidc.config';

const BASE = {
  DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db',
  APP_SECRET: 'unit-secret-unit-secret-unit-secret-0123',
  PUBLIC_URL: 'http://127.0.0.1:3000/',
};

function withEnv<T>(env: Record<string, string>, fn: () => T): T {
  const saved = { ...process.env };
  process.env = { ...env };
  try {
    return fn();
  } finally {
    process.env = saved;
  }
}

describe('OIDC configuration', () => {
  it('leaves sign-on off when OIDC_ISSUER is unset', () => {
    expect(withEnv(BASE, () => oidcConfig())).toMatchObject({ enabled: false });
  });

  it('derives the redirect URI from the public URL and allows http only on loopback', () => {
    const cfg = withEnv({ ...BASE, OIDC_ISSUER: 'http://127.0.0.1:9126', OIDC_CLIENT_ID: 'c', OIDC_CLIENT_SECRET: 's' }, () => oidcConfig());
    expect(cfg).toMatchObject({
      enabled: true,
      issuer: 'http://127.0.0.1:9126',
      redirectUri: 'http://127.0.0.1:3000/api/auth/sign-on/callback',
      allowHttp: true,
      scope: 'openid email profile',
    });
  });

  it('takes an explicit redirect URI and refuses plain http for a provider elsewhere', () => {
    const cfg = withEnv(
      {
        ...BASE,
        PUBLIC_URL: 'https://covalent.school.example',
        OIDC_ISSUER: 'https://sso.school.example',
        OIDC_CLIENT_ID: 'c',
        OIDC_CLIENT_SECRET: 's',
        OIDC_REDIRECT_URI: 'https://covalent.school.example/api/auth/sign-on/callback',
      },
      () => oidcConfig(),
    );
    expect(cfg).toMatchObject({ allowHttp: false, redirectUri: 'https://covalent.school.example/api/auth/sign-on/callback' });
    expect(() => validateEnv({ ...BASE, OIDC_ISSUER: 'http://sso.school.example', OIDC_CLIENT_ID: 'c', OIDC_CLIENT_SECRET: 's' })).toThrow(/OIDC_ISSUER: .*https/);
  });

  it('refuses a redirect URI that does not come back to this server’s callback', () => {
    const sso = { ...BASE, OIDC_ISSUER: 'https://sso.school.example', OIDC_CLIENT_ID: 'c', OIDC_CLIENT_SECRET: 's' };
    // Another origin than PUBLIC_URL: the flow cookie set on 127.0.0.1:3000 would never reach it.
    expect(() => validateEnv({ ...sso, OIDC_REDIRECT_URI: 'https://covalent.school.example/api/auth/sign-on/callback' })).toThrow(
      /OIDC_REDIRECT_URI: must be PUBLIC_URL's origin/,
    );
    expect(() => validateEnv({ ...sso, OIDC_REDIRECT_URI: 'http://127.0.0.1:3001/api/auth/sign-on/callback' })).toThrow(/OIDC_REDIRECT_URI/);
    expect(() => validateEnv({ ...sso, OIDC_REDIRECT_URI: 'http://127.0.0.1:3000/callback' })).toThrow(/OIDC_REDIRECT_URI/);
    expect(() => validateEnv({ ...sso, OIDC_REDIRECT_URI: 'http://127.0.0.1:3000/api/auth/sign-on/callback#x' })).toThrow(/OIDC_REDIRECT_URI/);
    expect(() => validateEnv({ ...sso, OIDC_REDIRECT_URI: 'http://127.0.0.1:3000/api/auth/sign-on/callback?' })).toThrow(/OIDC_REDIRECT_URI/);
    expect(() => validateEnv({ ...sso, OIDC_REDIRECT_URI: 'http://127.0.0.1:3000/api/auth/sign-on/callback' })).not.toThrow();
    // Without sign-on a leftover redirect URI is ignored rather than stopping the server.
    expect(() => validateEnv({ ...BASE, OIDC_REDIRECT_URI: 'https://elsewhere.example/cb' })).not.toThrow();
  });

  it('with sign-on, wants PUBLIC_URL at the server root (the default redirect URI is built from it)', () => {
    const sso = { DATABASE_URL: BASE.DATABASE_URL, APP_SECRET: BASE.APP_SECRET, OIDC_ISSUER: 'https://sso.school.example', OIDC_CLIENT_ID: 'c', OIDC_CLIENT_SECRET: 's' };
    expect(() => validateEnv({ ...sso, PUBLIC_URL: 'https://school.example/covalent' })).toThrow(/OIDC_ISSUER: .*PUBLIC_URL/);
    expect(() => validateEnv({ ...sso, PUBLIC_URL: 'https://school.example/' })).not.toThrow();
    expect(() => validateEnv({ ...sso, PUBLIC_URL: 'https://school.example' })).not.toThrow();
    expect(() => validateEnv({ ...BASE, PUBLIC_URL: 'https://school.example/covalent' })).not.toThrow(); // no sign-on, no rule
  });

  it('names every missing client variable at once when an issuer is set', () => {
    expect(() => validateEnv({ ...BASE, OIDC_ISSUER: 'https://sso.school.example' })).toThrow(/OIDC_CLIENT_ID[\s\S]*OIDC_CLIENT_SECRET/);
  });
});
