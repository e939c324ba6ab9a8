import type { ItemKey } from '@covalent/shared-types';
import { type CheckResult, NO_CREDIT, graded } from './check-result';

type SingleKey = Extract<ItemKey, { type: 'single' }>;
type MultiKey = Extract<ItemKey, { type: 'multi' }>;
type TrueFalseKey = Extract<ItemKey, { type: 'truefalse' }>;

export function checkSingle(key: SingleKey, optionId: string): CheckResult {
  if (optionId === '') return NO_CREDIT('no_answer');
  return graded(optionId === key.correctOptionId ? 1 : 0);
}

export function checkTrueFalse(key: TrueFalseKey, value: boolean): CheckResult {
  return graded(value === key.value ? 1 : 0);
}

/**
 * DESIGN §5: (correct picks − wrong picks) / number correct, floored at 0.
 * Duplicate picks count once; an id that is not a correct option (unknown ids included) is a wrong pick.
 */
export function multiCredit(correctIds: readonly string[], pickedIds: readonly string[]): number {
  const correct = new Set(correctIds);
  if (correct.size === 0) return 0;
  const picked = new Set(pickedIds);
  let right = 0;
  let wrong = 0;
  for (const id of picked) {
    if (correct.has(id)) right += 1;
    else wrong += 1;
  }
  return Math.max(0, (right - wrong) / correct.size);
}

export function checkMulti(key: MultiKey, optionIds: readonly string[]): CheckResult {
  if (new Set(key.correctOptionIds).size === 0) return NO_CREDIT('invalid_key');
  if (optionIds.length === 0) return NO_CREDIT('no_answer');
  return graded(multiCredit(key.correctOptionIds, optionIds));
}
