import { randomInt } from 'node:crypto';
import { JOIN_CODE_ALPHABET, JOIN_CODE_LENGTH } from '@covalent/shared-types';

/** A fresh join code: uniform over the unambiguous alphabet, from the OS's CSPRNG. */
export function newJoinCode(): string {
  let code = '';
  for (let i = 0; i < JOIN_CODE_LENGTH; i++) code += JOIN_CODE_ALPHABET[randomInt(JOIN_CODE_ALPHABET.length)];
  return code;
}

/** What a student typed, tidied: upper case, spaces and dashes dropped; null when it cannot be a code. */
export function normaliseJoinCode(input: unknown): string | null {
  if (typeof input !== 'string' || input.length > 20) return null;
  const code = input.toUpperCase().replace(/[\s-]/g, '');
  if (code.length !== JOIN_CODE_LENGTH) return null;
  for (const ch of code) if (!JOIN_CODE_ALPHABET.includes(ch)) return null;
  return code;
}
