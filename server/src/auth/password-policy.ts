import { dictionary } from '@zxcvbn-ts/language-common';

/** NIST SP 800-63B-4 §3.1.1.2: at least 15 characters for a single-factor password. */
export const PASSWORD_MIN_LENGTH = 15;
/** The same section asks verifiers to permit at least 64; we allow more. */
export const PASSWORD_MAX_LENGTH = 128;

const COMMON = new Set(dictionary['passwords-common'].map((p) => p.toLowerCase()));

/** NFKC before hashing and comparing, as 800-63B asks for Unicode passwords. */
export function normalisePassword(password: string): string {
  return password.normalize('NFKC');
}

/** Problems with a chosen password, as sentences; empty when it is acceptable. No composition rules. */
export function passwordProblems(password: string, context: { email?: string; displayName?: string } = {}): string[] {
  const normalised = normalisePassword(password);
  const length = [...normalised].length; // code points, not UTF-16 units
  const lower = normalised.toLowerCase();
  const problems: string[] = [];
  if (length < PASSWORD_MIN_LENGTH) problems.push(`Use at least ${PASSWORD_MIN_LENGTH} characters; a few words make a good passphrase.`);
  if (length > PASSWORD_MAX_LENGTH) problems.push(`Use at most ${PASSWORD_MAX_LENGTH} characters.`);
  if (COMMON.has(lower)) problems.push('This password appears in lists of common or breached passwords.');
  if (/^(.)\1+$/u.test(normalised)) problems.push('Do not repeat one character.');
  if (isSequential(lower)) problems.push('Do not use a run of consecutive characters.');
  const contextWords = ['covalent', context.email?.split('@')[0], ...(context.displayName?.split(/\s+/) ?? [])]
    .filter((w): w is string => !!w && w.length >= 4)
    .map((w) => w.toLowerCase());
  const stripped = contextWords.reduce((s, w) => s.split(w).join(''), lower);
  if (contextWords.some((w) => lower.includes(w)) && [...stripped].length < PASSWORD_MIN_LENGTH) {
    problems.push('Do not build the password from your name, e-mail or the product name.');
  }
  return problems;
}

function isSequential(s: string): boolean {
  if (s.length < 3) return false;
  const codes = [...s].map((c) => c.codePointAt(0) ?? 0);
  const step = codes[1] - codes[0];
  return Math.abs(step) === 1 && codes.every((c, i) => i === 0 || c - codes[i - 1] === step);
}
