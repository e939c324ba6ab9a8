import { describe, expect, it } from 'vitest';
import {
  JOIN_CODE_ALPHABET,
  JOIN_CODE_LENGTH,
  invalidJoinCodeCharacters,
  isValidJoinCode,
  normaliseJoinCode,
} from './joinCode';
import { VALID_CODE } from '@/test/factories';

// The rule under test is DESIGN.md §3: 6 characters, no 0/O, 1/I/L.
// Dropping look-alike characters from human-typed codes is also the reasoning behind
// Crockford's Base32, which excludes I, L and O (crockford.com/base32.html; from memory).
const EXCLUDED = ['0', 'O', '1', 'I', 'L'] as const;

describe('JOIN_CODE_ALPHABET', () => {
  it('is the 26 Latin capitals and 10 digits minus the five look-alikes', () => {
    const full = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789';
    const expected = [...full].filter((c) => !EXCLUDED.includes(c as (typeof EXCLUDED)[number]));
    expect([...JOIN_CODE_ALPHABET].sort()).toEqual(expected.sort());
    expect(JOIN_CODE_ALPHABET).toHaveLength(31);
  });

  it('has no repeated characters', () => {
    expect(new Set(JOIN_CODE_ALPHABET).size).toBe(JOIN_CODE_ALPHABET.length);
  });

  it('is used with codes of 6 characters', () => {
    expect(JOIN_CODE_LENGTH).toBe(6);
  });
});

describe('normaliseJoinCode', () => {
  it('upper-cases what was typed', () => {
    expect(normaliseJoinCode('abc234')).toBe('ABC234');
  });

  it('ignores spaces and dashes between groups', () => {
    expect(normaliseJoinCode(' abc 234 ')).toBe('ABC234');
    expect(normaliseJoinCode('ABC-234')).toBe('ABC234');
    expect(normaliseJoinCode('AB–C2—34')).toBe('ABC234'); // en and em dashes from phone keyboards
  });

  it('leaves other characters alone so validation can point them out', () => {
    expect(normaliseJoinCode('abc.23o')).toBe('ABC.23O');
  });
});

describe('isValidJoinCode', () => {
  it('accepts a code of six alphabet characters', () => {
    expect(isValidJoinCode(VALID_CODE)).toBe(true);
  });

  it('accepts lower-case and separated input', () => {
    expect(isValidJoinCode('abc234')).toBe(true);
    expect(isValidJoinCode('abc-234')).toBe(true);
  });

  it('accepts every character of the alphabet', () => {
    for (let i = 0; i < JOIN_CODE_ALPHABET.length; i += JOIN_CODE_LENGTH) {
      const chunk = JOIN_CODE_ALPHABET.slice(i, i + JOIN_CODE_LENGTH).padEnd(JOIN_CODE_LENGTH, 'A');
      expect(isValidJoinCode(chunk)).toBe(true);
    }
  });

  it.each(EXCLUDED)('refuses a code containing %s', (char) => {
    const code = `ABC23${char}`;
    expect(isValidJoinCode(code)).toBe(false);
    expect(invalidJoinCodeCharacters(code)).toEqual([char]);
  });

  it.each(['i', 'l', 'o'])('refuses the lower-case look-alike %s', (char) => {
    expect(isValidJoinCode(`ABC23${char}`)).toBe(false);
  });

  it.each([
    ['empty', ''],
    ['five characters', 'ABC23'],
    ['seven characters', 'ABC2345'],
  ])('refuses a code that is %s', (_label, code) => {
    expect(isValidJoinCode(code)).toBe(false);
  });

  it('refuses symbols and non-Latin look-alikes', () => {
    expect(isValidJoinCode('ABC23!')).toBe(false);
    expect(isValidJoinCode('АВС234')).toBe(false); // Cyrillic А, В, С
  });
});
