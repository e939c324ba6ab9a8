import { mean } from 'simple-statistics';
import { meanOfFigures, NO_PERCENT_REASON } from './mean-figure';

describe('meanOfFigures', () => {
  it('matches simple-statistics mean over the computed figures', () => {
    // Reference: simple-statistics `mean` (arithmetic mean).
    const values = [0.25, 0.8, 0.5, 1];
    const result = meanOfFigures(values.map((value) => ({ value, reason: null })));
    expect(result.value).toBeCloseTo(mean(values), 12);
  });

  it('leaves out figures that could not be computed instead of counting them as zero', () => {
    const result = meanOfFigures([
      { value: 0.6, reason: null },
      { value: null, reason: 'fewer than 2 examinees' },
      { value: 0.2, reason: null },
    ]);
    expect(result.value).toBeCloseTo(mean([0.6, 0.2]), 12); // simple-statistics mean
  });

  it('says why when nothing was computed', () => {
    expect(meanOfFigures([])).toEqual({ value: null, reason: NO_PERCENT_REASON });
    expect(meanOfFigures([{ value: null, reason: 'x' }])).toEqual({ value: null, reason: NO_PERCENT_REASON });
  });
});
