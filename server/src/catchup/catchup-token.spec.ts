import { createHmac } from 'node:crypto';
import { signCatchupToken, verifyCatchupToken } from './catchup-token';

const SECRET = 'test-secret-test-secret-test-secret-0123';
const claims = { catchupId: '11111111-1111-4111-8111-111111111111', rosterEntryId: '22222222-2222-4222-8222-222222222222' };

describe('signCatchupToken', () => {
  it('signs with HMAC-SHA256 over the prefixed claims (RFC 2104, via node:crypto)', () => {
    const token = signCatchupToken(SECRET, claims);
    const mac = createHmac('sha256', SECRET).update(`catchup:${claims.catchupId}.${claims.rosterEntryId}`).digest('base64url');
    expect(token).toBe(`${claims.catchupId}.${claims.rosterEntryId}.${mac}`);
  });

  it('round-trips through verifyCatchupToken', () => {
    expect(verifyCatchupToken(SECRET, signCatchupToken(SECRET, claims))).toEqual(claims);
  });

  it('refuses another secret, another roster entry, and garbage', () => {
    const token = signCatchupToken(SECRET, claims);
    expect(verifyCatchupToken('another-secret', token)).toBeNull();
    const [c, , mac] = token.split('.');
    expect(verifyCatchupToken(SECRET, `${c}.33333333-3333-4333-8333-333333333333.${mac}`)).toBeNull();
    expect(verifyCatchupToken(SECRET, 'x.y.z')).toBeNull();
    expect(verifyCatchupToken(SECRET, 42)).toBeNull();
  });
});
