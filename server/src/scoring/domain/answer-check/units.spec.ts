import { unit as floatUnit } from 'mathjs';
import { checkAnswer } from './check-answer';
import { numericItem } from './answer-check.factories';
import { convertDecimal, toDecimal } from './units';

type QtyResult = { to(unit: string): { scalar: number } };
// js-quantities ships no types; it is only a second, independent units library for cross-checks.
const Qty = require('js-quantities') as (text: string) => QtyResult;

/** Credit for `answer` against a key of exactly `value unit`, with zero tolerance. */
const exactCredit = (answer: string, value: string, unit: string) =>
  checkAnswer(numericItem({ value, unit, tolerance: { kind: 'absolute', value: 0 } }), { type: 'numeric', text: answer });

describe('unit conversion', () => {
  // Exact by definition: SI Brochure 9th ed. (2019), non-SI units accepted for use with the SI
  // (litre = dm³ = 10⁻³ m³; bar = 100 kPa listed in NIST SP 811 (2008) App. B) and §2.3.1
  // (t/°C = T/K − 273.15); standard atmosphere = 101 325 Pa exactly, NIST SP 811 App. B.8.
  // Table and section numbers from memory; the values are the defining ones.
  it.each([
    ['1 L', '0.001', 'm^3'],
    ['1 dm^3', '1', 'L'],
    ['1 atm', '101325', 'Pa'],
    ['1 bar', '100', 'kPa'],
    ['0 degC', '273.15', 'K'],
    ['1 mL', '1', 'cm^3'], // REFERENCES.md §3: float mathjs gives 0.9999999999999998
    ['22400 mL', '22.4', 'L'], // DESIGN.md §5
    ['500 mmol', '0.50', 'mol'], // DESIGN.md §5
  ])('reads %s as exactly %s %s', (answer, value, unit) => {
    expect(exactCredit(answer, value, unit)).toEqual({ credit: 1, correct: true, detail: 'exact' });
  });

  it('is exact where plain mathjs numbers carry float noise', () => {
    // REFERENCES.md §3 [C]: the float path is off in the last bit ...
    expect(floatUnit('1 mL').toNumber('cm^3')).toBe(0.9999999999999998);
    // ... the BigNumber path we use is not.
    expect(convertDecimal(toDecimal('1'), 'mL', 'cm^3').toString()).toBe('1');
    expect(convertDecimal(toDecimal('5'), 'mL', 'L').toString()).toBe('0.005');
  });

  it('rejects a value just off the exact factor with zero tolerance', () => {
    expect(exactCredit('1.0001 atm', '101325', 'Pa').credit).toBe(0);
    expect(exactCredit('1 atm', '101325.01', 'Pa').credit).toBe(0);
  });

  // Cross-check against js-quantities 1.8 (REFERENCES.md §6), an independent units library.
  it.each([
    ['1 L', 'm^3', '1 L', 'm^3'],
    ['1 atm', 'Pa', '1 atm', 'Pa'],
    ['1 bar', 'kPa', '1 bar', 'kPa'],
    ['25 degC', 'K', '25 tempC', 'tempK'],
    ['500 mmol', 'mol', '500 mmol', 'mol'],
    ['22400 mL', 'L', '22400 mL', 'L'],
    ['1 inch', 'cm', '1 in', 'cm'],
    ['2.5 h', 's', '2.5 h', 's'],
    ['3.2 kJ', 'J', '3.2 kJ', 'J'],
    ['1.25 g/mL', 'kg/m^3', '1.25 g/ml', 'kg/m^3'],
    ['98.6 degF', 'degC', '98.6 tempF', 'tempC'],
    ['750 kPa', 'atm', '750 kPa', 'atm'],
  ])('converts %s to %s as js-quantities does', (ours, to, qtyFrom, qtyTo) => {
    const [value, from] = ours.split(' ');
    const expected = Qty(qtyFrom).to(qtyTo).scalar;
    const actual = Number(convertDecimal(toDecimal(value), from, to).toString());
    expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-12 * Math.abs(expected));
  });
});
