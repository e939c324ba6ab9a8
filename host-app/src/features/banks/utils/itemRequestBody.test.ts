import { describe, expect, it } from 'vitest';
import { makeItem } from '@/test/authoringFactories';
import { draftFromItem, draftOption, emptyDraft, type ItemDraft } from './itemDraft';
import { itemRequestBody } from './itemRequestBody';

const draft = (overrides: Partial<ItemDraft>): ItemDraft => ({ ...emptyDraft(overrides.type), ...overrides });

// The expected shapes are the server's ItemInputDto and buildItemContent (server/src/banks/item-content.ts):
// new options are referenced from the key as "#index".
describe('itemRequestBody', () => {
  it('sends a numeric key with its decimal string, unit, tolerance and significant figures', () => {
    const body = itemRequestBody(
      draft({
        type: 'numeric',
        prompt: ' Density of the block? ',
        numeric: { value: '2.80', unit: ' g/mL ', toleranceKind: 'absolute', toleranceValue: '0.01', sigFigs: '3' },
        tags: 'density, sig-figs,',
      }),
    );
    expect(body).toEqual({
      type: 'numeric',
      prompt: 'Density of the block?',
      options: [],
      key: { type: 'numeric', value: '2.80', unit: 'g/mL', tolerance: { kind: 'absolute', value: 0.01 }, sigFigs: 3 },
      explanation: '',
      tags: ['density', 'sig-figs'],
      imageId: null,
    });
  });

  it('sends a bare number as unit null, an empty tolerance as 0 and empty sig figs as null', () => {
    const body = itemRequestBody(draft({ type: 'numeric', numeric: { value: '42', unit: '', toleranceKind: 'relative', toleranceValue: '', sigFigs: '' } }));
    expect(body.key).toEqual({ type: 'numeric', value: '42', unit: null, tolerance: { kind: 'relative', value: 0 }, sigFigs: null });
  });

  it('sends order steps in the written order, the key naming new steps by index', () => {
    const steps = [draftOption('Check the hose'), draftOption('Close the air hole'), draftOption('Light the striker')];
    const body = itemRequestBody(draft({ type: 'order', steps }));
    expect(body.options).toEqual([{ text: 'Check the hose' }, { text: 'Close the air hole' }, { text: 'Light the striker' }]);
    expect(body.key).toEqual({ type: 'order', sequence: ['#0', '#1', '#2'] });
  });

  it('keeps saved step ids when an order item is edited and reordered', () => {
    const saved = makeItem({
      type: 'order',
      options: [
        { id: 'a', text: 'Light' },
        { id: 'b', text: 'Check hose' },
        { id: 'c', text: 'Open tap' },
      ],
      key: { type: 'order', sequence: ['b', 'c', 'a'] },
    });
    const d = draftFromItem(saved, null);
    expect(d.steps.map((s) => s.text)).toEqual(['Check hose', 'Open tap', 'Light']);
    const body = itemRequestBody({ ...d, steps: [...d.steps, draftOption('Adjust the air hole')] });
    expect(body.key).toEqual({ type: 'order', sequence: ['b', 'c', 'a', '#3'] });
    expect(body.options[0]).toEqual({ id: 'b', text: 'Check hose' });
  });

  it('sends a multi item with two correct options', () => {
    const options = [draftOption('A cracked beaker', true), draftOption('Paper towels'), draftOption('A chipped test tube', true), draftOption('Gloves')];
    const body = itemRequestBody(draft({ type: 'multi', options }));
    expect(body.key).toEqual({ type: 'multi', correctOptionIds: ['#0', '#2'] });
    expect(body.options).toHaveLength(4);
  });

  it('sends a single item keyed by a saved option id, and an empty key when none is marked', () => {
    const saved = draftFromItem(makeItem(), null);
    expect(itemRequestBody(saved).key).toEqual({ type: 'single', correctOptionId: 'o2' });
    const none = itemRequestBody(draft({ type: 'single' }));
    expect(none.key).toEqual({ type: 'single', correctOptionId: '' });
  });

  it('sends true/false and text keys; accepted answers one per line, blank lines dropped', () => {
    expect(itemRequestBody(draft({ type: 'truefalse', truefalse: false })).key).toEqual({ type: 'truefalse', value: false });
    const text = itemRequestBody(draft({ type: 'text', text: { accepted: 'eyewash station\n\n eyewash \n', typoTolerance: true } }));
    expect(text.key).toEqual({ type: 'text', accepted: ['eyewash station', 'eyewash'], typoTolerance: true });
    expect(text.options).toEqual([]);
  });
});
