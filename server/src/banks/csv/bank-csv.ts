import { ITEM_TYPES, type ItemContent, type ItemKey, type ItemType, optionLetter } from '@covalent/shared-types';
import { type FieldError, validateItemContent } from '../../scoring/domain/answer-check';
import { cellField, type CsvProblem, type CsvRow } from '../../media/csv-table';

/** Option columns: choice items use up to six (A–F), order items up to eight steps (A–H). */
export const OPTION_COLUMNS = ['option_a', 'option_b', 'option_c', 'option_d', 'option_e', 'option_f', 'option_g', 'option_h'] as const;

/** The bank CSV layout, documented in docs/bank-csv.md. */
export const BANK_CSV_COLUMNS = [
  'type',
  'prompt',
  ...OPTION_COLUMNS,
  'correct',
  'order',
  'numeric_value',
  'numeric_unit',
  'tolerance',
  'tolerance_kind',
  'sig_figs',
  'accepted_answers',
  'typo_tolerance',
  'explanation',
  'tags',
] as const;
export type BankCsvColumn = (typeof BANK_CSV_COLUMNS)[number];
type Cells = Record<BankCsvColumn, string>;

/** Lists inside one cell (answers, tags, letters) are separated by semicolons. */
const LIST_SEPARATOR = ';';
const LETTER_LIST = /[;,\s]+/;

/** Columns each type may fill beyond type, prompt, explanation and tags. */
const TYPE_COLUMNS: Record<ItemType, readonly BankCsvColumn[]> = {
  single: [...OPTION_COLUMNS, 'correct'],
  multi: [...OPTION_COLUMNS, 'correct'],
  truefalse: ['correct'],
  order: [...OPTION_COLUMNS, 'order'],
  numeric: ['numeric_value', 'numeric_unit', 'tolerance', 'tolerance_kind', 'sig_figs'],
  text: ['accepted_answers', 'typo_tolerance'],
};
const ALWAYS: readonly BankCsvColumn[] = ['type', 'prompt', 'explanation', 'tags'];

const splitList = (cell: string): string[] =>
  cell
    .split(LIST_SEPARATOR)
    .map((s) => s.trim())
    .filter((s) => s !== '');

const optionColumn = (index: number): BankCsvColumn => OPTION_COLUMNS[index] ?? 'option_a';

/** Where a validateItemContent field lives in the CSV. */
export function columnOfField(field: string, type: ItemType): BankCsvColumn {
  const option = /^options\[(\d+)\]/.exec(field);
  if (option) return optionColumn(Number(option[1]));
  if (field === 'options') return 'option_a';
  if (field.startsWith('tags')) return 'tags';
  if (field.startsWith('key.correctOption') || (field === 'key.value' && type === 'truefalse')) return 'correct';
  if (field === 'key.sequence') return 'order';
  if (field === 'key.value') return 'numeric_value';
  if (field === 'key.unit') return 'numeric_unit';
  if (field === 'key.tolerance.value') return 'tolerance';
  if (field === 'key.tolerance.kind') return 'tolerance_kind';
  if (field === 'key.sigFigs') return 'sig_figs';
  if (field === 'key.accepted') return 'accepted_answers';
  if (field === 'type' || field === 'key.type') return 'type';
  return 'prompt';
}

interface RowReader {
  problems: CsvProblem[];
  flag(column: BankCsvColumn, message: string): void;
}

function rowReader(rowNumber: number): RowReader {
  const problems: CsvProblem[] = [];
  return { problems, flag: (column, message) => problems.push({ field: cellField(rowNumber, column), message }) };
}

/** Letters "A;C" → option ids; each must name a filled option. */
function lettersToIds(cell: string, ids: string[], column: BankCsvColumn, r: RowReader): string[] {
  const letters = cell.split(LETTER_LIST).filter((s) => s !== '').map((s) => s.toUpperCase());
  return letters.flatMap((letter) => {
    const index = letter.length === 1 ? letter.charCodeAt(0) - 65 : -1;
    if (index < 0 || index >= ids.length) {
      r.flag(column, `"${letter}" is not one of the filled options (${ids.map((_, i) => optionLetter(i)).join(', ') || 'none'}).`);
      return [];
    }
    return [ids[index]];
  });
}

function readOptions(cells: Cells, r: RowReader, newId: () => string): ItemContent['options'] {
  const texts = OPTION_COLUMNS.map((c) => cells[c]);
  const last = texts.reduce((acc, text, i) => (text !== '' ? i : acc), -1);
  texts.slice(0, last + 1).forEach((text, i) => {
    if (text === '') r.flag(optionColumn(i), 'This option is empty but a later one is filled; fill the options from A without gaps.');
  });
  return texts.slice(0, last + 1).map((text) => ({ id: newId(), text }));
}

function readBoolean(cell: string, column: BankCsvColumn, r: RowReader, blank: boolean | null): boolean | null {
  const v = cell.toLowerCase();
  if (v === '') {
    if (blank === null) r.flag(column, 'Write true or false.');
    return blank;
  }
  if (v === 'true' || v === 'yes') return true;
  if (v === 'false' || v === 'no') return false;
  r.flag(column, `"${cell}" is not true or false.`);
  return blank;
}

