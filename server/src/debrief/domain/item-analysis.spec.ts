import { analyseSession } from './analyse-session';
import { DebriefInput, DebriefResponse } from './debrief-input';
import { answer, choiceItem, inputFromRows, openItem } from './debrief.fixtures';
import { NotComputedReason } from './figure';
import { ItemFlag, OptionShares, itemFlags } from './item-analysis';

const IDS = ['e0', 'e1', 'e2', 'e3', 'e4', 'e5', 'e6', 'e7', 'e8', 'e9'];

/**
 * Choice item C1 (key A) beside a ranking item block: examinee k scores 2·(9 − k) on
 * the open items, so the groups are e0–e2 (upper) and e7–e9 (lower) whatever C1 adds.
 */
function distractorSession(): DebriefInput {
  const choices: (string | null)[] = ['A', 'B', 'A', 'A', 'C', 'A', 'C', 'C', 'A', null];
  const ranking = inputFromRows(
    IDS.map((_, k) => Array.from({ length: 18 }, (_, j) => (j < 2 * (9 - k) ? 1 : 0))),
    IDS,
  );
  const c1: DebriefResponse[] = IDS.flatMap((id, k) => {
    const choice = choices[k];
    return choice === null ? [] : [answer(id, 'C1', choice === 'A' ? 1 : 0, [choice])];
  });
  return {
    ...ranking,
    items: [choiceItem('C1', ['A', 'B', 'C', 'D'], ['A']), ...ranking.items],
    responses: [...c1, ...ranking.responses],
  };
}

function option(options: OptionShares[], optionId: string): OptionShares {
  const found = options.find((o) => o.optionId === optionId);
  if (!found) throw new Error(`no option ${optionId}`);
  return found;
}

describe('distractor table', () => {
  const analysis = analyseSession(distractorSession());
  const table = analysis.items[0].distractors.value;
  const options = table?.options ?? [];

  it('gives the share choosing each option overall and in the upper and lower groups', () => {
    // DESIGN.md §6; hand-counted: A 5/10, B 1/10, C 3/10, D 0; upper e0–e2: A 2/3 B 1/3; lower e7–e9: A 1/3 C 1/3
    expect(analysis.groups.value?.upperIds).toEqual(['e0', 'e1', 'e2']);
    expect(option(options, 'A')).toMatchObject({ isKey: true, overall: 0.5 });
    expect(option(options, 'A').upper.value).toBeCloseTo(2 / 3, 12);
    expect(option(options, 'A').lower.value).toBeCloseTo(1 / 3, 12);
    expect(option(options, 'B').overall).toBeCloseTo(0.1, 12);
    expect(option(options, 'C').overall).toBeCloseTo(0.3, 12);
    expect(option(options, 'C').lower.value).toBeCloseTo(1 / 3, 12);
    expect(option(options, 'D').overall).toBe(0);
    expect(table?.notAnswered.overall).toBeCloseTo(0.1, 12);
    expect(table?.notAnswered.lower.value).toBeCloseTo(1 / 3, 12);
  });

  it('marks a distractor that draws the upper group more than the lower for review, never the key', () => {
    // DESIGN.md §6 review rule: B draws 1/3 of the upper and 0 of the lower; A does too but is the key
    expect(option(options, 'B').review).toBe(true);
    expect(option(options, 'C').review).toBe(false);
    expect(option(options, 'D').review).toBe(false);
    expect(option(options, 'A').review).toBe(false);
  });

  it('marks a distractor nobody chose as non-functional, never the key', () => {
    // Haladyna & Downing (1993), from memory: a functional distractor draws ≥ 5%
    expect(option(options, 'D').nonFunctional).toBe(true);
    expect(option(options, 'B').nonFunctional).toBe(false);
    expect(option(options, 'A').nonFunctional).toBe(false);
  });

  function oneChoiceSession(examineeCount: number): DebriefInput {
    const ids = Array.from({ length: examineeCount }, (_, k) => `s${String(k).padStart(2, '0')}`);
    return {
      items: [choiceItem('C1', ['A', 'B'], ['A'])],
      examinees: ids.map((id) => ({ id })),
      responses: ids.map((id, k) => (k === 0 ? answer(id, 'C1', 0, ['B']) : answer(id, 'C1', 1, ['A']))),
    };
  }

  it('treats exactly 5% as functional and just under 5% as non-functional', () => {
    // Haladyna & Downing (1993), from memory: "chosen by ≥5%"; 1 of 20 = 5%, 1 of 21 ≈ 4.8%
    const at = analyseSession(oneChoiceSession(20)).items[0].distractors.value?.options ?? [];
    const under = analyseSession(oneChoiceSession(21)).items[0].distractors.value?.options ?? [];
    expect(option(at, 'B').nonFunctional).toBe(false);
    expect(option(under, 'B').nonFunctional).toBe(true);
  });

  it('counts each option of a multi-select answer', () => {
    // DESIGN.md §5 multi: an examinee can choose several options; each share counts examinees choosing it
    const input: DebriefInput = {
      items: [{ id: 'M1', optionIds: ['A', 'B', 'C'], correctOptionIds: ['A', 'B'], dichotomous: false }],
      examinees: [{ id: 'a' }, { id: 'b' }],
      responses: [answer('a', 'M1', 1, ['A', 'B']), answer('b', 'M1', 0, ['A', 'C'])],
    };
    const options = analyseSession(input).items[0].distractors.value?.options ?? [];
    expect(options.map((o) => o.overall)).toEqual([1, 0.5, 0.5]);
    expect(options.map((o) => o.isKey)).toEqual([true, true, false]);
  });

  it('is null for a non-choice item', () => {
    // DESIGN.md §6: the table is for choice items
    expect(analysis.items[1].distractors).toEqual({ value: null, reason: NotComputedReason.notChoiceItem });
  });

  it('has null group shares when there are no groups', () => {
    // One examinee: no upper/lower groups (DESIGN.md §6 edge cases)
    const input: DebriefInput = {
      items: [choiceItem('C1', ['A', 'B'], ['A'])],
      examinees: [{ id: 'a' }],
      responses: [answer('a', 'C1', 0, ['B'])],
    };
    const b = option(analyseSession(input).items[0].distractors.value?.options ?? [], 'B');
    expect(b.overall).toBe(1);
    expect(b.upper).toEqual({ value: null, reason: NotComputedReason.fewerThanTwoExaminees });
    expect(b.review).toBe(false);
  });
});

