/** The six item types of DESIGN.md §5. */
export const ITEM_TYPES = ['single', 'multi', 'truefalse', 'order', 'numeric', 'text'] as const;
/** One of {@link ITEM_TYPES}. */
export type ItemType = (typeof ITEM_TYPES)[number];

/** An option of a `single` or `multi` item, or a step of an `order` item. `id` is stable across edits. */
export interface ItemOption {
  id: string;
  text: string;
}

/** Tolerance of a `numeric` key: absolute (in the key's unit) or relative (a fraction, 0.01 = 1%). */
export interface NumericTolerance {
  kind: 'absolute' | 'relative';
  value: number;
}

/** The answer key of an item, tagged by item type. Never sent to players before the reveal. */
export type ItemKey =
  | { type: 'single'; correctOptionId: string }
  | { type: 'multi'; correctOptionIds: string[] }
  | { type: 'truefalse'; value: boolean }
  /** The correct order of the item's options (step ids). */
  | { type: 'order'; sequence: string[] }
  | {
      type: 'numeric';
      /** The value as a decimal string, so trailing zeros survive ("0.50"). */
      value: string;
      /** A unit mathjs can parse ("mol", "mL", "kPa"), or null for a bare number. */
      unit: string | null;
      tolerance: NumericTolerance;
      /** When set, answers must carry exactly this many significant figures for full credit. */
      sigFigs: number | null;
    }
  | { type: 'text'; accepted: string[]; typoTolerance: boolean };

/** A player's response to an item, tagged by item type. */
export type ItemResponse =
  | { type: 'single'; optionId: string }
  | { type: 'multi'; optionIds: string[] }
  | { type: 'truefalse'; value: boolean }
  | { type: 'order'; sequence: string[] }
  /** The raw text the student typed, e.g. "500 mmol" or "0.50". */
  | { type: 'numeric'; text: string }
  | { type: 'text'; text: string };

/** An item as the author keeps it (teacher side, with its key). */
export interface ItemContent {
  type: ItemType;
  prompt: string;
  /** Options for `single`/`multi`, steps for `order`, empty otherwise. */
  options: ItemOption[];
  key: ItemKey;
  explanation: string;
  tags: string[];
  imageId: string | null;
}

/** An item as a player sees it during a round: no key, and `order` steps shuffled. */
export interface PlayerItemView {
  type: ItemType;
  prompt: string;
  options: ItemOption[];
  /** For `numeric` items: the unit shown beside the input, if the key has one. */
  unitHint: string | null;
  imageUrl: string | null;
}

/** The letter shown beside option `index` (0 → "A"). Options are all one neutral style. */
export function optionLetter(index: number): string {
  return String.fromCharCode(65 + index);
}
