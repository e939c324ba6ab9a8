import { openSignOnFlow, sameState, sealSignOnFlow, SignOnFlow, SpentStates } from './sign-on-flow';

const SECRET = 'unit-secret-unit-secret-unit-secret-0123';
const NOW = 1_800_000_000_000;
const flow: SignOnFlow = { state: 'state-abc', nonce: 'nonce-def', codeVerifier: 'verifier-ghi', next: '/banks', exp: NOW + 60_000 };

describe('sealSignOnFlow / openSignOnFlow', () => {
  it('round-trips the flow before it expires', () => {
    expect(openSignOnFlow(SECRET, sealSignOnFlow(SECRET, flow), NOW)).toEqual(flow);
  });

  it('keeps the PKCE verifier and nonce unreadable to the browser', () => {
    const sealed = sealSignOnFlow(SECRET, flow);
    const visible = Buffer.from(sealed.split('.')[1], 'base64url').toString('latin1');
    expect(visible).not.toContain('verifier-ghi');
    expect(visible).not.toContain('nonce-def');
  });

  it('refuses an expired flow (short-lived)', () => {
    expect(openSignOnFlow(SECRET, sealSignOnFlow(SECRET, flow), flow.exp)).toBeNull();
  });

  it('refuses a flow sealed with another secret', () => {
    expect(openSignOnFlow('another-secret-another-secret-another-0', sealSignOnFlow(SECRET, flow), NOW)).toBeNull();
  });

  it('refuses any change to the sealed value', () => {
    const sealed = sealSignOnFlow(SECRET, flow);
    const raw = Buffer.from(sealed.split('.')[1], 'base64url');
    for (const i of [0, 13, raw.length - 1]) {
      const tampered = Buffer.from(raw);
      tampered[i] ^= 1;
      expect(openSignOnFlow(SECRET, `v1.${tampered.toString('base64url')}`, NOW)).toBeNull();
    }
  });

  it.each([[undefined], [''], ['v1.'], ['v2.abc'], ['v1.***'], ['v1.a.b'], ['x'.repeat(3000)], [42]])('refuses garbage %j without throwing', (value) => {
    expect(openSignOnFlow(SECRET, value, NOW)).toBeNull();
  });
});

describe('sameState', () => {
  it('matches only the identical state', () => {
    expect(sameState('abc', 'abc')).toBe(true);
    expect(sameState('abc', 'abd')).toBe(false);
    expect(sameState('abc', 'abcd')).toBe(false);
    expect(sameState('abc', null)).toBe(false);
  });
});

describe(SpentStates.name, () => {
  it('lets a state be used once', () => {
    const spent = new SpentStates();
    expect(spent.spend('s1', NOW + 1000, NOW)).toBe(true);
    expect(spent.spend('s1', NOW + 1000, NOW + 10)).toBe(false);
    expect(spent.spend('s2', NOW + 1000, NOW + 10)).toBe(true);
  });

  it('forgets states once they have expired anyway', () => {
    const spent = new SpentStates();
    spent.spend('s1', NOW + 1000, NOW);
    expect(spent.spend('s1', NOW + 5000, NOW + 1000)).toBe(true);
  });

  it('stays bounded', () => {
    const spent = new SpentStates(2);
    spent.spend('a', NOW + 1000, NOW);
    spent.spend('b', NOW + 1000, NOW);
    spent.spend('c', NOW + 1000, NOW);
    expect(spent.spend('a', NOW + 1000, NOW)).toBe(true);
    expect(spent.spend('c', NOW + 1000, NOW)).toBe(false);
  });
});
