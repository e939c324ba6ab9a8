import { all, create, type BigNumber, type Unit } from 'mathjs';

/**
 * A private mathjs instance, so the extra unit below does not leak into other code.
 * Values are BigNumbers: prefix and SI factors are exact decimals, so `1 mL` is exactly
 * `1 cm^3` (with JS numbers it is 0.9999999999999998, REFERENCES.md §3).
 */
const math = create(all);
// Molarity, everyday in chemistry and absent from mathjs: "0.50 M", "250 mM".
math.createUnit('M', { definition: '1 mol/L', prefixes: 'short' });

export type Decimal = BigNumber;

export function toDecimal(value: string | number): Decimal {
  return math.bignumber(value);
}

/** Parses a unit with no number in it ("mL", "J/(mol K)", "mol^-1"); null when mathjs cannot. */
export function parseUnit(unitText: string): Unit | null {
  if (unitText.trim() === '') return null;
  try {
    const unit = math.unit(unitText);
    if (unit.value !== null || unit.units.length === 0) return null;
    return unit;
  } catch {
    return null;
  }
}

/** True when both units measure the same kind of quantity (same SI dimensions). */
export function sameDimension(a: Unit, b: Unit): boolean {
  return a.equalBase(b);
}

/** `value fromUnit` expressed in `toUnit`, exactly where the factors are exact. */
export function convertDecimal(value: Decimal, fromUnit: string, toUnit: string): Decimal {
  return math.unit(value, fromUnit).toNumeric(toUnit) as Decimal;
}
