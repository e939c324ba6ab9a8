import { createHmac, timingSafeEqual } from 'node:crypto';

export interface CatchupTokenClaims {
  catchupId: string;
  rosterEntryId: string;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

// The "catchup:" prefix keeps these signatures apart from player tokens made with the same secret.
function sign(secret: string, payload: string): string {
  return createHmac('sha256', secret).update(`catchup:${payload}`).digest('base64url');
}

/** `catchupId.rosterEntryId.HMAC-SHA256(secret, "catchup:" + both)`: nothing secret inside, nothing forgeable. */
export function signCatchupToken(secret: string, claims: CatchupTokenClaims): string {
  const payload = `${claims.catchupId}.${claims.rosterEntryId}`;
  return `${payload}.${sign(secret, payload)}`;
}

/** The claims of a well-formed token with a valid signature, else null. */
export function verifyCatchupToken(secret: string, token: unknown): CatchupTokenClaims | null {
  if (typeof token !== 'string' || token.length > 200) return null;
  const parts = token.split('.');
  if (parts.length !== 3) return null;
  const [catchupId, rosterEntryId, signature] = parts;
  if (!UUID.test(catchupId) || !UUID.test(rosterEntryId)) return null;
  const expected = Buffer.from(sign(secret, `${catchupId}.${rosterEntryId}`));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return null;
  return { catchupId: catchupId.toLowerCase(), rosterEntryId: rosterEntryId.toLowerCase() };
}
