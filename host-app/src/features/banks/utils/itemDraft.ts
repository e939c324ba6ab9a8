import type { ItemDto, ItemType, NumericTolerance } from '@covalent/shared-types';

/** An option or order step while it is being written; `id` is absent until the server has saved it. */
export interface DraftOption {
  /** Stable React key, local to the form. */
  key: string;
  id?: string;
  text: string;
  /** For `single`/`multi`: marked as a correct answer. */
  correct: boolean;
}

/** Everything an item form holds, for every type at once, so switching type keeps what was typed. */
export interface ItemDraft {
  type: ItemType;
  prompt: string;
  /** Options of `single`/`multi`; for `order`, the steps in their correct order. */
  options: DraftOption[];
  steps: DraftOption[];
  truefalse: boolean | null;
  numeric: {
    value: string;
    unit: string;
    toleranceKind: NumericTolerance['kind'];
    toleranceValue: string;
    sigFigs: string;
  };
  text: { accepted: string; typoTolerance: boolean };
  explanation: string;
  /** Comma-separated, as typed. */
  tags: string;
  imageId: string | null;
  /** Where to show the image's thumbnail. */
  imageUrl: string | null;
}

let keySeq = 0;
const nextKey = (): string => `opt-${++keySeq}`;

export function draftOption(text = '', correct = false, id?: string): DraftOption {
  return { key: nextKey(), text, correct, ...(id ? { id } : {}) };
}

export function emptyDraft(type: ItemType = 'single'): ItemDraft {
  return {
    type,
    prompt: '',
    options: [draftOption(), draftOption(), draftOption(), draftOption()],
    steps: [draftOption(), draftOption(), draftOption()],
    truefalse: null,
    numeric: { value: '', unit: '', toleranceKind: 'absolute', toleranceValue: '', sigFigs: '' },
    text: { accepted: '', typoTolerance: false },
    explanation: '',
    tags: '',
    imageId: null,
    imageUrl: null,
  };
}

/** The form state of a saved item; `imageUrl` comes from the caller, which knows the API's paths. */
export function draftFromItem(item: ItemDto, imageUrl: string | null): ItemDraft {
  const draft = { ...emptyDraft(item.type), prompt: item.prompt, explanation: item.explanation, tags: item.tags.join(', ') };
  draft.imageId = item.imageId;
  draft.imageUrl = imageUrl;
  const key = item.key;
  switch (key.type) {
    case 'single':
      draft.options = item.options.map((o) => draftOption(o.text, o.id === key.correctOptionId, o.id));
      break;
    case 'multi':
      draft.options = item.options.map((o) => draftOption(o.text, key.correctOptionIds.includes(o.id), o.id));
      break;
    case 'order': {
      const byId = new Map(item.options.map((o) => [o.id, o]));
      // Edited in the correct order; the author's list is the key.
      draft.steps = key.sequence.flatMap((id) => {
        const o = byId.get(id);
        return o ? [draftOption(o.text, false, o.id)] : [];
      });
      break;
    }
    case 'truefalse':
      draft.truefalse = key.value;
      break;
    case 'numeric':
      draft.numeric = {
        value: key.value,
        unit: key.unit ?? '',
        toleranceKind: key.tolerance.kind,
        toleranceValue: String(key.tolerance.value),
        sigFigs: key.sigFigs === null ? '' : String(key.sigFigs),
      };
      break;
    case 'text':
      draft.text = { accepted: key.accepted.join('\n'), typoTolerance: key.typoTolerance };
      break;
  }
  return draft;
}