describe('itemFlags', () => {
  it('flags hard below p 0.30 and easy above p 0.90, strictly', () => {
    // DESIGN.md §6 thresholds
    expect(itemFlags(0.3, null)).toEqual([]);
    expect(itemFlags(0.2999, null)).toEqual([ItemFlag.hard]);
    expect(itemFlags(0.9, null)).toEqual([]);
    expect(itemFlags(0.9001, null)).toEqual([ItemFlag.easy]);
  });

  it('flags weak below D 0.20 and possible mis-key below D 0, strictly', () => {
    // DESIGN.md §6; Ebel (1954) D < 0.20 low (REFERENCES.md §1)
    expect(itemFlags(0.5, 0.2)).toEqual([]);
    expect(itemFlags(0.5, 0.1999)).toEqual([ItemFlag.weak]);
    expect(itemFlags(0.5, 0)).toEqual([ItemFlag.weak]);
    expect(itemFlags(0.5, -0.01)).toEqual([ItemFlag.weak, ItemFlag.possibleMiskey]);
  });

  it('does not flag D = 0.6 − 0.4 as weak although the float is 0.19999999999999996', () => {
    // IEEE 754 subtraction noise (REFERENCES.md §3 JS pitfalls: 0.1 + 0.2)
    expect(0.6 - 0.4).toBeLessThan(0.2);
    expect(itemFlags(0.5, 0.6 - 0.4)).toEqual([]);
  });

  it('raises no flag from a null figure', () => {
    // DESIGN.md §6: a figure that cannot be computed shows "not enough data", not a flag
    expect(itemFlags(null, null)).toEqual([]);
  });

  it('flags an item the lower group gets right and the upper group wrong as a possible mis-key', () => {
    // D = −1 (Lopez 1998 range −1..+1) → weak and possible mis-key
    const rows = [
      [0, 1, 1, 1],
      [0, 1, 1, 0],
      [1, 0, 0, 0],
      [1, 0, 0, 0],
    ];
    const analysis = analyseSession(inputFromRows(rows, ['a', 'b', 'c', 'd']));
    expect(analysis.items[0].flags).toEqual([ItemFlag.weak, ItemFlag.possibleMiskey]);
  });

  it('flags an item everyone got right as easy in a session', () => {
    // DESIGN.md §6: p = 1 > 0.90
    const analysis = analyseSession({
      items: [openItem('Q1'), openItem('Q2')],
      examinees: [{ id: 'a' }, { id: 'b' }],
      responses: [answer('a', 'Q1', 1), answer('b', 'Q1', 1), answer('a', 'Q2', 1), answer('b', 'Q2', 0)],
    });
    expect(analysis.items[0].flags).toContain(ItemFlag.easy);
    expect(analysis.items[0].pointBiserial).toEqual({ value: null, reason: NotComputedReason.zeroItemVariance });
  });
});
