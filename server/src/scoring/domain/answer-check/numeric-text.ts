/**
 * Reading a typed numeric answer: a decimal number, an optional power of ten, an optional unit.
 *
 * Accepted number forms: `12`, `-0.50`, `.5`, `400.`, `6.02e23`, `6.02E-23`,
 * `6.02 × 10^23`, `6.02x10^23`, `6.02*10^23`, `6.02·10^23`, `6.02 × 10²³` (superscript exponent).
 * A decimal comma is NOT accepted ("0,50" is unparseable): "1,500" could be a thousands
 * separator or a decimal comma, and guessing would misgrade one reading or the other.
 * Thousands separators and spaces inside the number are not accepted either.
 */

const SUPERSCRIPTS: Record<string, string> = {
  '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4',
  '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9',
  '⁺': '+', '⁻': '-',
};
const SUPERSCRIPT_RUN = /[⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻]+/g;
const MINUS_SIGNS = /[\u2212\u2010\u2011\u2012\u2013\uFE63\uFF0D]/g;

/** Longest answer we try to read; anything longer is not a number a student typed. */
const MAX_ANSWER_LENGTH = 200;

const NUMBER_HEAD = /^([+-]?)(\d+(?:\.\d*)?|\.\d+)/;
const E_EXPONENT = /^[eE]([+-]?\d+)/;
const TIMES_TEN_EXPONENT = /^\s*[×xX*·⋅]\s*10\s*\^\s*([+-]?\d+)/;
const DECIMAL_STRING = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

export interface ParsedNumber {
  /** Digits and point exactly as typed, without sign or exponent ("0.50", "400."). */
  mantissa: string;
  /** A canonical decimal string for exact arithmetic ("-6.02e23"). */
  decimal: string;
}

export interface ParsedQuantity {
  number: ParsedNumber;
  /** The unit text after the number, cleaned for mathjs, or null for a bare number. */
  unitText: string | null;
}

/**
 * Superscripts become `^n` before NFKC, which would otherwise turn `10²³` into `1023`
 * and `cm⁻³` into `cm−3`; then NFKC folds full-width digits, `℃`, `µ` and the like.
 */
export function prepareAnswerText(text: string): string {
  return text
    .replace(SUPERSCRIPT_RUN, (run) => '^' + [...run].map((c) => SUPERSCRIPTS[c]).join(''))
    .normalize('NFKC')
    .replace(MINUS_SIGNS, '-')
    .replace(/\s+/g, ' ')
    .trim();
}

/** Unit spellings students type that mathjs does not read. */
export function cleanUnitText(unit: string): string {
  return unit
    .replace(/°\s*C/g, 'degC')
    .replace(/°\s*F/g, 'degF')
    .replace(/°/g, 'deg')
    .replace(/[μµ]/g, 'u')
    .replace(/Ω/g, 'ohm')
    .replace(/[·⋅]/g, ' ')
    .trim();
}

/** Reads a number (and any power of ten) at the start of prepared text; returns it and the rest. */
function readNumber(prepared: string): { number: ParsedNumber; rest: string } | null {
  const head = NUMBER_HEAD.exec(prepared);
  if (!head) return null;
  const [headText, sign, mantissa] = head;
  let rest = prepared.slice(headText.length);
  let exponent = '0';
  const power = E_EXPONENT.exec(rest) ?? TIMES_TEN_EXPONENT.exec(rest);
  if (power) {
    exponent = power[1];
    rest = rest.slice(power[0].length);
  }
  const decimal = `${sign === '-' ? '-' : ''}${mantissa}e${exponent}`;
  return { number: { mantissa, decimal }, rest: rest.trim() };
}

/** Splits a typed answer into number and unit; null when no number leads the text. */
export function parseQuantityText(text: string): ParsedQuantity | null {
  if (text.length > MAX_ANSWER_LENGTH) return null;
  const read = readNumber(prepareAnswerText(text));
  if (!read) return null;
  const unitText = read.rest === '' ? null : cleanUnitText(read.rest);
  return { number: read.number, unitText: unitText === '' ? null : unitText };
}

/** Reads text that must be a number alone (no unit); null otherwise. */
export function parseNumberText(text: string): ParsedNumber | null {
  const parsed = parseQuantityText(text);
  return parsed && parsed.unitText === null ? parsed.number : null;
}

/** A key value: a plain decimal string, optionally with an `e` exponent ("0.50", "6.022e23"). */
export function isDecimalString(value: string): boolean {
  return DECIMAL_STRING.test(value.trim());
}
