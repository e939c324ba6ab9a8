import type { ItemKey } from '@covalent/shared-types';
import { distance } from 'fastest-levenshtein';
import { type CheckResult, NO_CREDIT, creditResult } from './check-result';
import { countLetters, normaliseAnswerText } from './normalise-text';

type TextKey = Extract<ItemKey, { type: 'text' }>;

/** DESIGN §5: typo tolerance applies only to accepted answers of 5+ letters. */
export const TYPO_MIN_LETTERS = 5;

/** Levenshtein distance (insertions, deletions, substitutions), by code unit. */
export function editDistance(a: string, b: string): number {
  return distance(a, b);
}

const digitsOf = (text: string): string => text.replace(/\D/g, '');

/**
 * One edit away, on normalised text. We also require the digits to be unchanged: in
 * "NaHCO3" vs "NaHCO2" the one edit is a different compound, not a typo (our choice).
 */
export function isOneTypoAway(accepted: string, answer: string): boolean {
  if (countLetters(accepted) < TYPO_MIN_LETTERS) return false;
  if (Math.abs(accepted.length - answer.length) > 1) return false;
  if (digitsOf(accepted) !== digitsOf(answer)) return false;
  return editDistance(accepted, answer) === 1;
}

export function checkText(key: TextKey, text: string): CheckResult {
  const accepted = key.accepted.map(normaliseAnswerText).filter((a) => a !== '');
  if (accepted.length === 0) return NO_CREDIT('invalid_key');
  const answer = normaliseAnswerText(text);
  if (answer === '') return NO_CREDIT('no_answer');
  if (accepted.includes(answer)) return creditResult(1, 'exact');
  if (key.typoTolerance && accepted.some((a) => isOneTypoAway(a, answer))) return creditResult(1, 'typo');
  return NO_CREDIT('wrong');
}
