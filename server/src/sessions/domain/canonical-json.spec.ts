import { canonicalJson } from './canonical-json';

// Key order follows RFC 8785 (JSON Canonicalization Scheme) §3.2.3: object members sorted by key,
// no whitespace (from memory; only the sorting idea is used here, see canonical-json.ts).

describe('canonicalJson', () => {
  it('sorts object keys at every depth and drops whitespace', () => {
    expect(canonicalJson({ b: 1, a: { d: [1, 2], c: 'x' } })).toBe('{"a":{"c":"x","d":[1,2]},"b":1}');
  });

  it('gives equal strings for the same response written in another key order', () => {
    expect(canonicalJson({ type: 'single', optionId: 'b' })).toBe(canonicalJson({ optionId: 'b', type: 'single' }));
  });

  it('keeps array order, so a different sequence is a different choice', () => {
    expect(canonicalJson({ sequence: ['a', 'b'] })).not.toBe(canonicalJson({ sequence: ['b', 'a'] }));
  });

  it('drops undefined members as JSON.stringify does', () => {
    expect(canonicalJson({ a: undefined, b: null })).toBe(JSON.stringify({ b: null }));
    expect(canonicalJson(undefined)).toBe('null');
  });
});
