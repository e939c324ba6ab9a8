import { parseNumberText } from './numeric-text';

/** How many significant figures a typed number may carry. `min < max` when trailing zeros are ambiguous. */
export interface SigFigRange {
  min: number;
  max: number;
}

/**
 * Counts significant figures of a mantissa as typed (BCIT CHEM 0010 §1.6.2 rules):
 * leading zeros never count; zeros between non-zero digits count; trailing zeros count when
 * a decimal point is written ("34.070" → 5, "400." → 3). Trailing zeros of an integer written
 * without a point are ambiguous ("300" → 1 to 3), so we accept any count in that range.
 * All-zero values ("0", "0.00") have no agreed count: we take the digits after the point,
 * at least 1 (common practice, not from a published source).
 */
export function countMantissaSignificantFigures(mantissa: string): SigFigRange {
  const hasPoint = mantissa.includes('.');
  const digits = mantissa.replace('.', '');
  const firstNonZero = digits.search(/[1-9]/);
  if (firstNonZero === -1) {
    const afterPoint = hasPoint ? mantissa.length - mantissa.indexOf('.') - 1 : 0;
    const count = Math.max(1, afterPoint);
    return { min: count, max: count };
  }
  const significant = digits.slice(firstNonZero);
  if (hasPoint) return { min: significant.length, max: significant.length };
  const withoutTrailingZeros = significant.replace(/0+$/, '');
  return { min: withoutTrailingZeros.length, max: significant.length };
}

/**
 * Significant figures of a typed number ("0.0670", "400.", "6.02e23", "6.02 × 10^23"); the
 * power of ten does not count. Null when the text is not a number on its own.
 */
export function countSignificantFigures(text: string): SigFigRange | null {
  const parsed = parseNumberText(text);
  return parsed ? countMantissaSignificantFigures(parsed.mantissa) : null;
}

export function sigFigRangeIncludes(range: SigFigRange, count: number): boolean {
  return range.min <= count && count <= range.max;
}
