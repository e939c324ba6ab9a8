export { checkAnswer, type CheckableItem, type CheckOptions } from './check-answer';
export type { CheckDetail, CheckResult } from './check-result';
export { multiCredit } from './check-choice';
export { countDiscordantPairs, isPermutationOf, orderCredit } from './check-order';
export { withinTolerance, type NumericCheckOptions } from './check-numeric';
export { parseQuantityText, type ParsedNumber, type ParsedQuantity } from './numeric-text';
export { countSignificantFigures, type SigFigRange } from './significant-figures';
export { normaliseAnswerText } from './normalise-text';
export { editDistance, isOneTypoAway, TYPO_MIN_LETTERS } from './check-text';
export {
  validateItemContent,
  type FieldError,
  PROMPT_MAX_LENGTH,
  TAG_MAX_LENGTH,
  CHOICE_OPTIONS,
  ORDER_STEPS,
  SIG_FIGS,
} from './validate-item-content';
