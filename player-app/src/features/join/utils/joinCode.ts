/**
 * Join codes (DESIGN.md §3): 6 characters from an alphabet without the look-alikes
 * 0/O and 1/I/L. The server holds the authoritative copy; this one gives fast feedback.
 */
export const JOIN_CODE_ALPHABET = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';
export const JOIN_CODE_LENGTH = 6;

/** Characters people type between groups ("ABC 234", "ABC-234"); ignored. */
const SEPARATORS = /[\s\-\u2010-\u2015]/g;

/** Upper-cases and drops spaces and dashes; does not otherwise repair the code. */
export function normaliseJoinCode(raw: string): string {
  return raw.replace(SEPARATORS, '').toUpperCase();
}

/** Characters of the (normalised) code that are not in the alphabet, in order, without repeats. */
export function invalidJoinCodeCharacters(raw: string): string[] {
  const seen = new Set<string>();
  for (const char of normaliseJoinCode(raw)) {
    if (!JOIN_CODE_ALPHABET.includes(char)) seen.add(char);
  }
  return [...seen];
}

/** True when the code, once normalised, is exactly 6 characters of the alphabet. */
export function isValidJoinCode(raw: string): boolean {
  const code = normaliseJoinCode(raw);
  return code.length === JOIN_CODE_LENGTH && invalidJoinCodeCharacters(code).length === 0;
}
