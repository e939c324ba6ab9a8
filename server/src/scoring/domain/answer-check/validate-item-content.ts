import { ITEM_TYPES, type ItemContent, type ItemKey, type ItemOption, type ItemType, optionLetter } from '@covalent/shared-types';
import { isValidTolerance, keyUnitOf } from './check-numeric';
import { normaliseAnswerText } from './normalise-text';
import { isDecimalString } from './numeric-text';
import { parseUnit } from './units';

/** One problem with one field of an item, for a form to show beside that field. */
export interface FieldError {
  /** Path into ItemContent: 'prompt', 'options', 'options[2].text', 'key.tolerance.value'. */
  field: string;
  /** A sentence a teacher can read. */
  message: string;
}

export const PROMPT_MAX_LENGTH = 2000;
export const TAG_MAX_LENGTH = 40;
export const CHOICE_OPTIONS = { min: 2, max: 6 } as const;
export const ORDER_STEPS = { min: 3, max: 8 } as const;
export const SIG_FIGS = { min: 1, max: 15 } as const;

const TYPE_NAMES: Record<ItemType, string> = {
  single: 'single-answer',
  multi: 'multiple-answer',
  truefalse: 'true/false',
  order: 'ordering',
  numeric: 'numeric',
  text: 'short-text',
};

const fieldError = (field: string, message: string): FieldError => ({ field, message });

function validatePrompt(prompt: unknown): FieldError[] {
  if (typeof prompt !== 'string' || prompt.trim() === '') return [fieldError('prompt', 'Write the question prompt.')];
  if (prompt.length > PROMPT_MAX_LENGTH) {
    return [
      fieldError('prompt', `The prompt is ${prompt.length} characters long; keep it to ${PROMPT_MAX_LENGTH} or fewer.`),
    ];
  }
  return [];
}

function validateTags(tags: unknown): FieldError[] {
  if (!Array.isArray(tags)) return [fieldError('tags', 'Tags must be a list of words.')];
  return tags.flatMap((tag: unknown, i) => {
    if (typeof tag !== 'string' || tag.trim() === '') {
      return [fieldError(`tags[${i}]`, `Tag ${i + 1} is empty: write it or remove it.`)];
    }
    if (tag.length > TAG_MAX_LENGTH) {
      return [fieldError(`tags[${i}]`, `The tag "${tag.slice(0, 20)}…" is longer than ${TAG_MAX_LENGTH} characters.`)];
    }
    return [];
  });
}

/** "Option B" for choices, "Step 2" for order items. */
const optionLabel = (type: ItemType, index: number): string =>
  type === 'order' ? `Step ${index + 1}` : `Option ${optionLetter(index)}`;

function validateOptionList(type: ItemType, options: ItemOption[]): FieldError[] {
  const errors: FieldError[] = [];
  const textSeen = new Map<string, number>();
  const idSeen = new Map<string, number>();
  options.forEach((option, i) => {
    const label = optionLabel(type, i);
    const text = typeof option?.text === 'string' ? normaliseAnswerText(option.text) : '';
    if (text === '') {
      errors.push(fieldError(`options[${i}].text`, `${label} is empty: write its text.`));
    } else if (textSeen.has(text)) {
      const first = optionLabel(type, textSeen.get(text) ?? 0).toLowerCase();
      errors.push(fieldError(`options[${i}].text`, `${label} says the same as ${first}; each must be different.`));
    } else {
      textSeen.set(text, i);
    }
    const id = typeof option?.id === 'string' ? option.id : '';
    if (id === '' || idSeen.has(id)) {
      errors.push(fieldError(`options[${i}].id`, `${label} needs its own id; remove it and add it again.`));
    } else {
      idSeen.set(id, i);
    }
  });
  return errors;
}

function validateOptions(type: ItemType, options: ItemOption[]): FieldError[] {
  const name = TYPE_NAMES[type];
  if (type === 'single' || type === 'multi' || type === 'order') {
    const range = type === 'order' ? ORDER_STEPS : CHOICE_OPTIONS;
    const noun = type === 'order' ? 'steps' : 'options';
    const count: FieldError[] =
      options.length < range.min || options.length > range.max
        ? [fieldError('options', `A ${name} question needs ${range.min} to ${range.max} ${noun}; it has ${options.length}.`)]
        : [];
    return [...count, ...validateOptionList(type, options)];
  }
  return options.length > 0
    ? [fieldError('options', `A ${name} question has no options; remove them.`)]
    : [];
}

