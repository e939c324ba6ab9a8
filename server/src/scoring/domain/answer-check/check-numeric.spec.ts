import { checkAnswer, type CheckOptions } from './check-answer';
import { numericItem, type NumericKey } from './answer-check.factories';

const answer = (key: Partial<NumericKey>, text: string, options?: CheckOptions) =>
  checkAnswer(numericItem(key), { type: 'numeric', text }, options);

describe('checkAnswer (numeric)', () => {
  describe('absolute tolerance (22.4 L ± 0.1 L)', () => {
    const key = { value: '22.4', unit: 'L', tolerance: { kind: 'absolute' as const, value: 0.1 } };

    // DESIGN.md §5 "inside tolerance"; boundaries are inclusive (our choice) and exact in decimal:
    // in floats 22.5 − 22.4 = 0.10000000000000142 > 0.1 (REFERENCES.md §3 pitfalls, [C]).
    it.each(['22.4 L', '22.5 L', '22.3 L', '22400 mL', '22.50 L', '0.0225 m^3'])('accepts %s', (text) => {
      expect(answer(key, text)).toEqual({ credit: 1, correct: true, detail: 'exact' });
    });

    it.each(['22.51 L', '22.29 L', '22510 mL', '2.24 L'])('rejects %s', (text) => {
      expect(answer(key, text)).toEqual({ credit: 0, correct: false, detail: 'wrong' });
    });
  });

  describe('relative tolerance (0.50 mol ± 1%)', () => {
    const key = { value: '0.50', unit: 'mol', tolerance: { kind: 'relative' as const, value: 0.01 } };

    it.each(['0.50 mol', '0.505 mol', '0.495 mol', '500 mmol', '505 mmol', '495 mmol'])('accepts %s', (text) => {
      expect(answer(key, text).credit).toBe(1);
    });

    it.each(['0.5051 mol', '0.4949 mol', '505.1 mmol', '494.9 mmol'])('rejects %s', (text) => {
      expect(answer(key, text).detail).toBe('wrong');
    });

    it('accepts only the exact value when a relative key is zero', () => {
      expect(answer({ ...key, value: '0' }, '0 mol').credit).toBe(1);
      expect(answer({ ...key, value: '0' }, '0.0001 mol').credit).toBe(0);
    });
  });

  describe('units', () => {
    it('gives 0 wrong_unit for a unit of another dimension', () => {
      expect(answer({}, '22.4 kg')).toEqual({ credit: 0, correct: false, detail: 'wrong_unit' });
      expect(answer({}, '22.4 mol').detail).toBe('wrong_unit');
      expect(answer({ unit: 'mol' }, '0.5 mol/L').detail).toBe('wrong_unit');
    });

    // DESIGN.md §5: "a bare number is accepted when the key has no unit".
    it('accepts a bare number when the key has no unit', () => {
      expect(answer({ value: '7.0', unit: null }, '7.0').credit).toBe(1);
      expect(answer({ value: '7.0', unit: '  ' }, '7').credit).toBe(1);
    });

    it('gives wrong_unit for a unit typed when the key has none', () => {
      expect(answer({ value: '7.0', unit: null }, '7.0 mol').detail).toBe('wrong_unit');
    });

    // DESIGN.md §5 "right unit after conversion": a bare number has no unit to convert.
    it('gives 0 missing_unit for a bare number when the key has a unit, unless told to read it in the key unit', () => {
      expect(answer({}, '22.4')).toEqual({ credit: 0, correct: false, detail: 'missing_unit' });
      expect(answer({}, '22.4', { bareNumberInKeyUnit: true }).credit).toBe(1);
      expect(answer({}, '22.6', { bareNumberInKeyUnit: true }).credit).toBe(0);
    });

    it('reads the unit spellings students type', () => {
      expect(answer({ value: '298.15', unit: 'K', tolerance: { kind: 'absolute', value: 0.01 } }, '25 °C').credit).toBe(1);
      expect(answer({ value: '298.15', unit: 'K', tolerance: { kind: 'absolute', value: 0.01 } }, '25 ℃').credit).toBe(1);
      expect(answer({ value: '5', unit: 'umol' }, '5 µmol').credit).toBe(1); // micro sign U+00B5
      expect(answer({ value: '5', unit: 'umol' }, '5 μmol').credit).toBe(1); // Greek mu U+03BC
      expect(answer({ value: '1', unit: 'cm^3' }, '1 cm³').credit).toBe(1);
      expect(answer({ value: '8.314', unit: 'J mol^-1 K^-1' }, '8.314 J·mol⁻¹·K⁻¹').credit).toBe(1);
      expect(answer({ value: '8.314', unit: 'J mol^-1 K^-1' }, '8.314 J/(mol K)').credit).toBe(1);
      expect(answer({ value: '-5.0', unit: 'degC' }, '−5.0 °C').credit).toBe(1); // U+2212 minus sign
    });

    // Our addition: molarity M = mol/L with short prefixes.
    it('reads molarity', () => {
      const key = { value: '0.50', unit: 'mol/L', tolerance: { kind: 'absolute' as const, value: 0 } };
      expect(answer(key, '0.50 M').credit).toBe(1);
      expect(answer(key, '500 mM').credit).toBe(1);
      expect(answer(key, '0.50 mmol/mL').credit).toBe(1);
    });
  });

  describe('significant figures (key 0.50 mol, 2 s.f.)', () => {
    const key = { value: '0.50', unit: 'mol', sigFigs: 2, tolerance: { kind: 'relative' as const, value: 0.05 } };

    it('gives 1 for the right value with 2 significant figures', () => {
      expect(answer(key, '0.50 mol')).toEqual({ credit: 1, correct: true, detail: 'exact' });
      expect(answer(key, '5.0e-1 mol').credit).toBe(1);
    });

    // DESIGN.md §5: 0.5 when right but with the wrong number of significant figures.
    it.each(['0.5 mol', '0.500 mol', '0.5000 mol', '500. mmol', '0.510 mol'])(
      'gives 0.5 sig_figs for %s',
      (text) => {
        expect(answer(key, text)).toEqual({ credit: 0.5, correct: false, detail: 'sig_figs' });
      },
    );

    it('accepts an ambiguous integer whose range includes the required count', () => {
      expect(answer(key, '500 mmol').credit).toBe(1); // "500": 1 to 3 s.f.
      expect(answer({ ...key, sigFigs: 4 }, '500 mmol').detail).toBe('sig_figs');
    });

    it('gives 0 to a wrong value whatever its significant figures', () => {
      expect(answer(key, '0.6 mol').detail).toBe('wrong');
    });
  });

  describe('number forms', () => {
    const key = { value: '6.022e23', unit: null, tolerance: { kind: 'relative' as const, value: 0.001 } };

    it.each(['6.022e23', '6.02E23', '6.02 × 10^23', '6.02x10^23', '6.02X10^23', '6.02 * 10^23', '6.02 × 10²³', '602200000000000000000000'])(
      'accepts %s',
      (text) => {
        expect(answer(key, text).credit).toBe(1);
      },
    );

    it('refuses a decimal comma', () => {
      expect(answer({ value: '0.50', unit: 'mol' }, '0,50 mol').detail).toBe('unparseable');
      expect(answer(key, '6,022e23').detail).toBe('unparseable');
    });

    it.each(['abc', 'mol', '5 furlongz', '1 000 mL', '5..0 L', '6.02 × 1023'])('gives unparseable for %j', (text) => {
      expect(answer({}, text).detail).toBe('unparseable');
    });

    it('gives no_answer for empty text', () => {
      expect(answer({}, '')).toEqual({ credit: 0, correct: false, detail: 'no_answer' });
      expect(answer({}, '   ').detail).toBe('no_answer');
    });
  });

  it('gives invalid_key for a key that cannot be read', () => {
    expect(answer({ value: 'twelve' }, '12 L').detail).toBe('invalid_key');
    expect(answer({ unit: 'furlongz' }, '12 L').detail).toBe('invalid_key');
    expect(answer({ tolerance: { kind: 'relative', value: 0 } }, '22.4 L').detail).toBe('invalid_key');
  });
});
