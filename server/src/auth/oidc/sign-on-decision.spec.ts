import {
  authorizationParams,
  decideSignOnUser,
  emailFromClaims,
  errorForAuthorizationError,
  safeNextPath,
  SIGN_ON_ERRORS,
  signInErrorLocation,
  signOnErrorFor,
} from './sign-on-decision';

describe('emailFromClaims', () => {
  it('takes a verified e-mail, trimmed and lower-cased the way Covalent stores it', () => {
    expect(emailFromClaims({ sub: 'a', email: ' Teacher@Larchmont-Ridge.Example ', email_verified: true })).toEqual({
      ok: true,
      value: 'teacher@larchmont-ridge.example',
    });
  });

  // OpenID Connect Core 1.0 §5.1 / §5.7: only a verified address may identify the person.
  it.each([
    ['false', false],
    ['the string "true"', 'true'],
    ['missing', undefined],
  ])('refuses an e-mail whose email_verified is %s', (_label, emailVerified) => {
    expect(emailFromClaims({ sub: 'a', email: 'teacher@school.example', email_verified: emailVerified })).toEqual({ ok: false, error: 'email_unverified' });
  });

  it.each([[undefined], [{}], [{ email: 42, email_verified: true }], [{ email: 'not-an-address', email_verified: true }], [{ email: `${'a'.repeat(250)}@b.example`, email_verified: true }]])(
    'says the e-mail is missing when there is no usable address: %j',
    (claims) => {
      expect(emailFromClaims(claims as Record<string, unknown> | undefined)).toEqual({ ok: false, error: 'email_missing' });
    },
  );
});

describe('decideSignOnUser', () => {
  it('signs on an active user', () => {
    const user = { id: 'u1', active: true, displayName: 'X' };
    expect(decideSignOnUser(user)).toEqual({ ok: true, value: user });
  });
  it('never creates an account for an unknown e-mail', () => {
    expect(decideSignOnUser(null)).toEqual({ ok: false, error: 'no_account' });
  });
  it('refuses a deactivated account', () => {
    expect(decideSignOnUser({ id: 'u1', active: false })).toEqual({ ok: false, error: 'account_deactivated' });
  });
});

describe('signOnErrorFor', () => {
  it('maps an access_denied authorization response to "cancelled" and others to a provider error (OIDC Core §3.1.2.6)', () => {
    expect(signOnErrorFor({ code: 'OAUTH_AUTHORIZATION_RESPONSE_ERROR', error: 'access_denied' })).toBe('sign_on_cancelled');
    expect(signOnErrorFor({ code: 'OAUTH_AUTHORIZATION_RESPONSE_ERROR', error: 'login_required' })).toBe('provider_error');
    expect(errorForAuthorizationError('access_denied')).toBe('sign_on_cancelled');
    expect(errorForAuthorizationError('server_error')).toBe('provider_error');
  });

  it('treats a token endpoint refusal (a spent code, a wrong PKCE verifier) as a provider error', () => {
    expect(signOnErrorFor({ code: 'OAUTH_RESPONSE_BODY_ERROR', error: 'invalid_grant' })).toBe('provider_error');
  });

  it('treats a failed ID token or response check as an invalid sign-on (OIDC Core §3.1.3.7)', () => {
    for (const code of ['OAUTH_JWT_CLAIM_COMPARISON_FAILED', 'OAUTH_JWT_TIMESTAMP_CHECK_FAILED', 'OAUTH_INVALID_RESPONSE', 'OAUTH_JWS_SIGNATURE_VERIFICATION_FAILED']) {
      expect(signOnErrorFor({ code })).toBe('sign_on_invalid');
    }
  });

  it('recognises an unreachable provider', () => {
    expect(signOnErrorFor(new TypeError('fetch failed'))).toBe('provider_unreachable');
    expect(signOnErrorFor({ code: 'OAUTH_TIMEOUT' })).toBe('provider_unreachable');
    expect(signOnErrorFor({ message: 'x', cause: { code: 'ECONNREFUSED' } })).toBe('provider_unreachable');
  });

  it('falls back to a provider error for anything else, including non-errors', () => {
    expect(signOnErrorFor(new Error('odd'))).toBe('provider_error');
    expect(signOnErrorFor(undefined)).toBe('provider_error');
    expect(signOnErrorFor('text')).toBe('provider_error');
  });

  it('only ever answers with a known code', () => {
    for (const err of [new Error('x'), { code: 'OAUTH_WHATEVER' }, null, 7]) expect(SIGN_ON_ERRORS).toContain(signOnErrorFor(err));
  });
});

describe('authorizationParams', () => {
  it('asks for the code flow with state, nonce and an S256 PKCE challenge (OIDC Core §3.1.2.1, RFC 7636 §4.3)', () => {
    expect(
      authorizationParams({ redirectUri: 'http://127.0.0.1:3000/api/auth/sign-on/callback', scope: 'openid email profile', state: 's', nonce: 'n', codeChallenge: 'c' }),
    ).toEqual({
      response_type: 'code',
      redirect_uri: 'http://127.0.0.1:3000/api/auth/sign-on/callback',
      scope: 'openid email profile',
      state: 's',
      nonce: 'n',
      code_challenge: 'c',
      code_challenge_method: 'S256',
    });
  });
});

describe('safeNextPath', () => {
  it('keeps an in-app path', () => {
    expect(safeNextPath('/banks?tag=ppe')).toBe('/banks?tag=ppe');
  });
  it.each([[undefined], [''], ['https://elsewhere.example/'], ['//elsewhere.example'], ['/\\elsewhere'], ['/api/me'], ['/sign-in?error=x'], ['/a b'], [['/x']]])(
    'turns %j into /',
    (next) => {
      expect(safeNextPath(next)).toBe('/');
    },
  );
});

describe('signInErrorLocation', () => {
  it('points at the host app sign-in page with the code', () => {
    expect(signInErrorLocation('http://127.0.0.1:3000', 'no_account')).toBe('http://127.0.0.1:3000/sign-in?error=no_account');
  });
});
