import { earliestDue, isCorrect, planCards, type MissedSource } from './catchup-plan';

const student = (rosterEntryId: string | null, missed: [string, number][], removed = false): MissedSource => ({
  rosterEntryId,
  removed,
  missed: missed.map(([itemId, credit]) => ({ itemId, credit })),
});

describe('planCards', () => {
  it('makes one card per missed item of each roster student', () => {
    const cards = planCards([student('r1', [['i1', 0], ['i2', 0.5]]), student('r2', [['i2', 0]])]);
    expect(cards).toEqual([
      { rosterEntryId: 'r1', itemId: 'i1' },
      { rosterEntryId: 'r1', itemId: 'i2' },
      { rosterEntryId: 'r2', itemId: 'i2' },
    ]);
  });

  it('leaves out full credit, nicknamed players and deleted students', () => {
    const cards = planCards([student('r1', [['i1', 1]]), student(null, [['i1', 0]]), student('r3', [['i1', 0]], true)]);
    expect(cards).toEqual([]);
  });

  it('counts a student who rejoined under the same roster name once', () => {
    expect(planCards([student('r1', [['i1', 0]]), student('r1', [['i1', 0]])])).toHaveLength(1);
  });
});

describe('isCorrect', () => {
  it('needs full credit: partial credit is not yet known (common practice in Leitner drills)', () => {
    expect(isCorrect(1)).toBe(true);
    expect(isCorrect(0.5)).toBe(false);
    expect(isCorrect(0)).toBe(false);
  });
});

describe('earliestDue', () => {
  it('gives the smallest due time, or null without cards', () => {
    expect(earliestDue([{ dueAt: 30 }, { dueAt: 10 }, { dueAt: 20 }])).toBe(10);
    expect(earliestDue([])).toBeNull();
  });
});