function validateKey(key: ItemKey, options: ItemOption[]): FieldError[] {
  const ids = new Set(options.map((o) => o.id));
  switch (key.type) {
    case 'single':
      if (!ids.has(key.correctOptionId)) {
        return [fieldError('key.correctOptionId', 'Mark exactly one of the options as the correct answer.')];
      }
      return [];
    case 'multi': {
      const correct = Array.isArray(key.correctOptionIds) ? key.correctOptionIds : [];
      if (correct.length === 0) return [fieldError('key.correctOptionIds', 'Mark at least one option as correct.')];
      const seen = new Set<string>();
      return correct.flatMap((id, i) => {
        const field = `key.correctOptionIds[${i}]`;
        if (!ids.has(id)) return [fieldError(field, 'A correct answer points to an option that no longer exists; mark the correct options again.')];
        if (seen.has(id)) return [fieldError(field, 'The same option is marked correct twice.')];
        seen.add(id);
        return [];
      });
    }
    case 'truefalse':
      return typeof key.value === 'boolean' ? [] : [fieldError('key.value', 'Choose whether the statement is true or false.')];
    case 'order': {
      const sequence = Array.isArray(key.sequence) ? key.sequence : [];
      const isPermutation = sequence.length === ids.size && new Set(sequence).size === sequence.length && sequence.every((id) => ids.has(id));
      return isPermutation ? [] : [fieldError('key.sequence', 'The correct order must list every step exactly once.')];
    }
    case 'numeric':
      return validateNumericKey(key);
    case 'text': {
      const accepted = Array.isArray(key.accepted) ? key.accepted : [];
      const any = accepted.some((a) => typeof a === 'string' && normaliseAnswerText(a) !== '');
      return any ? [] : [fieldError('key.accepted', 'Give at least one accepted answer.')];
    }
  }
}

function validateNumericKey(key: Extract<ItemKey, { type: 'numeric' }>): FieldError[] {
  const errors: FieldError[] = [];
  if (typeof key.value !== 'string' || !isDecimalString(key.value)) {
    errors.push(fieldError('key.value', 'Write the correct value as a number with a decimal point, such as 0.50 or 6.022e23.'));
  }
  const unit = typeof key.unit === 'string' ? keyUnitOf(key) : null;
  if (unit !== null && parseUnit(unit) === null) {
    errors.push(fieldError('key.unit', `The unit "${unit}" is not recognised; use a symbol such as mol, mL, g/mol or kPa.`));
  }
  const tolerance = key.tolerance;
  if (tolerance?.kind !== 'absolute' && tolerance?.kind !== 'relative') {
    errors.push(fieldError('key.tolerance.kind', 'Choose whether the tolerance is absolute or relative.'));
  } else if (!isValidTolerance(tolerance)) {
    errors.push(
      fieldError(
        'key.tolerance.value',
        tolerance.kind === 'absolute'
          ? 'The tolerance must be zero or a positive number.'
          : 'A relative tolerance must be greater than zero, for example 0.01 for 1%.',
      ),
    );
  }
  const { sigFigs } = key;
  if (sigFigs !== null && !(Number.isInteger(sigFigs) && sigFigs >= SIG_FIGS.min && sigFigs <= SIG_FIGS.max)) {
    errors.push(fieldError('key.sigFigs', `Significant figures must be a whole number from ${SIG_FIGS.min} to ${SIG_FIGS.max}, or left empty.`));
  }
  return errors;
}

/**
 * Field-level problems with an item as a teacher wrote it; an empty list means it can be saved.
 * Key rules are checked only when the key is for the item's own type.
 */
export function validateItemContent(content: ItemContent): FieldError[] {
  if (!(ITEM_TYPES as readonly string[]).includes(content.type)) {
    return [fieldError('type', 'Choose a question type.')];
  }
  const options = Array.isArray(content.options) ? content.options : [];
  const errors = [...validatePrompt(content.prompt), ...validateOptions(content.type, options)];
  if (content.key?.type !== content.type) {
    errors.push(fieldError('key.type', `The answer key does not match this ${TYPE_NAMES[content.type]} question; set the answer again.`));
  } else {
    errors.push(...validateKey(content.key, options));
  }
  return [...errors, ...validateTags(content.tags)];
}
