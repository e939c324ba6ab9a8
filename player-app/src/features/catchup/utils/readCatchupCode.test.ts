import { describe, expect, it } from 'vitest';
import { readCatchupCode } from './readCatchupCode';

describe('readCatchupCode', () => {
  it('reads the code after /catchup/, upper-cased', () => {
    expect(readCatchupCode('/play/catchup/abc234')).toBe('ABC234');
    expect(readCatchupCode('/play/catchup/ABC234/')).toBe('ABC234');
  });

  it('gives null for other paths and broken encodings', () => {
    expect(readCatchupCode('/play/')).toBeNull();
    expect(readCatchupCode('/play/join/ABC234')).toBeNull();
    expect(readCatchupCode('/play/catchup/%E0%A4%A')).toBeNull();
  });
});
