import { DebriefInput, DebriefInputError } from './debrief-input';
import { answer, choiceItem, openItem } from './debrief.fixtures';
import { buildResponseMatrix } from './response-matrix';

function input(overrides: Partial<DebriefInput>): DebriefInput {
  return {
    items: [choiceItem('C1', ['A', 'B'], ['A']), openItem('P1', false)],
    examinees: [{ id: 'a' }, { id: 'b' }, { id: 'gone', removed: true }],
    responses: [],
    ...overrides,
  };
}

describe(buildResponseMatrix.name, () => {
  it('fills missing responses as not answered with credit 0', () => {
    // Brief: a missing response means not answered (credit 0)
    const matrix = buildResponseMatrix(input({ responses: [answer('a', 'C1', 1, ['A'])] }));
    expect(matrix.rows.map((row) => row.credits)).toEqual([[1, 0], [0, 0]]);
    expect(matrix.rows[1].answered).toEqual([false, false]);
    expect(matrix.rows.map((row) => row.total)).toEqual([1, 0]);
  });

  it('drops the responses of removed examinees and counts them', () => {
    // Brief: removed examinees are excluded and counted
    const matrix = buildResponseMatrix(input({ responses: [answer('gone', 'C1', 1, ['A'])] }));
    expect(matrix.rows.map((row) => row.examineeId)).toEqual(['a', 'b']);
    expect(matrix.removedCount).toBe(1);
  });

  it.each([
    ['credit above 1', { responses: [answer('a', 'P1', 1.5)] }, /outside 0..1/],
    ['NaN credit', { responses: [answer('a', 'P1', Number.NaN)] }, /outside 0..1/],
    ['partial credit on a dichotomous item', { responses: [answer('a', 'C1', 0.5, ['A'])] }, /dichotomous/],
    ['an unknown examinee', { responses: [answer('zed', 'C1', 1, ['A'])] }, /unknown examinee/],
    ['an unknown item', { responses: [answer('a', 'Q9', 1)] }, /unknown item/],
    ['an unknown option', { responses: [answer('a', 'C1', 0, ['Z'])] }, /unknown option/],
    ['a duplicate response', { responses: [answer('a', 'P1', 1), answer('a', 'P1', 0)] }, /duplicate response/],
    ['a duplicate examinee', { examinees: [{ id: 'a' }, { id: 'a' }] }, /duplicate examinee/],
    ['a key that is not an option', { items: [choiceItem('C1', ['A'], ['B'])] }, /not one of its options/],
    [
      'credit on an unanswered response',
      { responses: [{ examineeId: 'a', itemId: 'P1', credit: 1, chosenOptionIds: [], answered: false }] },
      /not answered/,
    ],
  ])('refuses %s', (_label, overrides, message) => {
    // Input contract: the caller's bugs fail loudly instead of skewing figures (common practice)
    expect(() => buildResponseMatrix(input(overrides as Partial<DebriefInput>))).toThrow(DebriefInputError);
    expect(() => buildResponseMatrix(input(overrides as Partial<DebriefInput>))).toThrow(message);
  });
});
