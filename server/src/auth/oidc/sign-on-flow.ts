import { createCipheriv, createDecipheriv, createHmac, randomBytes, timingSafeEqual } from 'node:crypto';

/** What the browser carries between the redirect to the provider and the callback. */
export interface SignOnFlow {
  state: string;
  nonce: string;
  codeVerifier: string;
  /** The in-app path to land on afterwards. */
  next: string;
  /** Expiry, epoch milliseconds. */
  exp: number;
}

export const SIGN_ON_FLOW_COOKIE = 'covalent_sign_on';
/** Only the sign-on routes ever receive the flow cookie. */
export const SIGN_ON_FLOW_COOKIE_PATH = '/api/auth/sign-on';
/** Long enough to type a password at the provider, short enough that a stale flow is useless. */
export const SIGN_ON_FLOW_TTL_MS = 10 * 60 * 1000;

const VERSION = 'v1';
const AAD = Buffer.from(`covalent:sign-on-flow:${VERSION}`);
const B64URL = /^[A-Za-z0-9_-]+$/;

// A key of its own, derived from APP_SECRET, keeps this cookie apart from player and catch-up tokens.
function keyFor(secret: string): Buffer {
  return createHmac('sha256', secret).update('covalent:sign-on-flow-key').digest();
}

/**
 * Seals the flow with AES-256-GCM: the browser can neither read the PKCE verifier or nonce
 * nor change anything without the seal failing.
 */
export function sealSignOnFlow(secret: string, flow: SignOnFlow): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv('aes-256-gcm', keyFor(secret), iv);
  cipher.setAAD(AAD);
  const body = Buffer.concat([cipher.update(JSON.stringify(flow), 'utf8'), cipher.final()]);
  return `${VERSION}.${Buffer.concat([iv, cipher.getAuthTag(), body]).toString('base64url')}`;
}

/** The flow inside a sealed cookie when it is intact and not expired, else null. */
export function openSignOnFlow(secret: string, sealed: unknown, now: number): SignOnFlow | null {
  if (typeof sealed !== 'string' || sealed.length > 2000) return null;
  const [version, data, ...rest] = sealed.split('.');
  if (version !== VERSION || !data || rest.length || !B64URL.test(data)) return null;
  const raw = Buffer.from(data, 'base64url');
  if (raw.length < 12 + 16 + 2) return null;
  let flow: unknown;
  try {
    const decipher = createDecipheriv('aes-256-gcm', keyFor(secret), raw.subarray(0, 12));
    decipher.setAAD(AAD);
    decipher.setAuthTag(raw.subarray(12, 28));
    flow = JSON.parse(Buffer.concat([decipher.update(raw.subarray(28)), decipher.final()]).toString('utf8'));
  } catch {
    return null;
  }
  if (!isFlow(flow) || flow.exp <= now) return null;
  return flow;
}

function isFlow(v: unknown): v is SignOnFlow {
  if (typeof v !== 'object' || v === null) return false;
  const f = v as Record<string, unknown>;
  return (
    typeof f.state === 'string' &&
    typeof f.nonce === 'string' &&
    typeof f.codeVerifier === 'string' &&
    typeof f.next === 'string' &&
    typeof f.exp === 'number'
  );
}

/** Constant-time equality for the returned `state` (it is compared against a secret value). */
export function sameState(expected: string, given: string | null): boolean {
  if (given === null) return false;
  const a = Buffer.from(expected);
  const b = Buffer.from(given);
  return a.length === b.length && timingSafeEqual(a, b);
}

/**
 * States already used on this server, until they would have expired anyway, so a replayed
 * callback is refused even before the provider refuses its spent code.
 */
export class SpentStates {
  private readonly spent = new Map<string, number>();

  constructor(private readonly max = 10_000) {}

  /** Marks a state used; false when it already was. */
  spend(state: string, exp: number, now: number): boolean {
    for (const [s, e] of this.spent) if (e <= now) this.spent.delete(s);
    if (this.spent.has(state)) return false;
    if (this.spent.size >= this.max) this.spent.delete(this.spent.keys().next().value as string);
    this.spent.set(state, exp);
    return true;
  }
}
