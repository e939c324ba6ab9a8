import { optionLetter, type ItemContent, type ItemResponse } from '@covalent/shared-types';

type TextItem = Pick<ItemContent, 'type' | 'options' | 'key'>;

function optionLabel(item: TextItem, optionId: string): string {
  const index = item.options.findIndex((o) => o.id === optionId);
  return index < 0 ? '?' : `${optionLetter(index)}. ${item.options[index].text}`;
}

const trueFalse = (value: boolean): string => (value ? 'True' : 'False');

/** The key as a teacher reads it, for the debrief, the CSVs and the e-mail. */
export function keyText(item: TextItem): string {
  const { key } = item;
  switch (key.type) {
    case 'single':
      return optionLabel(item, key.correctOptionId);
    case 'multi':
      return key.correctOptionIds.map((id) => optionLabel(item, id)).join('; ');
    case 'truefalse':
      return trueFalse(key.value);
    case 'order':
      return key.sequence.map((id) => item.options.find((o) => o.id === id)?.text ?? '?').join(' → ');
    case 'numeric':
      return key.unit ? `${key.value} ${key.unit}` : key.value;
    case 'text':
      return key.accepted.join(' / ');
  }
}

/** A student's answer as a teacher reads it; empty when not answered. */
export function responseText(item: TextItem, response: ItemResponse | null): string {
  if (response === null) return '';
  switch (response.type) {
    case 'single':
      return optionLabel(item, response.optionId);
    case 'multi':
      return response.optionIds.map((id) => optionLabel(item, id)).join('; ');
    case 'truefalse':
      return trueFalse(response.value);
    case 'order':
      return response.sequence.map((id) => item.options.find((o) => o.id === id)?.text ?? '?').join(' → ');
    case 'numeric':
    case 'text':
      return response.text;
  }
}
