import type { ItemContent, ItemKey, ItemOption, ItemType } from '@covalent/shared-types';

/** An item as a client sends it: option ids may be missing, key fields loosely typed. */
export interface ItemInput {
  type: ItemType;
  prompt: string;
  options?: { id?: string; text: string }[];
  key: Record<string, unknown>;
  explanation?: string;
  tags?: string[];
  imageId?: string | null;
}

const INDEX_REF = /^#(\d+)$/;
const trimmed = (s: unknown): unknown => (typeof s === 'string' ? s.trim() : s);

/**
 * Builds ItemContent from client input: keeps given option ids, makes ids for new options, and lets
 * the key name a new option by its 0-based index as "#2" (it has no id yet). Unknown key fields are
 * dropped so only the shape of ItemKey is stored; validation happens afterwards.
 */
export function buildItemContent(input: ItemInput, newId: () => string): ItemContent {
  const options: ItemOption[] = (input.options ?? []).map((o) => ({
    id: o.id && o.id.trim() !== '' ? o.id.trim() : newId(),
    text: o.text.trim(),
  }));
  const ids = new Set(options.map((o) => o.id));
  const ref = (value: unknown): string => {
    if (typeof value !== 'string') return '';
    if (ids.has(value)) return value;
    const index = INDEX_REF.exec(value);
    return index && options[Number(index[1])] ? options[Number(index[1])].id : value;
  };
  return {
    type: input.type,
    prompt: input.prompt.trim(),
    options,
    key: cleanKey(input.key ?? {}, ref),
    explanation: (input.explanation ?? '').trim(),
    tags: (input.tags ?? []).map((t) => t.trim()),
    imageId: input.imageId ?? null,
  };
}

const list = (value: unknown): unknown[] => (Array.isArray(value) ? value : []);

function cleanKey(raw: Record<string, unknown>, ref: (v: unknown) => string): ItemKey {
  switch (raw.type) {
    case 'single':
      return { type: 'single', correctOptionId: ref(raw.correctOptionId) };
    case 'multi':
      return { type: 'multi', correctOptionIds: list(raw.correctOptionIds).map(ref) };
    case 'truefalse':
      return { type: 'truefalse', value: raw.value as boolean };
    case 'order':
      return { type: 'order', sequence: list(raw.sequence).map(ref) };
    case 'numeric': {
      const tolerance = (raw.tolerance ?? {}) as Record<string, unknown>;
      const unit = trimmed(raw.unit);
      return {
        type: 'numeric',
        value: (typeof raw.value === 'number' ? String(raw.value) : trimmed(raw.value)) as string,
        unit: typeof unit === 'string' && unit !== '' ? unit : null,
        tolerance: { kind: (tolerance.kind ?? 'absolute') as 'absolute', value: (tolerance.value ?? 0) as number },
        sigFigs: (raw.sigFigs ?? null) as number | null,
      };
    }
    case 'text':
      return {
        type: 'text',
        accepted: list(raw.accepted)
          .map(trimmed)
          .filter((a): a is string => typeof a === 'string' && a !== ''),
        typoTolerance: raw.typoTolerance === true,
      };
    default:
      // Not a key type: validateItemContent reports `key.type`.
      return raw as unknown as ItemKey;
  }
}
