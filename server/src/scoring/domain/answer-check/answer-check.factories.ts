/** Test factories for answer-check specs, in one place. */
import type { ItemContent, ItemKey, ItemOption, ItemType } from '@covalent/shared-types';
import type { CheckableItem } from './check-answer';

export type NumericKey = Extract<ItemKey, { type: 'numeric' }>;
export type TextKey = Extract<ItemKey, { type: 'text' }>;

/** Options with ids o1, o2, … */
export function makeOptions(...texts: string[]): ItemOption[] {
  return texts.map((text, i) => ({ id: `o${i + 1}`, text }));
}

export function singleItem(correctOptionId = 'o2'): CheckableItem {
  return { type: 'single', options: makeOptions('Na', 'K', 'Li', 'Cs'), key: { type: 'single', correctOptionId } };
}

export function multiItem(correctOptionIds: string[] = ['o1', 'o2', 'o3']): CheckableItem {
  return {
    type: 'multi',
    options: makeOptions('He', 'Ne', 'Ar', 'N', 'O', 'Cl'),
    key: { type: 'multi', correctOptionIds },
  };
}

export function trueFalseItem(value = true): CheckableItem {
  return { type: 'truefalse', options: [], key: { type: 'truefalse', value } };
}

export function orderItem(sequence: string[] = ['o1', 'o2', 'o3', 'o4', 'o5']): CheckableItem {
  return {
    type: 'order',
    options: sequence.map((id) => ({ id, text: `step ${id}` })),
    key: { type: 'order', sequence },
  };
}

export function numericKey(overrides: Partial<NumericKey> = {}): NumericKey {
  return {
    type: 'numeric',
    value: '22.4',
    unit: 'L',
    tolerance: { kind: 'absolute', value: 0.1 },
    sigFigs: null,
    ...overrides,
  };
}

export function numericItem(overrides: Partial<NumericKey> = {}): CheckableItem {
  return { type: 'numeric', options: [], key: numericKey(overrides) };
}

export function textItem(accepted: string[] = ['ethanol'], typoTolerance = true): CheckableItem {
  return { type: 'text', options: [], key: { type: 'text', accepted, typoTolerance } };
}

const KEYS: Record<ItemType, () => CheckableItem> = {
  single: () => singleItem(),
  multi: () => multiItem(),
  truefalse: () => trueFalseItem(),
  order: () => orderItem(['o1', 'o2', 'o3', 'o4']),
  numeric: () => numericItem(),
  text: () => textItem(),
};

/** A valid item of the given type, as a teacher would save it. */
export function itemContent(type: ItemType, overrides: Partial<ItemContent> = {}): ItemContent {
  const base = KEYS[type]();
  return {
    type,
    prompt: 'What is the answer?',
    options: base.options,
    key: base.key,
    explanation: '',
    tags: ['stoichiometry'],
    imageId: null,
    ...overrides,
  };
}
