import fc from 'fast-check';
import { checkAnswer } from './check-answer';
import { multiCredit } from './check-choice';
import { multiItem, singleItem, trueFalseItem } from './answer-check.factories';

describe('checkAnswer (single, truefalse)', () => {
  // DESIGN.md §5: single and truefalse are 1 or 0.
  it('gives 1 for the correct option and 0 for another or an unknown one', () => {
    expect(checkAnswer(singleItem('o2'), { type: 'single', optionId: 'o2' })).toEqual({ credit: 1, correct: true, detail: 'exact' });
    expect(checkAnswer(singleItem('o2'), { type: 'single', optionId: 'o1' })).toEqual({ credit: 0, correct: false, detail: 'wrong' });
    expect(checkAnswer(singleItem('o2'), { type: 'single', optionId: 'nope' }).credit).toBe(0);
  });

  it('gives 1 when the true/false value matches the key and 0 otherwise', () => {
    expect(checkAnswer(trueFalseItem(false), { type: 'truefalse', value: false }).credit).toBe(1);
    expect(checkAnswer(trueFalseItem(false), { type: 'truefalse', value: true }).credit).toBe(0);
  });
});

describe('checkAnswer (multi)', () => {
  const pick = (...optionIds: string[]) => checkAnswer(multiItem(['o1', 'o2', 'o3']), { type: 'multi', optionIds });

  // DESIGN.md §5: (correct picks − wrong picks) / number correct, floored at 0. Key has 3 correct.
  it.each([
    [['o1', 'o2', 'o3'], 1, 'exact'],
    [['o1', 'o2'], 2 / 3, 'partial'],
    [['o1', 'o2', 'o4'], 1 / 3, 'partial'],
    [['o1', 'o2', 'o3', 'o4'], 2 / 3, 'partial'],
    [['o1', 'o4', 'o5'], 0, 'wrong'], // 1 − 2 < 0 → floored
    [['o4'], 0, 'wrong'],
  ] as const)('picks %j earn %d (%s)', (ids, credit, detail) => {
    const result = pick(...ids);
    expect(result.credit).toBeCloseTo(credit, 12);
    expect(result.detail).toBe(detail);
  });

  it('counts a duplicated pick once', () => {
    expect(pick('o1', 'o1', 'o1').credit).toBeCloseTo(1 / 3, 12);
  });

  it('counts an id that is not an option as a wrong pick', () => {
    expect(pick('o1', 'o2', 'o3', 'ghost').credit).toBeCloseTo(2 / 3, 12);
  });

  it('gives no_answer for an empty selection', () => {
    expect(pick()).toEqual({ credit: 0, correct: false, detail: 'no_answer' });
  });

  // Properties that follow from the DESIGN §5 formula, over random picks.
  const ids = ['o1', 'o2', 'o3', 'o4', 'o5', 'o6', 'x'];
  const picks = fc.array(fc.constantFrom(...ids), { maxLength: 10 });
  const correct = fc.uniqueArray(fc.constantFrom<string>('o1', 'o2', 'o3', 'o4', 'o5', 'o6'), { minLength: 1 });

  it('stays within 0..1 and adding a correct pick never lowers credit, a wrong one never raises it', () => {
    fc.assert(
      fc.property(correct, picks, fc.constantFrom(...ids), (key, picked, extra) => {
        const before = multiCredit(key, picked);
        const after = multiCredit(key, [...picked, extra]);
        expect(before).toBeGreaterThanOrEqual(0);
        expect(before).toBeLessThanOrEqual(1);
        if (key.includes(extra)) expect(after).toBeGreaterThanOrEqual(before);
        else expect(after).toBeLessThanOrEqual(before);
      }),
    );
  });

  it('gives full credit only for exactly the correct set', () => {
    fc.assert(
      fc.property(correct, picks, (key, picked) => {
        const exact = new Set(picked).size === key.length && key.every((id) => picked.includes(id));
        expect(multiCredit(key, picked) === 1).toBe(exact);
      }),
    );
  });
});
