import { describe, expect, it } from 'vitest';
import { numericItem, orderItem, singleItem } from '@/test/factories';
import { describeKey, ordinal } from './describeKey';

describe('describeKey', () => {
  it('names the correct option by letter and text', () => {
    expect(describeKey(singleItem(), { type: 'single', correctOptionId: 'o-face' })).toEqual(['B. On your face']);
  });

  it('lists an order key step by step, each step with the letter it had on the answer screen', () => {
    expect(describeKey(orderItem(), { type: 'order', sequence: ['s-stop', 's-warn', 's-tell'] })).toEqual([
      'B. Stop and step back',
      'C. Warn people nearby',
      'A. Tell the teacher',
    ]);
  });

  it('gives a numeric key with its unit, tolerance and significant figures', () => {
    const key = {
      type: 'numeric' as const,
      value: '0.500',
      unit: 'mol',
      tolerance: { kind: 'relative' as const, value: 0.01 },
      sigFigs: 3,
    };
    expect(describeKey(numericItem(), key)).toEqual(['0.500 mol (within 1%)', 'Give it to 3 significant figures.']);
  });

  it('shows the first accepted text answer and the others after it', () => {
    expect(describeKey(singleItem(), { type: 'text', accepted: ['fume hood', 'fume cupboard'], typoTolerance: true })).toEqual([
      'fume hood',
      'Also accepted: fume cupboard',
    ]);
  });
});

describe('ordinal', () => {
  // English ordinal suffixes (common practice): 11–13 take "th".
  it.each([
    [1, '1st'],
    [2, '2nd'],
    [3, '3rd'],
    [4, '4th'],
    [11, '11th'],
    [12, '12th'],
    [13, '13th'],
    [21, '21st'],
    [102, '102nd'],
    [111, '111th'],
  ])('writes %i as %s', (n, text) => {
    expect(ordinal(n)).toBe(text);
  });
});
