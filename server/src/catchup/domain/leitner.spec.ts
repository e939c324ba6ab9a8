import fc from 'fast-check';
import { BOX_COUNT, DAY_MS, dueCards, intervalDays, isDue, newCard, review, type Box } from './leitner';

const T0 = Date.parse('2026-09-07T08:00:00Z');

describe('review', () => {
  it('moves a correct answer to the next box and a wrong one back to box 1 (Leitner 1972, via Wikipedia "Leitner system")', () => {
    const box3 = { box: 3 as Box, dueAt: T0, reviewedAt: null };
    expect(review(box3, true, T0).box).toBe(4);
    expect(review(box3, false, T0).box).toBe(1);
    expect(review({ ...box3, box: 2 }, false, T0).box).toBe(1);
  });

  it('keeps a correct answer in box 5 (the last box; this product’s choice)', () => {
    expect(review({ box: 5, dueAt: T0, reviewedAt: null }, true, T0).box).toBe(5);
  });

  it('schedules box 1 daily … box 5 every 16 days (intervals doubling: this product’s choice)', () => {
    expect(([1, 2, 3, 4, 5] as Box[]).map(intervalDays)).toEqual([1, 2, 4, 8, 16]);
    let card = newCard(T0);
    const due: number[] = [];
    for (let i = 0; i < 5; i++) {
      card = review(card, true, card.dueAt);
      due.push((card.dueAt - T0) / DAY_MS);
    }
    // Boxes 2, 3, 4, 5, 5 after each correct answer: 2, +4, +8, +16, +16 days.
    expect(due).toEqual([2, 6, 14, 30, 46]);
  });

  it('always lands in 1..5 and schedules the box’s interval after the review, early or late (property)', () => {
    // Each review happens some time after the previous one (up to 40 days: before its due
    // date as often as after it); the box follows the Leitner rule from a plain counter.
    const step = fc.record({ correct: fc.boolean(), waitMs: fc.integer({ min: 0, max: 40 * DAY_MS }) });
    fc.assert(
      fc.property(fc.array(step, { maxLength: 40 }), (steps) => {
        let card = newCard(T0);
        let now = T0;
        let expectedBox = 1;
        for (const { correct, waitMs } of steps) {
          now += waitMs;
          expectedBox = correct ? Math.min(expectedBox + 1, 5) : 1;
          const next = review(card, correct, now);
          expect(next.box).toBe(expectedBox);
          expect(next.box).toBeLessThanOrEqual(BOX_COUNT);
          expect(next.reviewedAt).toBe(now);
          expect(next.dueAt).toBe(now + 2 ** (expectedBox - 1) * DAY_MS);
          expect(isDue(next, now)).toBe(false);
          card = next;
        }
      }),
    );
  });
});

describe('dueCards', () => {
  it('lists the due cards, lowest box first, then the longest overdue', () => {
    const cards = [
      { id: 'c', card: { box: 2 as Box, dueAt: T0 - DAY_MS, reviewedAt: null } },
      { id: 'a', card: { box: 1 as Box, dueAt: T0, reviewedAt: null } },
      { id: 'b', card: { box: 1 as Box, dueAt: T0 - 2 * DAY_MS, reviewedAt: null } },
      { id: 'later', card: { box: 1 as Box, dueAt: T0 + 1, reviewedAt: null } },
    ];
    expect(dueCards(cards, T0).map((c) => c.id)).toEqual(['b', 'a', 'c']);
    expect(isDue(cards[3].card, T0)).toBe(false);
    expect(isDue(newCard(T0), T0)).toBe(true);
  });
});
