import { optionLetter, type ItemKey, type PlayerItemView } from '@covalent/shared-types';

function optionLine(item: PlayerItemView, id: string): string {
  const index = item.options.findIndex((o) => o.id === id);
  return index < 0 ? '?' : `${optionLetter(index)}. ${item.options[index]?.text ?? ''}`;
}

function toleranceText(key: Extract<ItemKey, { type: 'numeric' }>): string {
  const { kind, value } = key.tolerance;
  if (value === 0) return '';
  if (kind === 'relative') return ` (within ${+(value * 100).toPrecision(6)}%)`;
  return ` (± ${value}${key.unit ? ` ${key.unit}` : ''})`;
}

/** The right answer as lines of text; an order key gives one line per step, in order. */
export function describeKey(item: PlayerItemView, key: ItemKey): string[] {
  switch (key.type) {
    case 'single':
      return [optionLine(item, key.correctOptionId)];
    case 'multi':
      return item.options.filter((o) => key.correctOptionIds.includes(o.id)).map((o) => optionLine(item, o.id));
    case 'truefalse':
      return [key.value ? 'True' : 'False'];
    case 'order':
      // Lettered as on the answer screen, so "Your answer: B → A → C" reads against it.
      return key.sequence.map((id) => optionLine(item, id));
    case 'numeric': {
      const lines = [`${key.value}${key.unit ? ` ${key.unit}` : ''}${toleranceText(key)}`];
      if (key.sigFigs !== null) lines.push(`Give it to ${key.sigFigs} significant figures.`);
      return lines;
    }
    case 'text': {
      const [first, ...others] = key.accepted;
      return others.length > 0 ? [first ?? '', `Also accepted: ${others.join(', ')}`] : [first ?? ''];
    }
  }
}

/** 1 → "1st", 2 → "2nd", 11 → "11th", 23 → "23rd" (English ordinal suffixes; common practice). */
export function ordinal(n: number): string {
  const tens = n % 100;
  if (tens >= 11 && tens <= 13) return `${n}th`;
  const suffix = ['th', 'st', 'nd', 'rd'][n % 10] ?? 'th';
  return `${n}${suffix}`;
}

/** Points with thousands separators, as the player's browser writes them. */
export function formatPoints(points: number): string {
  return Math.round(points).toLocaleString();
}
