import { countSignificantFigures } from './significant-figures';

describe('countSignificantFigures', () => {
  // BCIT CHEM 0010 §1.6.2, nobel.scas.bcit.ca/chem0010/unit1/1.6_sigFig_3.htm (REFERENCES.md §3 [R]).
  it.each([
    ['456', 3],
    ['0.00567', 3],
    ['207.08', 5],
    ['0.0401', 3],
    ['34.070', 5],
    ['0.0670', 3],
    ['400.', 3],
  ])('counts %s as %d significant figures (BCIT examples)', (text, count) => {
    expect(countSignificantFigures(text)).toEqual({ min: count, max: count });
  });

  // BCIT: "300" is ambiguous; we accept 1, 2 or 3 (trailing zeros of an integer may or may not count).
  it('reports "300" as ambiguous between 1 and 3', () => {
    expect(countSignificantFigures('300')).toEqual({ min: 1, max: 3 });
  });

  // Common practice: in scientific notation only the mantissa's digits count; sign does not.
  it.each([
    ['6.02e23', 3],
    ['6.020E23', 4],
    ['6.02 × 10^23', 3],
    ['6.02x10^-23', 3],
    ['6.020 × 10²³', 4],
    ['-0.0050', 2],
    ['+12.0', 3],
    ['.50', 2],
  ])('counts %s as %d significant figures', (text, count) => {
    expect(countSignificantFigures(text)).toEqual({ min: count, max: count });
  });

  // Common practice (no published rule found): a written zero has as many figures as decimals, at least 1.
  it('counts zeros by their decimals', () => {
    expect(countSignificantFigures('0')).toEqual({ min: 1, max: 1 });
    expect(countSignificantFigures('0.00')).toEqual({ min: 2, max: 2 });
  });

  it.each(['', 'abc', '0,50', '1 000', '0.50 mol', '5.5.5'])('returns null for %j, which is not a number alone', (text) => {
    expect(countSignificantFigures(text)).toBeNull();
  });
});
