import { classLabel } from '@covalent/shared-types';
import { describe, expect, it } from 'vitest';

// shared-types' classLabel, as the setup form and every class line use it.
describe('classLabel', () => {
  it('adds the period so two sections of one course read apart', () => {
    expect(classLabel({ name: 'Chemistry', period: '2' })).toBe('Chemistry · period 2');
    expect(classLabel({ name: 'Chemistry', period: '5' })).not.toBe(classLabel({ name: 'Chemistry', period: '2' }));
  });

  it('reads the ways schools write periods without doubling the word', () => {
    expect(classLabel({ name: 'Chemistry', period: 'P3' })).toBe('Chemistry · period 3');
    expect(classLabel({ name: 'Chemistry', period: 'Period 3' })).toBe('Chemistry · period 3');
    expect(classLabel({ name: 'Chemistry', period: 'B-block' })).toBe('Chemistry · B-block');
    expect(classLabel({ name: 'Physics', period: 'Pioneers' })).toBe('Physics · Pioneers');
  });

  it('is just the name without a period', () => {
    expect(classLabel({ name: 'Chemistry', period: '' })).toBe('Chemistry');
    expect(classLabel({ name: 'Chemistry', period: '  ' })).toBe('Chemistry');
    expect(classLabel({ name: 'Chemistry', period: null })).toBe('Chemistry');
  });
});
