import fc from 'fast-check';
import { analyseSession, SessionAnalysis } from './analyse-session';
import { DebriefInput } from './debrief-input';
import { answer, inputFromRows, openItem, w10Input } from './debrief.fixtures';
import { NotComputedReason } from './figure';
import { cronbachAlpha, kuderRichardson20 } from './reliability';

/** Every number anywhere in the analysis, with its path. */
function numbersIn(value: unknown, path = '$'): [string, number][] {
  if (typeof value === 'number') return [[path, value]];
  if (Array.isArray(value)) return value.flatMap((v, i) => numbersIn(v, `${path}[${i}]`));
  if (value !== null && typeof value === 'object') {
    return Object.entries(value).flatMap(([k, v]) => numbersIn(v, `${path}.${k}`));
  }
  return [];
}

function expectOnlyFiniteNumbers(analysis: SessionAnalysis): void {
  const bad = numbersIn(analysis).filter(([, n]) => !Number.isFinite(n));
  expect(bad).toEqual([]);
}

describe('analyseSession edge cases', () => {
  it('with one examinee gives p and percent but no D, correlation or reliability', () => {
    // DESIGN.md §6: N < 2 → "not enough data", never NaN
    const analysis = analyseSession(inputFromRows([[1, 0, 1]], ['solo']));
    const reason = NotComputedReason.fewerThanTwoExaminees;
    expect(analysis.items[0].difficulty.value).toBe(1);
    expect(analysis.items[0].discrimination).toEqual({ value: null, reason });
    expect(analysis.items[0].pointBiserial).toEqual({ value: null, reason });
    expect(analysis.reliability.coefficient).toEqual({ value: null, reason });
    expect(analysis.reliability.sem).toEqual({ value: null, reason });
    expect(analysis.reliability.kr21).toEqual({ value: null, reason });
    expect(analysis.examinees[0].percent.value).toBeCloseTo(200 / 3, 12);
    expectOnlyFiniteNumbers(analysis);
  });

  it('with every examinee on the same total gives no groups, D, reliability or SEM', () => {
    // Zero total variance: KR-20/alpha divide by it (DESIGN.md §6 edge cases)
    const analysis = analyseSession(inputFromRows([[1, 0], [0, 1], [1, 0]], ['a', 'b', 'c']));
    const reason = NotComputedReason.zeroTotalVariance;
    expect(analysis.groups).toEqual({ value: null, reason });
    expect(analysis.items[0].discrimination).toEqual({ value: null, reason });
    expect(analysis.reliability.coefficient).toEqual({ value: null, reason });
    expect(analysis.reliability.sem).toEqual({ value: null, reason });
    expect(analysis.reliability.totalVariance.value).toBe(0);
    // The rest score still varies, so the corrected correlation exists: here −1.
    expect(analysis.items[0].pointBiserial.value).toBeCloseTo(-1, 12);
    expect(analysis.items[0].itemTotalCorrelation).toEqual({ value: null, reason });
    expectOnlyFiniteNumbers(analysis);
  });

  it('with zero rest-score variance gives no corrected correlation', () => {
    // r with a constant variable is undefined (textbook Pearson)
    const analysis = analyseSession(inputFromRows([[1, 1], [0, 1], [1, 1]], ['a', 'b', 'c']));
    expect(analysis.items[0].pointBiserial).toEqual({ value: null, reason: NotComputedReason.zeroRestVariance });
  });

  it('gives an item nobody answered p = null and leaves it out of the reliability', () => {
    // Brief: an item nobody answered has p = null; KR-20 over the answered items only
    const base = w10Input();
    const withSilentItem: DebriefInput = { ...base, items: [...base.items, openItem('Q11')] };
    const analysis = analyseSession(withSilentItem);
    const silent = analysis.items[10];
    const reason = NotComputedReason.nobodyAnswered;
    expect(silent.difficulty).toEqual({ value: null, reason });
    expect(silent.discrimination).toEqual({ value: null, reason });
    expect(silent.pointBiserial).toEqual({ value: null, reason });
    expect(silent.reliabilityIfDeleted).toEqual({ value: null, reason });
    expect(silent.flags).toEqual([]);
    expect(analysis.reliability.excludedItemIds).toEqual(['Q11']);
    // W10 KR-20 = 0.69635 (REFERENCES.md §1) is unchanged by the silent item.
    expect(analysis.reliability.coefficient.value).toBeCloseTo(0.69635, 5);
    // It still counts as played: W10 student A scored 8 of 11.
    expect(analysis.examinees[0].percent.value).toBeCloseTo(800 / 11, 12);
    expectOnlyFiniteNumbers(analysis);
  });

  it('gives no reliability for a single item', () => {
    // k/(k−1) is undefined for k = 1 (KR-20/alpha formula)
    const analysis = analyseSession(inputFromRows([[1], [0], [1]], ['a', 'b', 'c']));
    expect(analysis.reliability.coefficient).toEqual({ value: null, reason: NotComputedReason.fewerThanTwoItems });
    expect(analysis.reliability.kr21).toEqual({ value: null, reason: NotComputedReason.fewerThanTwoItems });
    expect(analysis.items[0].reliabilityIfDeleted.value).toBeNull();
  });

  it('excludes a removed examinee from every figure and counts them', () => {
    // Brief: data deleted on request is in no figure; W10 must still give KR-20 0.69635 (REFERENCES.md §1)
    const base = w10Input();
    const withRemoved: DebriefInput = {
      ...base,
      examinees: [...base.examinees, { id: 'Z', removed: true }],
      responses: [...base.responses, ...base.items.map((item) => answer('Z', item.id, 1))],
      teams: [{ id: 'T1', memberIds: ['A', 'Z'] }],
    };
    const analysis = analyseSession(withRemoved);
    const { removedCount, teams, ...figures } = analysis;
    const { removedCount: baseRemoved, teams: _baseTeams, ...baseFigures } = analyseSession(base);
    expect(removedCount).toBe(1);
    expect(baseRemoved).toBe(0);
    expect(figures).toEqual(baseFigures);
    expect(analysis.examineeCount).toBe(10);
    expect(analysis.examinees.map((e) => e.examineeId)).not.toContain('Z');
    expect(teams[0].memberIds).toEqual(['A']);
    expect(analysis.reliability.coefficient.value).toBeCloseTo(0.69635, 5);
  });

  it('with every examinee removed gives null figures, not NaN', () => {
    // DESIGN.md §6: "not enough data", never a division by zero
    const input: DebriefInput = { ...inputFromRows([[1, 0]], ['a']), examinees: [{ id: 'a', removed: true }] };
    const analysis = analyseSession(input);
    expect(analysis.examineeCount).toBe(0);
    expect(analysis.items[0].difficulty).toEqual({ value: null, reason: NotComputedReason.noExaminees });
    expect(analysis.reliability.coefficient).toEqual({ value: null, reason: NotComputedReason.noExaminees });
    expect(analysis.reliability.totalSd).toEqual({ value: null, reason: NotComputedReason.noExaminees });
    expectOnlyFiniteNumbers(analysis);
  });

  it('with no items gives percent = null', () => {
    // Percent of zero items played is undefined
    const analysis = analyseSession({ items: [], examinees: [{ id: 'a' }, { id: 'b' }], responses: [] });
    expect(analysis.examinees[0].percent).toEqual({ value: null, reason: NotComputedReason.noItems });
    expect(analysis.reliability.coefficient.value).toBeNull();
    expectOnlyFiniteNumbers(analysis);
  });

  it('never yields NaN and keeps every figure in range on random sessions', () => {
    // Property test (fast-check): p ∈ [0,1], D ∈ [−1,1], r ∈ [−1,1], reliability ≤ 1 (common practice bounds)
    const credit = fc.constantFrom(0, 0.25, 0.5, 1);
    const matrix = fc.integer({ min: 1, max: 6 }).chain((k) =>
      fc.array(fc.array(fc.option(credit, { nil: undefined }), { minLength: k, maxLength: k }), { minLength: 0, maxLength: 12 }),
    );
    fc.assert(
      fc.property(matrix, (rows) => {
        const k = rows[0]?.length ?? 1;
        const ids = rows.map((_, r) => `p${r}`);
        const input: DebriefInput = {
          items: Array.from({ length: k }, (_, i) => openItem(`Q${i}`, false)),
          examinees: ids.map((id) => ({ id })),
          responses: rows.flatMap((row, r) =>
            row.flatMap((c, i) => (c === undefined ? [] : [answer(ids[r], `Q${i}`, c)])),
          ),
        };
        const analysis = analyseSession(input);
        expectOnlyFiniteNumbers(analysis);
        for (const item of analysis.items) {
          const { difficulty: p, discrimination: d, pointBiserial: r } = item;
          if (p.value !== null) expect(p.value >= 0 && p.value <= 1).toBe(true);
          if (d.value !== null) expect(Math.abs(d.value) <= 1 + 1e-12).toBe(true);
          if (r.value !== null) expect(Math.abs(r.value) <= 1).toBe(true);
        }
        const rel = analysis.reliability.coefficient.value;
        if (rel !== null) expect(rel <= 1 + 1e-12).toBe(true);
      }),
      { numRuns: 300, seed: 20240611 },
    );
  });

  it('gives KR-20 equal to alpha on any 0/1 matrix when both use ÷N variances', () => {
    // REFERENCES.md §1: pq is the ÷N variance of a 0/1 item, so KR-20 = alpha (property test, fast-check)
    const bits = fc.integer({ min: 2, max: 6 }).chain((k) =>
      fc.array(fc.array(fc.constantFrom(0, 1), { minLength: k, maxLength: k }), { minLength: 2, maxLength: 15 }),
    );
    fc.assert(
      fc.property(bits, (rows) => {
        const kr20 = kuderRichardson20(rows).value;
        const alpha = cronbachAlpha(rows).value;
        expect(kr20 === null).toBe(alpha === null);
        if (kr20 !== null && alpha !== null) expect(kr20).toBeCloseTo(alpha, 10);
      }),
      { numRuns: 300, seed: 7 },
    );
  });
});
