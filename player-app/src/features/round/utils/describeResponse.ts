import { optionLetter, type ItemOption, type ItemResponse, type PlayerItemView } from '@covalent/shared-types';

const TRUE_FALSE: ItemOption[] = [
  { id: 'true', text: 'True' },
  { id: 'false', text: 'False' },
];

/** The buttons of a choice item; true/false items carry no options, so they get two. */
export function choiceOptions(item: PlayerItemView): ItemOption[] {
  return item.type === 'truefalse' ? TRUE_FALSE : item.options;
}

/** The option ids a response picks (true/false as "true"/"false"). */
export function pickedOptionIds(response: ItemResponse | null | undefined): string[] {
  if (!response) return [];
  switch (response.type) {
    case 'single':
      return [response.optionId];
    case 'multi':
      return response.optionIds;
    case 'truefalse':
      return [String(response.value)];
    default:
      return [];
  }
}

/** The response for tapping option `id` of a single or true/false item. */
export function choiceResponse(item: PlayerItemView, id: string): ItemResponse {
  return item.type === 'truefalse' ? { type: 'truefalse', value: id === 'true' } : { type: 'single', optionId: id };
}

function lettered(options: ItemOption[], id: string): string {
  const index = options.findIndex((o) => o.id === id);
  return index < 0 ? '?' : optionLetter(index);
}

/** A short line for a response: "B. On your face", "A, C", "B → A → C", "0.50 mol". */
export function describeResponse(item: PlayerItemView, response: ItemResponse): string {
  const options = choiceOptions(item);
  switch (response.type) {
    case 'single': {
      const option = options.find((o) => o.id === response.optionId);
      return option ? `${lettered(options, option.id)}. ${option.text}` : '?';
    }
    case 'truefalse':
      return response.value ? 'True' : 'False';
    case 'multi':
      return response.optionIds.length === 0
        ? 'Nothing picked'
        : response.optionIds
            .map((id) => lettered(options, id))
            .sort()
            .join(', ');
    case 'order':
      return response.sequence.map((id) => lettered(options, id)).join(' → ');
    case 'numeric':
    case 'text':
      return response.text;
  }
}

/** True when two responses are the same answer (for "is the draft what I shared?"). */
export function sameResponse(a: ItemResponse | null | undefined, b: ItemResponse | null | undefined): boolean {
  return a != null && b != null && JSON.stringify(a) === JSON.stringify(b);
}
