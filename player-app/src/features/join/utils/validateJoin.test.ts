import { describe, expect, it } from 'vitest';
import { VALID_CODE } from '@/test/factories';
import {
  NICKNAME_MAX_LENGTH,
  normaliseNickname,
  validateJoin,
  validateJoinCode,
  validateNickname,
} from './validateJoin';

// The nickname rule is the task's product rule (1–20 characters after trimming; letters,
// digits, spaces, simple punctuation) serving DESIGN.md §9: collect no more than a nickname.

describe('normaliseNickname', () => {
  it('trims and collapses inner whitespace', () => {
    expect(normaliseNickname('  Sam \t  J  ')).toBe('Sam J');
  });
});

describe('validateNickname', () => {
  it.each(['Sam', 'Sam J.', "D'Arcy", 'Mei-Lin', 'Zoë', 'Ngọc', 'Ali_7', 'Kai!', '7'])(
    'accepts %s',
    (nickname) => {
      expect(validateNickname(nickname)).toBeUndefined();
    },
  );

  it('refuses an empty or blank nickname', () => {
    expect(validateNickname('')).toBe('Enter a nickname.');
    expect(validateNickname('    ')).toBe('Enter a nickname.');
  });

  it('accepts exactly 20 characters and refuses 21', () => {
    expect(NICKNAME_MAX_LENGTH).toBe(20);
    expect(validateNickname('a'.repeat(20))).toBeUndefined();
    expect(validateNickname('a'.repeat(21))).toMatch(/20 characters/);
  });

  it('counts length after trimming', () => {
    expect(validateNickname(`   ${'a'.repeat(20)}   `)).toBeUndefined();
  });

  it('counts a letter typed with a combining accent as one character', () => {
    // "e" + U+0308 COMBINING DIAERESIS composes to "ë" under NFC (Unicode UAX #15).
    const decomposed = `${'e\u0308'.repeat(20)}`;
    expect(decomposed.length).toBe(40);
    expect(validateNickname(decomposed)).toBeUndefined();
  });

  it.each(['sam@school.org', 'Sam <b>', 'Sam; DROP', 'Sam 😀', 'a/b'])('refuses %s', (nickname) => {
    expect(validateNickname(nickname)).toBe('Use letters, numbers, spaces and simple punctuation only.');
  });
});

describe('validateJoinCode', () => {
  it('asks for a code when empty', () => {
    expect(validateJoinCode(' ')).toBe('Enter the join code shown on the board.');
  });

  it('names the characters that codes never use', () => {
    expect(validateJoinCode('ABC0O1')).toMatch(/"0 O 1"/);
  });

  it('states the expected and actual length', () => {
    expect(validateJoinCode('ABC23')).toBe('A join code has 6 characters; this one has 5.');
  });
});

describe('validateJoin', () => {
  it('returns the values to send, normalised', () => {
    expect(validateJoin({ code: 'abc-234', nickname: '  Sam   J ' })).toEqual({
      ok: true,
      values: { code: VALID_CODE, nickname: 'Sam J' },
    });
  });

  it('reports both fields when both are wrong', () => {
    const result = validateJoin({ code: 'ABCD0I', nickname: '' });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(Object.keys(result.errors).sort()).toEqual(['code', 'nickname']);
  });

  it('reports only the field that is wrong', () => {
    const result = validateJoin({ code: VALID_CODE, nickname: 'x@y.z' });
    expect(result).toEqual({
      ok: false,
      errors: { nickname: 'Use letters, numbers, spaces and simple punctuation only.' },
    });
  });
});
