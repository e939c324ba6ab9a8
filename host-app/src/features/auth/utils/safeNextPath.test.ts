import { describe, expect, it } from 'vitest';
import { safeNextPath } from './safeNextPath';

describe('safeNextPath', () => {
  it('keeps in-app paths', () => {
    expect(safeNextPath('/banks')).toBe('/banks');
    expect(safeNextPath('/sessions?x=1')).toBe('/sessions?x=1');
  });

  // OWASP Unvalidated Redirects cheat sheet: allow only relative, same-site targets.
  it('drops absolute and protocol-relative targets', () => {
    expect(safeNextPath('https://elsewhere.example/')).toBeUndefined();
    expect(safeNextPath('//elsewhere.example/')).toBeUndefined();
    expect(safeNextPath('/\\elsewhere.example/')).toBeUndefined();
    expect(safeNextPath('javascript:alert(1)')).toBeUndefined();
    expect(safeNextPath(null)).toBeUndefined();
  });
});
