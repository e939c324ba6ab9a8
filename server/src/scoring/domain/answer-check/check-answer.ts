import type { ItemContent, ItemResponse } from '@covalent/shared-types';
import { checkMulti, checkSingle, checkTrueFalse } from './check-choice';
import { type NumericCheckOptions, checkNumeric } from './check-numeric';
import { checkOrder } from './check-order';
import { type CheckResult, NO_CREDIT } from './check-result';
import { checkText } from './check-text';

export type CheckableItem = Pick<ItemContent, 'type' | 'options' | 'key'>;

export type CheckOptions = NumericCheckOptions;

/**
 * Credit for one response to one item (DESIGN §5). A null response, or one for another item
 * type, earns 0. Pure: the same item and response always give the same result.
 */
export function checkAnswer(
  item: CheckableItem,
  response: ItemResponse | null,
  options: CheckOptions = {},
): CheckResult {
  if (response === null) return NO_CREDIT('no_answer');
  if (response.type !== item.type) return NO_CREDIT('type_mismatch');
  const { key } = item;
  if (key.type !== item.type) return NO_CREDIT('invalid_key');

  if (key.type === 'single' && response.type === 'single') return checkSingle(key, response.optionId);
  if (key.type === 'multi' && response.type === 'multi') return checkMulti(key, response.optionIds);
  if (key.type === 'truefalse' && response.type === 'truefalse') return checkTrueFalse(key, response.value);
  if (key.type === 'order' && response.type === 'order') return checkOrder(key, response.sequence);
  if (key.type === 'numeric' && response.type === 'numeric') return checkNumeric(key, response.text, options);
  if (key.type === 'text' && response.type === 'text') return checkText(key, response.text);
  return NO_CREDIT('type_mismatch');
}
