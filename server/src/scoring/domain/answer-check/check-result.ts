/**
 * Machine codes for why an answer got its credit:
 * - `exact`: full credit (for numeric: inside tolerance, right unit, right significant figures);
 * - `partial`: some credit from the multi or order rule;
 * - `wrong`: no credit, the answer was understood but is wrong;
 * - `sig_figs`: numeric value right, significant figures wrong (0.5);
 * - `wrong_unit`: the unit cannot be converted to the key's unit, or a unit was given for a bare-number key;
 * - `missing_unit`: a bare number where the key has a unit;
 * - `typo`: a text answer one edit away from an accepted answer (typo tolerance on);
 * - `unparseable`: the response cannot be read (bad number or unit, not a permutation of the steps);
 * - `no_answer`: no response, or an empty one;
 * - `type_mismatch`: the response is for another item type;
 * - `invalid_key`: the item's own key is broken (validateItemContent should have caught it).
 */
export type CheckDetail =
  | 'exact'
  | 'partial'
  | 'wrong'
  | 'sig_figs'
  | 'wrong_unit'
  | 'missing_unit'
  | 'typo'
  | 'unparseable'
  | 'no_answer'
  | 'type_mismatch'
  | 'invalid_key';

export interface CheckResult {
  /** 0..1 */
  credit: number;
  /** credit === 1 */
  correct: boolean;
  detail: CheckDetail;
}

export function creditResult(credit: number, detail: CheckDetail): CheckResult {
  return { credit, correct: credit === 1, detail };
}

export const NO_CREDIT = (detail: CheckDetail): CheckResult => creditResult(0, detail);

/** exact / partial / wrong from a fraction of credit. */
export function graded(credit: number): CheckResult {
  if (credit >= 1) return creditResult(1, 'exact');
  if (credit <= 0) return creditResult(0, 'wrong');
  return creditResult(credit, 'partial');
}
