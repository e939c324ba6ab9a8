import { describe, expect, it } from 'vitest';
import { nextReviewText } from './nextReviewText';

const NOW = Date.UTC(2026, 11, 1, 9, 0, 0);
const DAY = 86_400_000;

describe('nextReviewText', () => {
  it('counts whole days, rounding up', () => {
    expect(nextReviewText(new Date(NOW + 2 * DAY).toISOString(), NOW)).toBe('next review in 2 days');
    expect(nextReviewText(new Date(NOW + 1.5 * DAY).toISOString(), NOW)).toBe('next review in 2 days');
    expect(nextReviewText(new Date(NOW + DAY).toISOString(), NOW)).toBe('next review tomorrow');
  });

  it('says now for a due card and nothing for no cards', () => {
    expect(nextReviewText(new Date(NOW).toISOString(), NOW)).toBe('next review now');
    expect(nextReviewText(null, NOW)).toBe('nothing left to review');
  });
});
