import { ITEM_TYPES, type ItemContent, type ItemKey } from '@covalent/shared-types';
import { validateItemContent } from './validate-item-content';
import { itemContent, makeOptions, numericKey } from './answer-check.factories';

const fieldsOf = (content: ItemContent) => validateItemContent(content).map((e) => e.field);
const numeric = (key: Partial<Extract<ItemKey, { type: 'numeric' }>>) => itemContent('numeric', { key: numericKey(key) });

// Rules from the brief and DESIGN.md §5 (2–6 options, 3–8 steps).
describe('validateItemContent', () => {
  it.each(ITEM_TYPES)('accepts a well-formed %s item', (type) => {
    expect(validateItemContent(itemContent(type))).toEqual([]);
  });

  it('writes every message as a sentence', () => {
    const errors = validateItemContent(itemContent('single', { prompt: '', options: makeOptions('a'), tags: [''] }));
    expect(errors.length).toBeGreaterThan(0);
    for (const { message } of errors) expect(message).toMatch(/^[A-Z].*\.$/);
  });

  describe('prompt', () => {
    it('is required', () => {
      expect(fieldsOf(itemContent('single', { prompt: '   ' }))).toEqual(['prompt']);
    });
    it('is at most 2000 characters', () => {
      expect(fieldsOf(itemContent('single', { prompt: 'x'.repeat(2000) }))).toEqual([]);
      expect(fieldsOf(itemContent('single', { prompt: 'x'.repeat(2001) }))).toEqual(['prompt']);
    });
  });

  describe('single and multi options', () => {
    it('need 2 to 6 options', () => {
      expect(fieldsOf(itemContent('single', { options: makeOptions('A'), key: { type: 'single', correctOptionId: 'o1' } }))).toEqual(['options']);
      expect(fieldsOf(itemContent('multi', { options: makeOptions('1', '2', '3', '4', '5', '6', '7') }))).toEqual(['options']);
      expect(fieldsOf(itemContent('multi', { options: makeOptions('1', '2', '3', '4', '5', '6') }))).toEqual([]);
    });
    it('need non-empty texts', () => {
      expect(fieldsOf(itemContent('single', { options: makeOptions('Na', 'K', ' ', 'Cs') }))).toEqual(['options[2].text']);
    });
    it('need distinct texts, after normalisation', () => {
      expect(fieldsOf(itemContent('single', { options: makeOptions('Na', 'K', 'na ', 'Cs') }))).toEqual(['options[2].text']);
    });
    it('need distinct ids', () => {
      const options = [...makeOptions('Na', 'K', 'Li'), { id: 'o1', text: 'Cs' }];
      expect(fieldsOf(itemContent('single', { options }))).toEqual(['options[3].id']);
    });
  });

  describe('single key', () => {
    it('must point to an existing option', () => {
      expect(fieldsOf(itemContent('single', { key: { type: 'single', correctOptionId: 'o9' } }))).toEqual(['key.correctOptionId']);
      expect(fieldsOf(itemContent('single', { key: { type: 'single', correctOptionId: '' } }))).toEqual(['key.correctOptionId']);
    });
  });

  describe('multi key', () => {
    it('needs at least one correct option', () => {
      expect(fieldsOf(itemContent('multi', { key: { type: 'multi', correctOptionIds: [] } }))).toEqual(['key.correctOptionIds']);
    });
    it('names each correct id that is missing or repeated', () => {
      const key: ItemKey = { type: 'multi', correctOptionIds: ['o1', 'o9', 'o1'] };
      expect(fieldsOf(itemContent('multi', { key }))).toEqual(['key.correctOptionIds[1]', 'key.correctOptionIds[2]']);
    });
  });

  describe('truefalse', () => {
    it('has no options', () => {
      expect(fieldsOf(itemContent('truefalse', { options: makeOptions('True', 'False') }))).toEqual(['options']);
    });
  });

  describe('order', () => {
    const steps = (n: number) => makeOptions(...Array.from({ length: n }, (_, i) => `step ${i + 1}`));
    const sequence = (n: number) => Array.from({ length: n }, (_, i) => `o${i + 1}`);
    const order = (n: number, seq = sequence(n)) =>
      itemContent('order', { options: steps(n), key: { type: 'order', sequence: seq } });

    it('needs 3 to 8 steps', () => {
      expect(fieldsOf(order(2))).toEqual(['options']);
      expect(fieldsOf(order(3))).toEqual([]);
      expect(fieldsOf(order(8))).toEqual([]);
      expect(fieldsOf(order(9))).toEqual(['options']);
    });
    it('needs distinct, non-empty steps', () => {
      const options = makeOptions('heat', 'stir', 'Heat', '');
      expect(fieldsOf(itemContent('order', { options }))).toEqual(['options[2].text', 'options[3].text']);
    });
    it('needs a key sequence that is a permutation of the step ids', () => {
      expect(fieldsOf(order(4, ['o1', 'o2', 'o3']))).toEqual(['key.sequence']);
      expect(fieldsOf(order(4, ['o1', 'o2', 'o3', 'o3']))).toEqual(['key.sequence']);
      expect(fieldsOf(order(4, ['o1', 'o2', 'o3', 'o9']))).toEqual(['key.sequence']);
      expect(fieldsOf(order(4, ['o4', 'o2', 'o3', 'o1']))).toEqual([]);
    });
  });

  describe('numeric key', () => {
    it('needs a decimal value', () => {
      expect(fieldsOf(numeric({ value: '0,50' }))).toEqual(['key.value']);
      expect(fieldsOf(numeric({ value: 'half' }))).toEqual(['key.value']);
      expect(fieldsOf(numeric({ value: '6.022e23' }))).toEqual([]);
    });
    it('needs a unit mathjs can read, or none', () => {
      expect(fieldsOf(numeric({ unit: 'furlongz' }))).toEqual(['key.unit']);
      expect(fieldsOf(numeric({ unit: '2 mol' }))).toEqual(['key.unit']);
      expect(fieldsOf(numeric({ unit: null }))).toEqual([]);
      expect(fieldsOf(numeric({ unit: 'J/(mol K)' }))).toEqual([]);
    });
    it('needs an absolute tolerance of at least 0 and a relative one above 0', () => {
      expect(fieldsOf(numeric({ tolerance: { kind: 'absolute', value: 0 } }))).toEqual([]);
      expect(fieldsOf(numeric({ tolerance: { kind: 'absolute', value: -0.1 } }))).toEqual(['key.tolerance.value']);
      expect(fieldsOf(numeric({ tolerance: { kind: 'relative', value: 0 } }))).toEqual(['key.tolerance.value']);
      expect(fieldsOf(numeric({ tolerance: { kind: 'relative', value: Number.NaN } }))).toEqual(['key.tolerance.value']);
    });
    it('needs sigFigs from 1 to 15 or null', () => {
      expect(fieldsOf(numeric({ sigFigs: 0 }))).toEqual(['key.sigFigs']);
      expect(fieldsOf(numeric({ sigFigs: 16 }))).toEqual(['key.sigFigs']);
      expect(fieldsOf(numeric({ sigFigs: 2.5 }))).toEqual(['key.sigFigs']);
      expect(fieldsOf(numeric({ sigFigs: 15 }))).toEqual([]);
      expect(fieldsOf(numeric({ sigFigs: null }))).toEqual([]);
    });
    it('has no options', () => {
      expect(fieldsOf(itemContent('numeric', { options: makeOptions('22.4') }))).toEqual(['options']);
    });
  });

  describe('text key', () => {
    it('needs at least one non-empty accepted answer', () => {
      expect(fieldsOf(itemContent('text', { key: { type: 'text', accepted: [], typoTolerance: false } }))).toEqual(['key.accepted']);
      expect(fieldsOf(itemContent('text', { key: { type: 'text', accepted: ['  ', ''], typoTolerance: false } }))).toEqual(['key.accepted']);
    });
  });

  it('needs the key type to match the item type', () => {
    expect(fieldsOf(itemContent('single', { key: { type: 'truefalse', value: true } }))).toEqual(['key.type']);
  });

  describe('tags', () => {
    it('must be non-empty and at most 40 characters', () => {
      const tags = ['acids', '', 'x'.repeat(40), 'y'.repeat(41)];
      expect(fieldsOf(itemContent('single', { tags }))).toEqual(['tags[1]', 'tags[3]']);
    });
  });
});
