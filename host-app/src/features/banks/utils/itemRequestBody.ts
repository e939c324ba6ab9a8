import type { ItemType, NumericTolerance } from '@covalent/shared-types';
import type { DraftOption, ItemDraft } from './itemDraft';
import { splitList } from './splitList';

/** The body of `POST /api/banks/:id/items` and `PUT …/items/:itemId` (the server's ItemInputDto). */
export interface ItemRequestBody {
  type: ItemType;
  prompt: string;
  options: { id?: string; text: string }[];
  key: Record<string, unknown> & { type: ItemType };
  explanation: string;
  tags: string[];
  imageId: string | null;
}

const sentOption = (o: DraftOption) => (o.id ? { id: o.id, text: o.text } : { text: o.text });

/** A saved option by its id; a new one by "#index", which the server resolves once it has made the id. */
const optionRef = (o: DraftOption, index: number): string => o.id ?? `#${index}`;

/** A number field as typed: empty → the fallback; anything else → Number (NaN goes as null, and the server names the field). */
const numberOr = <T>(text: string, fallback: T): number | T => (text.trim() === '' ? fallback : Number(text.trim()));

function keyAndOptions(draft: ItemDraft): Pick<ItemRequestBody, 'key' | 'options'> {
  switch (draft.type) {
    case 'single': {
      const index = draft.options.findIndex((o) => o.correct);
      return {
        options: draft.options.map(sentOption),
        key: { type: 'single', correctOptionId: index < 0 ? '' : optionRef(draft.options[index], index) },
      };
    }
    case 'multi':
      return {
        options: draft.options.map(sentOption),
        key: { type: 'multi', correctOptionIds: draft.options.flatMap((o, i) => (o.correct ? [optionRef(o, i)] : [])) },
      };
    case 'order':
      return { options: draft.steps.map(sentOption), key: { type: 'order', sequence: draft.steps.map(optionRef) } };
    case 'truefalse':
      return { options: [], key: { type: 'truefalse', value: draft.truefalse } };
    case 'numeric': {
      const n = draft.numeric;
      const tolerance: Record<keyof NumericTolerance, unknown> = { kind: n.toleranceKind, value: numberOr(n.toleranceValue, 0) };
      return {
        options: [],
        key: { type: 'numeric', value: n.value.trim(), unit: n.unit.trim() === '' ? null : n.unit.trim(), tolerance, sigFigs: numberOr(n.sigFigs, null) },
      };
    }
    case 'text':
      return {
        options: [],
        key: { type: 'text', accepted: splitList(draft.text.accepted, /\n/), typoTolerance: draft.text.typoTolerance },
      };
  }
}

/** What the item form sends: only the fields of the chosen type; the server checks every rule. */
export function itemRequestBody(draft: ItemDraft): ItemRequestBody {
  return {
    type: draft.type,
    prompt: draft.prompt.trim(),
    ...keyAndOptions(draft),
    explanation: draft.explanation.trim(),
    tags: splitList(draft.tags),
    imageId: draft.imageId,
  };
}
