import { sampleVariance, variance } from 'simple-statistics';
import { lsat6Rows, rowTotals, w10Rows } from './debrief.fixtures';
import { NotComputedReason } from './figure';
import {
  analyseReliability,
  cronbachAlpha,
  kuderRichardson20,
  kuderRichardson21,
  standardErrorOfMeasurement,
} from './reliability';

describe('kuderRichardson20', () => {
  it('gives 0.69635 on W10, not the 0.73782 of Σpq over an n−1 total variance', () => {
    // Wuensch KR20.txt data; REFERENCES.md §1: 10/9·(1 − 2.18/5.84) = 0.69635 [C], 0.73782 = bug detector
    const rows = w10Rows();
    const wrong = (10 / 9) * (1 - 2.18 / sampleVariance(rowTotals(rows)));
    expect(wrong).toBeCloseTo(0.73782, 5); // the detector is what the n−1 mix-up really gives
    expect(kuderRichardson20(rows).value).toBeCloseTo(0.69635, 5);
    expect(kuderRichardson20(rows).value).not.toBeCloseTo(wrong, 2);
  });

  it('gives 0.29500 on LSAT6, equal to alpha', () => {
    // REFERENCES.md §1 [C]; ltm cronbach.alpha
    expect(kuderRichardson20(lsat6Rows()).value).toBeCloseTo(0.295, 5);
    expect(cronbachAlpha(lsat6Rows()).value).toBeCloseTo(0.295, 5);
  });

  it('is null for fewer than 2 examinees, fewer than 2 items, or zero total variance', () => {
    // Formula guards: k/(k−1) and ÷σ²ₓ (DESIGN.md §6 edge cases)
    expect(kuderRichardson20([[1, 0]])).toEqual({ value: null, reason: NotComputedReason.fewerThanTwoExaminees });
    expect(kuderRichardson20([[1], [0]])).toEqual({ value: null, reason: NotComputedReason.fewerThanTwoItems });
    expect(cronbachAlpha([[1, 0], [0, 1]])).toEqual({ value: null, reason: NotComputedReason.zeroTotalVariance });
  });
});

describe('kuderRichardson21', () => {
  it('gives 0.68417 on W10 summary figures (k 10, mean 6.6, var 5.84)', () => {
    // Wuensch [R] summary figures; REFERENCES.md §1 KR-21 0.68417 [C]
    expect(kuderRichardson21({ itemCount: 10, mean: 6.6, variance: 5.84 }).value).toBeCloseTo(0.68417, 5);
  });

  it('gives 0.19644 on LSAT6 with the ÷N variance from simple-statistics', () => {
    // REFERENCES.md §1: mean 3.819, var(÷N) 1.070239 → 0.19644 [C]; simple-statistics variance is ÷N
    const totals = rowTotals(lsat6Rows());
    expect(variance(totals)).toBeCloseTo(1.070239, 6);
    expect(kuderRichardson21({ itemCount: 5, mean: 3.819, variance: variance(totals) }).value).toBeCloseTo(0.19644, 5);
  });

  it('is null for one item or zero variance', () => {
    // Formula guards
    expect(kuderRichardson21({ itemCount: 1, mean: 1, variance: 1 }).value).toBeNull();
    expect(kuderRichardson21({ itemCount: 5, mean: 5, variance: 0 }).reason).toBe(NotComputedReason.zeroTotalVariance);
  });
});

describe('standardErrorOfMeasurement', () => {
  it('is SD·√(1 − r)', () => {
    // Classical test theory SEM; textbook example SD 10, r .91 → 3 (from memory); r = 1 → 0, r = 0 → SD
    expect(standardErrorOfMeasurement(10, 0.91)).toBeCloseTo(3, 12);
    expect(standardErrorOfMeasurement(4, 1)).toBe(0);
    expect(standardErrorOfMeasurement(4, 0)).toBe(4);
  });
});

describe('analyseReliability', () => {
  it('reports alpha and no KR-21 when some item gives partial credit', () => {
    // DESIGN.md §6: KR-20 for all-dichotomous sessions, alpha otherwise
    const result = analyseReliability({
      itemIds: ['Q1', 'Q2'],
      excludedItemIds: [],
      allDichotomous: false,
      scores: [
        [1, 0.5],
        [0, 0],
        [1, 1],
      ],
    });
    expect(result.method).toBe('alpha');
    expect(result.kr21.reason).toBe(NotComputedReason.notDichotomous);
    expect(result.coefficient.value).not.toBeNull();
    expect(result.sem.value).toBeCloseTo(
      Math.sqrt(result.totalVariance.value ?? NaN) * Math.sqrt(1 - (result.coefficient.value ?? NaN)),
      12,
    );
  });
});
