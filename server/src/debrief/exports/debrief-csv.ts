import { optionLetter, type DebriefDto, type FigureDto } from '@covalent/shared-types';
import { writeCsvTable } from '../../media/csv-table';

/** The columns of the gradebook CSV (docs/exports.md). */
export const GRADEBOOK_COLUMNS = ['student', 'nickname', 'score', 'max_score', 'percent', 'items_answered'] as const;

/** Most options an item has (DESIGN.md §5: 2–6): one share column per letter. */
const MAX_OPTIONS = 6;
const OPTION_COLUMNS = Array.from({ length: MAX_OPTIONS }, (_, i) => `option_${optionLetter(i)}`);

/** The columns of the item-analysis CSV (docs/exports.md). */
export const ITEM_ANALYSIS_COLUMNS = [
  'position',
  'item',
  'type',
  'tags',
  'answered',
  'p',
  'D',
  'r_pb',
  'flags',
  'key',
  ...OPTION_COLUMNS,
  'no_answer',
] as const;

/** A number with fixed decimals; an empty cell for a figure that could not be computed. */
function cell(value: number | null, decimals: number): string {
  return value === null ? '' : value.toFixed(decimals);
}
const figureCell = (f: FigureDto, decimals = 3): string => cell(f.value, decimals);

/**
 * Free text (nicknames, prompts) that a spreadsheet would run as a formula gets a leading
 * apostrophe (OWASP "CSV Injection"). Only text cells: a negative D stays a number.
 */
export function textCell(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

/**
 * One row per student with data (removed students are left out: their data is gone).
 * In `numbered` a student's figures are their team's.
 */
export function gradebookCsv(debrief: DebriefDto): string {
  const rows = debrief.students
    .filter((s) => !s.removed)
    .map((s) => ({
      student: textCell(s.rosterName ?? s.nickname),
      nickname: textCell(s.nickname),
      score: cell(s.score, 2),
      max_score: String(debrief.itemCount),
      percent: figureCell(s.percent, 1),
      items_answered: String(s.answered),
    }));
  return writeCsvTable(GRADEBOOK_COLUMNS, rows);
}

/** One row per item played; option shares are overall shares 0..1 by letter. */
export function itemAnalysisCsv(debrief: DebriefDto): string {
  const rows = debrief.items.map((item) => {
    const table = item.distractors.value;
    const shares = Object.fromEntries(
      OPTION_COLUMNS.map((column, i) => [column, table?.rows[i] ? table.rows[i].overall.toFixed(3) : '']),
    );
    return {
      position: String(item.position + 1),
      item: textCell(item.prompt),
      type: item.type,
      tags: textCell(item.tags.join('; ')),
      answered: String(item.answeredCount),
      p: figureCell(item.p),
      D: figureCell(item.D),
      r_pb: figureCell(item.pointBiserial),
      flags: item.flags.join('; '),
      key: table ? table.rows.filter((r) => r.isKey).map((r) => r.letter).join('; ') : textCell(item.keyText),
      ...shares,
      no_answer: table ? table.notAnswered.overall.toFixed(3) : '',
    } as Record<(typeof ITEM_ANALYSIS_COLUMNS)[number], string>;
  });
  return writeCsvTable(ITEM_ANALYSIS_COLUMNS, rows);
}

/** A file name safe in a Content-Disposition header: ASCII letters, digits and dashes. */
export function exportFileName(debrief: DebriefDto, kind: 'gradebook' | 'item-analysis'): string {
  const slug = debrief.bankTitle
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 40)
    .toLowerCase();
  const date = debrief.playedAt.slice(0, 10);
  return `${slug || 'session'}-${date}-${kind}.csv`;
}