function readKey(type: ItemType, cells: Cells, ids: string[], r: RowReader): ItemKey {
  switch (type) {
    case 'single': {
      const [id, ...rest] = lettersToIds(cells.correct, ids, 'correct', r);
      if (cells.correct === '') r.flag('correct', 'Write the letter of the correct option, such as B.');
      else if (rest.length) r.flag('correct', 'A single-answer question has exactly one correct letter; use type multi for more.');
      return { type, correctOptionId: id ?? '' };
    }
    case 'multi':
      if (cells.correct === '') r.flag('correct', 'Write the letters of the correct options, such as A;C.');
      return { type, correctOptionIds: lettersToIds(cells.correct, ids, 'correct', r) };
    case 'truefalse':
      return { type, value: readBoolean(cells.correct, 'correct', r, null) ?? false };
    case 'order':
      // Blank: the steps are listed in the correct order.
      return { type, sequence: cells.order === '' ? [...ids] : lettersToIds(cells.order, ids, 'order', r) };
    case 'numeric': {
      const tolerance = cells.tolerance === '' ? 0 : Number(cells.tolerance);
      if (cells.tolerance !== '' && !Number.isFinite(tolerance)) r.flag('tolerance', `"${cells.tolerance}" is not a number.`);
      const kind = cells.tolerance_kind === '' ? 'absolute' : cells.tolerance_kind.toLowerCase();
      if (kind !== 'absolute' && kind !== 'relative') r.flag('tolerance_kind', 'Write absolute or relative (or leave it empty for absolute).');
      const sigFigs = cells.sig_figs === '' ? null : Number(cells.sig_figs);
      if (sigFigs !== null && !Number.isInteger(sigFigs)) r.flag('sig_figs', `"${cells.sig_figs}" is not a whole number.`);
      return {
        type,
        value: cells.numeric_value,
        unit: cells.numeric_unit === '' ? null : cells.numeric_unit,
        tolerance: { kind: kind === 'relative' ? 'relative' : 'absolute', value: Number.isFinite(tolerance) ? tolerance : 0 },
        sigFigs: sigFigs !== null && Number.isInteger(sigFigs) ? sigFigs : null,
      };
    }
    case 'text':
      return {
        type,
        accepted: splitList(cells.accepted_answers),
        typoTolerance: readBoolean(cells.typo_tolerance, 'typo_tolerance', r, false) ?? false,
      };
  }
}

/** One CSV row → an item, or the problems that keep it from being one. */
export function rowToItem(row: CsvRow<BankCsvColumn>, newId: () => string): { item: ItemContent | null; problems: CsvProblem[] } {
  const { cells, rowNumber } = row;
  const r = rowReader(rowNumber);
  const type = cells.type.toLowerCase() as ItemType;
  if (!(ITEM_TYPES as readonly string[]).includes(type)) {
    r.flag('type', `"${cells.type}" is not a question type; use one of ${ITEM_TYPES.join(', ')}.`);
    return { item: null, problems: r.problems };
  }
  for (const column of BANK_CSV_COLUMNS) {
    if (cells[column] !== '' && !ALWAYS.includes(column) && !TYPE_COLUMNS[type].includes(column)) {
      r.flag(column, `A ${type} question does not use this column; leave it empty.`);
    }
  }
  const options = TYPE_COLUMNS[type].includes('option_a') ? readOptions(cells, r, newId) : [];
  const item: ItemContent = {
    type,
    prompt: cells.prompt,
    options,
    key: readKey(type, cells, options.map((o) => o.id), r),
    explanation: cells.explanation,
    tags: splitList(cells.tags),
    imageId: null,
  };
  // Cell-reading problems first; the item rules only for fields not already reported.
  const flagged = new Set(r.problems.map((p) => p.field));
  const ruleProblems = validateItemContent(item)
    .map((e: FieldError) => ({ field: cellField(rowNumber, columnOfField(e.field, type)), message: e.message }))
    .filter((p) => !flagged.has(p.field));
  const problems = [...r.problems, ...ruleProblems];
  return { item: problems.length ? null : item, problems };
}

const lettersOf = (ids: string[], options: ItemContent['options']): string =>
  ids.map((id) => optionLetter(options.findIndex((o) => o.id === id))).join(LIST_SEPARATOR);

/** An item → its CSV row; the inverse of rowToItem up to option ids (and images, which CSV does not carry). */
export function itemToRow(item: ItemContent): Cells {
  const cells = Object.fromEntries(BANK_CSV_COLUMNS.map((c) => [c, ''])) as Cells;
  cells.type = item.type;
  cells.prompt = item.prompt;
  item.options.forEach((o, i) => (cells[optionColumn(i)] = o.text));
  cells.explanation = item.explanation;
  cells.tags = item.tags.join(LIST_SEPARATOR);
  const key = item.key;
  switch (key.type) {
    case 'single':
      cells.correct = lettersOf([key.correctOptionId], item.options);
      break;
    case 'multi':
      cells.correct = lettersOf(key.correctOptionIds, item.options);
      break;
    case 'truefalse':
      cells.correct = String(key.value);
      break;
    case 'order':
      cells.order = lettersOf(key.sequence, item.options);
      break;
    case 'numeric':
      cells.numeric_value = key.value;
      cells.numeric_unit = key.unit ?? '';
      cells.tolerance = String(key.tolerance.value);
      cells.tolerance_kind = key.tolerance.kind;
      cells.sig_figs = key.sigFigs === null ? '' : String(key.sigFigs);
      break;
    case 'text':
      cells.accepted_answers = key.accepted.join(LIST_SEPARATOR);
      cells.typo_tolerance = String(key.typoTolerance);
      break;
  }
  return cells;
}
