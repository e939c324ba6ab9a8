import type { ItemKey, NumericTolerance } from '@covalent/shared-types';
import { type CheckResult, NO_CREDIT, creditResult } from './check-result';
import { isDecimalString, parseQuantityText } from './numeric-text';
import { countMantissaSignificantFigures, sigFigRangeIncludes } from './significant-figures';
import { type Decimal, convertDecimal, parseUnit, sameDimension, toDecimal } from './units';

type NumericKey = Extract<ItemKey, { type: 'numeric' }>;

export interface NumericCheckOptions {
  /**
   * When the key has a unit and the student types a bare number, read it in the key's unit
   * (for a player screen that shows the unit beside the input). Default false: DESIGN §5 asks
   * for "the right unit after conversion", so a bare number gets 0 with `missing_unit`.
   */
  bareNumberInKeyUnit?: boolean;
}

/** Differences below one part in 10¹² are conversion noise (e.g. °F factors), not a wrong answer. */
const NOISE = toDecimal('1e-12');

/** A blank key unit means a bare number, like null. */
export function keyUnitOf(key: NumericKey): string | null {
  return key.unit === null || key.unit.trim() === '' ? null : key.unit.trim();
}

export function isValidTolerance(tolerance: NumericTolerance): boolean {
  const { kind, value } = tolerance;
  if (!Number.isFinite(value)) return false;
  if (kind === 'absolute') return value >= 0;
  if (kind === 'relative') return value > 0;
  return false;
}

/** |answer − key| ≤ tolerance (boundary inclusive); relative tolerance is a fraction of |key|. */
export function withinTolerance(answer: Decimal, key: Decimal, tolerance: NumericTolerance): boolean {
  const allowed =
    tolerance.kind === 'absolute' ? toDecimal(tolerance.value) : toDecimal(tolerance.value).times(key.abs());
  const scale = answer.abs().gt(key.abs()) ? answer.abs() : key.abs();
  return answer.minus(key).abs().lte(allowed.plus(scale.times(NOISE)));
}

type Conversion = { ok: true; value: Decimal } | { ok: false; result: CheckResult };

function toKeyUnit(
  value: Decimal,
  unitText: string | null,
  keyUnit: string | null,
  options: NumericCheckOptions,
): Conversion {
  if (unitText === null) {
    if (keyUnit === null || options.bareNumberInKeyUnit) return { ok: true, value };
    return { ok: false, result: NO_CREDIT('missing_unit') };
  }
  const unit = parseUnit(unitText);
  if (unit === null) return { ok: false, result: NO_CREDIT('unparseable') };
  const target = keyUnit === null ? null : parseUnit(keyUnit);
  if (keyUnit === null || target === null || !sameDimension(unit, target)) {
    return { ok: false, result: NO_CREDIT('wrong_unit') };
  }
  return { ok: true, value: convertDecimal(value, unitText, keyUnit) };
}

function isValidKey(key: NumericKey): boolean {
  const keyUnit = keyUnitOf(key);
  return isDecimalString(key.value) && isValidTolerance(key.tolerance) && (keyUnit === null || parseUnit(keyUnit) !== null);
}

export function checkNumeric(key: NumericKey, text: string, options: NumericCheckOptions = {}): CheckResult {
  if (!isValidKey(key)) return NO_CREDIT('invalid_key');
  if (text.trim() === '') return NO_CREDIT('no_answer');
  const parsed = parseQuantityText(text);
  if (parsed === null) return NO_CREDIT('unparseable');

  const converted = toKeyUnit(toDecimal(parsed.number.decimal), parsed.unitText, keyUnitOf(key), options);
  if (!converted.ok) return converted.result;
  if (!withinTolerance(converted.value, toDecimal(key.value.trim()), key.tolerance)) return NO_CREDIT('wrong');

  const typed = countMantissaSignificantFigures(parsed.number.mantissa);
  if (key.sigFigs !== null && !sigFigRangeIncludes(typed, key.sigFigs)) return creditResult(0.5, 'sig_figs');
  return creditResult(1, 'exact');
}
