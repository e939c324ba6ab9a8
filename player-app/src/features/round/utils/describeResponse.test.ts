import { describe, expect, it } from 'vitest';
import { orderItem, singleItem } from '@/test/factories';
import { choiceOptions, choiceResponse, describeResponse, pickedOptionIds } from './describeResponse';

// Product rule (DESIGN.md §5): options are labelled A, B, C… in the order shown.
describe('describeResponse', () => {
  it('names a single choice by letter and text', () => {
    expect(describeResponse(singleItem(), { type: 'single', optionId: 'o-face' })).toBe('B. On your face');
  });

  it('lists multi picks by letter in alphabetical order', () => {
    const item = { ...singleItem(), type: 'multi' as const };
    expect(describeResponse(item, { type: 'multi', optionIds: ['o-bag', 'o-bench'] })).toBe('A, C');
  });

  it('shows an order as letters of the steps as first shown', () => {
    expect(describeResponse(orderItem(), { type: 'order', sequence: ['s-stop', 's-warn', 's-tell'] })).toBe(
      'B → C → A',
    );
  });

  it('shows typed answers as typed', () => {
    expect(describeResponse(singleItem(), { type: 'numeric', text: '0.50 mol' })).toBe('0.50 mol');
  });
});

describe('choiceOptions', () => {
  it('gives true/false items a True and a False option', () => {
    const item = { ...singleItem(), type: 'truefalse' as const, options: [] };
    expect(choiceOptions(item).map((o) => o.text)).toEqual(['True', 'False']);
    expect(choiceResponse(item, 'false')).toEqual({ type: 'truefalse', value: false });
    expect(pickedOptionIds({ type: 'truefalse', value: true })).toEqual(['true']);
  });
});
