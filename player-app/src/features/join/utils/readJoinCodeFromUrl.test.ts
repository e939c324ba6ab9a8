import { describe, expect, it } from 'vitest';
import { readJoinCodeFromUrl } from './readJoinCodeFromUrl';

const at = (pathname: string, search = '') => ({ pathname, search });

describe('readJoinCodeFromUrl', () => {
  it('reads ?code= from the query string', () => {
    expect(readJoinCodeFromUrl(at('/play/', '?code=ABC234'))).toBe('ABC234');
  });

  it('reads the code from /play/join/<code>', () => {
    expect(readJoinCodeFromUrl(at('/play/join/ABC234'))).toBe('ABC234');
    expect(readJoinCodeFromUrl(at('/play/join/ABC234/'))).toBe('ABC234');
  });

  it('normalises what it reads', () => {
    expect(readJoinCodeFromUrl(at('/play/', '?code=abc-234'))).toBe('ABC234');
    expect(readJoinCodeFromUrl(at('/play/join/abc%20234'))).toBe('ABC234');
  });

  it('prefers the query string when both are present', () => {
    expect(readJoinCodeFromUrl(at('/play/join/ZZZ999', '?code=ABC234'))).toBe('ABC234');
  });

  it('returns an empty string when the link has no code', () => {
    expect(readJoinCodeFromUrl(at('/play/'))).toBe('');
    expect(readJoinCodeFromUrl(at('/play/', '?code='))).toBe('');
    expect(readJoinCodeFromUrl(at('/play/join/'))).toBe('');
  });

  it('ignores malformed percent-encoding instead of throwing', () => {
    expect(readJoinCodeFromUrl(at('/play/join/%E0%A4%A'))).toBe('');
  });
});
