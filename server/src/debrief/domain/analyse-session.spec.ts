import { sampleCorrelation, variance } from 'simple-statistics';
import { analyseSession } from './analyse-session';
import {
  answer,
  columnOf,
  inputFromRows,
  lsat6Input,
  lsat6Rows,
  openItem,
  rowTotals,
  w10Input,
  w10Rows,
} from './debrief.fixtures';
import { NotComputedReason } from './figure';

function values(figures: readonly { value: number | null }[]): (number | null)[] {
  return figures.map((figure) => figure.value);
}

function expectAllClose(actual: readonly (number | null)[], expected: readonly number[], digits: number): void {
  expect(actual).toHaveLength(expected.length);
  expected.forEach((value, i) => expect(actual[i]).toBeCloseTo(value, digits));
}

describe('analyseSession', () => {
  describe('on LSAT6 (Bock & Lieberman 1970, 1000 examinees)', () => {
    const analysis = analyseSession(lsat6Input());

    it('gives p per item as ltm descript prints it', () => {
      // Rizopoulos (2006) J. Stat. Softw., §3.1 descript(LSAT) [R in REFERENCES.md §1]
      expectAllClose(values(analysis.items.map((item) => item.difficulty)), [0.924, 0.709, 0.553, 0.763, 0.87], 3);
    });

    it('gives the total-score frequencies 0..5 as ltm descript prints them', () => {
      // Rizopoulos (2006) §3.1 descript(LSAT)
      const frequencies = [0, 1, 2, 3, 4, 5].map((score) => analysis.examinees.filter((e) => e.score === score).length);
      expect(frequencies).toEqual([3, 20, 85, 237, 357, 298]);
    });

    it('gives the corrected item-total correlation (item removed from the total)', () => {
      // REFERENCES.md §1 [C]; ltm descript computes biserial.cor(rowSums(X[,-i]), X[,i])
      expectAllClose(values(analysis.items.map((item) => item.pointBiserial)), [0.1128, 0.1532, 0.1728, 0.1444, 0.1216], 4);
    });

    it('gives the uncorrected point-biserial within 0.001 of ltm', () => {
      // REFERENCES.md §1: Pearson 0.3620 0.5668 0.6184 0.5344 0.4354 [C]; JSS prints 0.566 for item 2 (n−1 SD)
      const actual = values(analysis.items.map((item) => item.itemTotalCorrelation));
      [0.362, 0.5668, 0.6184, 0.5344, 0.4354].forEach((value, i) => expect(Math.abs((actual[i] ?? NaN) - value)).toBeLessThan(0.001));
    });

    it('uses KR-20 for an all-dichotomous session: 0.29500', () => {
      // REFERENCES.md §1 [C]; ltm cronbach.alpha prints 0.295 [M]
      expect(analysis.reliability.method).toBe('kr20');
      expect(analysis.reliability.coefficient.value).toBeCloseTo(0.295, 5);
    });

    it('gives KR-21 0.19644 from mean 3.819 and ÷N variance 1.070239', () => {
      // REFERENCES.md §1 [C]
      expect(analysis.reliability.totalMean.value).toBeCloseTo(3.819, 9);
      expect(analysis.reliability.totalVariance.value).toBeCloseTo(1.070239, 6);
      expect(analysis.reliability.kr21.value).toBeCloseTo(0.19644, 5);
    });

    it('gives reliability if item deleted', () => {
      // REFERENCES.md §1 "alpha if item deleted" [C]
      expectAllClose(
        values(analysis.items.map((item) => item.reliabilityIfDeleted)),
        [0.2754, 0.2376, 0.2168, 0.2459, 0.2663],
        4,
      );
    });

    it('matches simple-statistics sampleCorrelation for item credit against rest score', () => {
      // simple-statistics sampleCorrelation: an independent general-purpose Pearson r
      const rows = lsat6Rows();
      const totals = rowTotals(rows);
      analysis.items.forEach((item, j) => {
        const credits = columnOf(rows, j);
        const rest = totals.map((total, r) => total - credits[r]);
        expect(item.pointBiserial.value).toBeCloseTo(sampleCorrelation(credits, rest), 12);
      });
    });
  });

  describe('on W10 (Wuensch, "The Kuder-Richardson 20", ECU)', () => {
    const analysis = analyseSession(w10Input());
    const rows = w10Rows();

    it('gives p per item and Σpq = 2.18 as Wuensch prints them', () => {
      // Wuensch KR20.txt [R]
      const ps = values(analysis.items.map((item) => item.difficulty));
      expectAllClose(ps, [0.7, 0.7, 0.6, 0.7, 0.6, 0.8, 0.7, 0.7, 0.5, 0.6], 12);
      const sumPq = ps.reduce((acc: number, p) => acc + (p ?? NaN) * (1 - (p ?? NaN)), 0);
      expect(sumPq).toBeCloseTo(2.18, 12);
    });

    it('gives the totals, mean 6.6 and ÷N variance 5.84 as Wuensch prints them', () => {
      // Wuensch KR20.txt [R]; variance also against simple-statistics variance (÷N)
      const scores = analysis.examinees.map((e) => e.score);
      expect(scores).toEqual([8, 7, 7, 2, 2, 9, 8, 9, 7, 7]);
      expect(analysis.reliability.totalMean.value).toBeCloseTo(6.6, 12);
      expect(analysis.reliability.totalVariance.value).toBeCloseTo(5.84, 12);
      expect(analysis.reliability.totalVariance.value).toBeCloseTo(variance(scores), 12);
    });

    it('gives KR-20 = 0.69635 and never the n−1 mix-up value 0.73782', () => {
      // REFERENCES.md §1: 10/9·(1 − 2.18/5.84) [C from Wuensch data]; 0.73782 is the bug detector
      const r = analysis.reliability.coefficient.value ?? NaN;
      expect(r).toBeCloseTo(0.69635, 5);
      expect(Math.abs(r - 0.73782)).toBeGreaterThan(0.01);
    });

    it('gives KR-21 0.68417', () => {
      // REFERENCES.md §1 [C]
      expect(analysis.reliability.kr21.value).toBeCloseTo(0.68417, 5);
    });

    it('gives SEM = SD·√(1 − r) with the ÷N SD of totals', () => {
      // Expected value computed here from Wuensch's published var(÷N) 5.84 and KR-20 0.69635 (REFERENCES.md §1)
      const expected = Math.sqrt(5.84) * Math.sqrt(1 - 0.69635);
      expect(analysis.reliability.totalSd.value).toBeCloseTo(Math.sqrt(5.84), 12);
      expect(analysis.reliability.sem.value).toBeCloseTo(expected, 4);
    });

    it('gives the corrected item-total correlations', () => {
      // REFERENCES.md §1 [C]
      expectAllClose(
        values(analysis.items.map((item) => item.pointBiserial)),
        [0.7059, 0.7059, 0.0, 0.4736, 0.5839, 0.2861, -0.0274, 0.7059, -0.1236, 0.4759],
        4,
      );
    });

    it('gives the uncorrected item-total correlations', () => {
      // REFERENCES.md §1 [C]
      expectAllClose(
        values(analysis.items.map((item) => item.itemTotalCorrelation)),
        [0.7946, 0.7946, 0.2027, 0.614, 0.7095, 0.4345, 0.1625, 0.7946, 0.0828, 0.6251],
        4,
      );
    });

    it('agrees with the point-biserial formula (M1 − M0)/s·√(pq) = 0.79463 for item 1', () => {
      // REFERENCES.md §1: M1 = 7.857, M0 = 3.667, s(÷N) = 2.4166, p = .7 [C]; recomputed here from the data
      const totals = rowTotals(rows);
      const credits = columnOf(rows, 0);
      const m1 = totals.filter((_, r) => credits[r] === 1);
      const m0 = totals.filter((_, r) => credits[r] === 0);
      const mean = (xs: number[]): number => xs.reduce((a, b) => a + b, 0) / xs.length;
      const p = m1.length / totals.length;
      const formula = ((mean(m1) - mean(m0)) / Math.sqrt(variance(totals))) * Math.sqrt(p * (1 - p));
      expect(formula).toBeCloseTo(0.79463, 5);
      expect(analysis.items[0].itemTotalCorrelation.value).toBeCloseTo(formula, 12);
    });

    it('matches simple-statistics sampleCorrelation for item credit against rest score', () => {
      // simple-statistics sampleCorrelation as an independent Pearson r; item 3's r is 0 to float noise
      const totals = rowTotals(rows);
      analysis.items.forEach((item, j) => {
        const credits = columnOf(rows, j);
        const rest = totals.map((total, r) => total - credits[r]);
        expect(item.pointBiserial.value).toBeCloseTo(sampleCorrelation(credits, rest), 12);
      });
    });

    it('gives D from the documented groups: upper F, H, A and lower D, E, J', () => {
      // Kelley (1939) via Lopez (1998) RMT 12:1: D = p(U) − p(L); groups per our tie rule (kelley-groups.spec)
      const byId = Object.fromEntries(analysis.examinees.map((e, r) => [e.examineeId, rows[r]]));
      analysis.items.forEach((item, j) => {
        const pUpper = (byId.F[j] + byId.H[j] + byId.A[j]) / 3;
        const pLower = (byId.D[j] + byId.E[j] + byId.J[j]) / 3;
        expect(item.discrimination.value).toBeCloseTo(pUpper - pLower, 12);
      });
    });
  });

  describe('with partial credit', () => {
    it('uses Cronbach alpha with ÷N variances, matching simple-statistics variance', () => {
      // Cronbach (1951) alpha = k/(k−1)(1 − Σσ²ᵢ/σ²ₓ), variances from simple-statistics (÷N) — textbook formula
      const rows = [
        [1, 0.5, 1],
        [0.5, 0.5, 0],
        [0, 0, 0.5],
        [1, 1, 1],
        [0.5, 0, 0],
      ];
      const analysis = analyseSession(inputFromRows(rows, ['a', 'b', 'c', 'd', 'e'], false));
      const itemVariances = [0, 1, 2].map((j) => variance(columnOf(rows, j)));
      const expected = 1.5 * (1 - itemVariances.reduce((a, b) => a + b, 0) / variance(rowTotals(rows)));
      expect(analysis.reliability.method).toBe('alpha');
      expect(analysis.reliability.coefficient.value).toBeCloseTo(expected, 12);
      expect(analysis.reliability.kr21).toEqual({ value: null, reason: NotComputedReason.notDichotomous });
    });

    it('counts an unanswered item as credit 0 in p, totals and missed items', () => {
      // DESIGN.md §6: p = mean credit over examinees present; omissions score 0 (common practice)
      const analysis = analyseSession({
        items: [openItem('Q1'), openItem('Q2')],
        examinees: [{ id: 'a' }, { id: 'b' }, { id: 'c' }, { id: 'd' }],
        responses: [answer('a', 'Q1', 1), answer('b', 'Q1', 1), answer('c', 'Q1', 0), answer('a', 'Q2', 1)],
      });
      expect(analysis.items[0].difficulty.value).toBeCloseTo(0.5, 12);
      expect(analysis.items[1].difficulty.value).toBeCloseTo(0.25, 12);
      expect(analysis.items[0].answeredCount).toBe(3);
      const d = analysis.examinees.find((e) => e.examineeId === 'd');
      expect(d?.score).toBe(0);
      expect(d?.percent.value).toBe(0);
      expect(d?.missedItems).toEqual([
        { itemId: 'Q1', credit: 0, answered: false, chosenOptionIds: [] },
        { itemId: 'Q2', credit: 0, answered: false, chosenOptionIds: [] },
      ]);
    });
  });
});
