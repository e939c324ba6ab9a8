import { optionLetter, type ItemKey, type PlayerItemView } from '@covalent/shared-types';

function optionLabel(item: PlayerItemView, optionId: string): string {
  const index = item.options.findIndex((option) => option.id === optionId);
  return index < 0 ? optionId : `${optionLetter(index)}. ${item.options[index]!.text}`;
}

/** The correct answer as a sentence fragment for the reveal. */
export function describeKey(key: ItemKey, item: PlayerItemView): string {
  switch (key.type) {
    case 'single':
      return optionLabel(item, key.correctOptionId);
    case 'multi':
      return key.correctOptionIds.map((id) => optionLabel(item, id)).join('; ');
    case 'truefalse':
      return key.value ? 'True' : 'False';
    case 'order':
      return key.sequence.map((id) => optionLabel(item, id)).join(' → ');
    case 'numeric':
      return key.unit ? `${key.value} ${key.unit}` : key.value;
    case 'text':
      return key.accepted[0] ?? '';
  }
}
