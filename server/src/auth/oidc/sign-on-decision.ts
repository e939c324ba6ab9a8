// The pure parts of school sign-on: what the provider's answer means for Covalent. No I/O here.

import { SIGN_ON_ERRORS, type SignOnError } from '@covalent/shared-types';

export { SIGN_ON_ERRORS, type SignOnError };

export type Decision<T> = { ok: true; value: T } | { ok: false; error: SignOnError };

const EMAIL = /^[^\s@]+@[^\s@]+$/;

/**
 * The e-mail address to look an account up by. Only a verified address counts: an unverified
 * `email` claim is just a string the user typed at the provider (OpenID Connect Core 1.0 §5.1,
 * `email_verified`; §5.7 warns against using unverified e-mail as an identifier).
 * Normalised the way Covalent stores e-mails: trimmed and lower-cased.
 */
export function emailFromClaims(claims: Record<string, unknown> | undefined): Decision<string> {
  const email = claims?.email;
  if (typeof email !== 'string' || !EMAIL.test(email.trim()) || email.length > 254) return { ok: false, error: 'email_missing' };
  if (claims?.email_verified !== true) return { ok: false, error: 'email_unverified' };
  return { ok: true, value: email.trim().toLowerCase() };
}

/** Sign-on never creates accounts (they come from admin invitations) and never revives a deactivated one. */
export function decideSignOnUser<U extends { id: string; active: boolean }>(user: U | null): Decision<U> {
  if (!user) return { ok: false, error: 'no_account' };
  if (!user.active) return { ok: false, error: 'account_deactivated' };
  return { ok: true, value: user };
}

/** The error code for an `error` parameter in the authorization response (OpenID Connect Core 1.0 §3.1.2.6). */
export function errorForAuthorizationError(error: string): SignOnError {
  return error === 'access_denied' ? 'sign_on_cancelled' : 'provider_error';
}

/** The error code for anything openid-client or the network threw while finishing a sign-on. */
export function signOnErrorFor(err: unknown): SignOnError {
  const e = (typeof err === 'object' && err !== null ? err : {}) as { code?: unknown; error?: unknown; name?: unknown; cause?: unknown };
  switch (e.code) {
    case 'OAUTH_AUTHORIZATION_RESPONSE_ERROR':
      return errorForAuthorizationError(String(e.error ?? ''));
    case 'OAUTH_RESPONSE_BODY_ERROR': // e.g. invalid_grant: a spent or expired code, a wrong PKCE verifier
      return 'provider_error';
    case 'OAUTH_TIMEOUT':
    case 'OAUTH_ABORT':
      return 'provider_unreachable';
    case 'OAUTH_INVALID_RESPONSE': // a missing or wrong state or iss in the response, a malformed ID token
    case 'OAUTH_JWT_CLAIM_COMPARISON_FAILED': // nonce, iss, aud or azp do not match
    case 'OAUTH_JWT_TIMESTAMP_CHECK_FAILED': // exp or iat out of range
    case 'OAUTH_JSON_ATTRIBUTE_COMPARISON_FAILED':
    case 'OAUTH_KEY_SELECTION_FAILED':
    case 'OAUTH_JWS_SIGNATURE_VERIFICATION_FAILED':
    case 'OAUTH_INVALID_REQUEST':
      return 'sign_on_invalid';
  }
  // fetch() rejects with a TypeError when nothing answers (connection refused, DNS, TLS).
  if (err instanceof TypeError || e.name === 'TimeoutError' || e.name === 'AbortError') return 'provider_unreachable';
  const causeCode = (e.cause as { code?: unknown } | undefined)?.code;
  if (typeof causeCode === 'string' && /^(ECONNREFUSED|ECONNRESET|ENOTFOUND|ETIMEDOUT|EAI_AGAIN)$/.test(causeCode)) return 'provider_unreachable';
  return 'provider_error';
}

export interface AuthorizationRequest {
  redirectUri: string;
  scope: string;
  state: string;
  nonce: string;
  codeChallenge: string;
}

/**
 * The authorization request's parameters: the code flow (OpenID Connect Core 1.0 §3.1.2.1) with
 * `state` against cross-site request forgery (RFC 6749 §10.12), `nonce` bound to the ID token
 * (§3.1.2.1, checked per §3.1.3.7) and a PKCE S256 challenge (RFC 7636 §4.2–4.3).
 */
export function authorizationParams(req: AuthorizationRequest): Record<string, string> {
  return {
    response_type: 'code',
    redirect_uri: req.redirectUri,
    scope: req.scope,
    state: req.state,
    nonce: req.nonce,
    code_challenge: req.codeChallenge,
    code_challenge_method: 'S256',
  };
}

/** An in-app path to land on after signing on; anything else (other sites, `//host`, odd characters) becomes `/`. */
export function safeNextPath(next: unknown): string {
  if (typeof next !== 'string' || next.length > 500) return '/';
  if (!next.startsWith('/') || next.startsWith('//') || /[\\\s]/.test(next)) return '/';
  if (next.startsWith('/api/') || next === '/sign-in' || next.startsWith('/sign-in?')) return '/';
  return next;
}

/** Where a failed sign-on sends the browser: the host app's sign-in page, which explains the code. */
export function signInErrorLocation(publicUrl: string, error: SignOnError): string {
  return `${publicUrl}/sign-in?error=${encodeURIComponent(error)}`;
}
