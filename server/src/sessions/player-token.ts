import { createHmac, timingSafeEqual } from 'node:crypto';

export interface PlayerTokenClaims {
  sessionId: string;
  playerId: string;
  tokenVersion: number;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function sign(secret: string, payload: string): string {
  return createHmac('sha256', secret).update(payload).digest('base64url');
}

/** `sessionId.playerId.tokenVersion.HMAC-SHA256(secret, those three)`: nothing secret inside, nothing forgeable. */
export function signPlayerToken(secret: string, claims: PlayerTokenClaims): string {
  const payload = `${claims.sessionId}.${claims.playerId}.${claims.tokenVersion}`;
  return `${payload}.${sign(secret, payload)}`;
}

/** The claims of a well-formed token with a valid signature, else null. Whether the player is still in is the caller's check. */
export function verifyPlayerToken(secret: string, token: unknown): PlayerTokenClaims | null {
  if (typeof token !== 'string' || token.length > 200) return null;
  const parts = token.split('.');
  if (parts.length !== 4) return null;
  const [sessionId, playerId, version, signature] = parts;
  if (!UUID.test(sessionId) || !UUID.test(playerId) || !/^\d{1,9}$/.test(version)) return null;
  const expected = Buffer.from(sign(secret, `${sessionId}.${playerId}.${version}`));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return null;
  return { sessionId: sessionId.toLowerCase(), playerId: playerId.toLowerCase(), tokenVersion: Number(version) };
}
