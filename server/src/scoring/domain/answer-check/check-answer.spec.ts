import { ITEM_TYPES, type ItemResponse, type ItemType } from '@covalent/shared-types';
import { checkAnswer } from './check-answer';
import { itemContent } from './answer-check.factories';

/** A plausible response of each type. */
const RESPONSES: Record<ItemType, ItemResponse> = {
  single: { type: 'single', optionId: 'o2' },
  multi: { type: 'multi', optionIds: ['o1', 'o2', 'o3'] },
  truefalse: { type: 'truefalse', value: true },
  order: { type: 'order', sequence: ['o1', 'o2', 'o3', 'o4'] },
  numeric: { type: 'numeric', text: '22.4 L' },
  text: { type: 'text', text: 'ethanol' },
};

describe('checkAnswer', () => {
  it.each(ITEM_TYPES)('gives full credit to the key answer of a %s item', (type) => {
    expect(checkAnswer(itemContent(type), RESPONSES[type])).toEqual({ credit: 1, correct: true, detail: 'exact' });
  });

  // Brief / DESIGN.md §5: no response earns nothing.
  it.each(ITEM_TYPES)('gives 0 no_answer to a null response on a %s item', (type) => {
    expect(checkAnswer(itemContent(type), null)).toEqual({ credit: 0, correct: false, detail: 'no_answer' });
  });

  const mismatches = ITEM_TYPES.flatMap((itemType) =>
    ITEM_TYPES.filter((t) => t !== itemType).map((responseType) => [itemType, responseType] as const),
  );
  it.each(mismatches)('gives 0 type_mismatch to a %s item answered as %s', (itemType, responseType) => {
    expect(checkAnswer(itemContent(itemType), RESPONSES[responseType])).toEqual({
      credit: 0,
      correct: false,
      detail: 'type_mismatch',
    });
  });

  it('gives 0 invalid_key when the key is for another type than the item', () => {
    const item = { ...itemContent('single'), key: itemContent('truefalse').key };
    expect(checkAnswer(item, RESPONSES.single).detail).toBe('invalid_key');
  });
});
