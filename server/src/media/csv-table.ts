import { HttpStatus } from '@nestjs/common';
import { CsvError, parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { ApiException } from '../common/api-error';

/** Largest CSV file we read (DESIGN §8: uploads are size-checked). */
export const CSV_MAX_BYTES = 1024 * 1024;
/** Most data rows in one import; a bank or roster past this is better split. */
export const CSV_MAX_ROWS = 500;

/** One data row: its number as a spreadsheet shows it (the header is row 1) and its cells by column name. */
export interface CsvRow<C extends string> {
  rowNumber: number;
  cells: Record<C, string>;
}

/** A problem with one cell or row, in the one error shape's `details`. */
export interface CsvProblem {
  field: string;
  message: string;
}

/** "row 3, column correct" — the field name every CSV report uses. */
export const cellField = (rowNumber: number, column?: string): string =>
  column ? `row ${rowNumber}, column ${column}` : `row ${rowNumber}`;

/** Reads bytes as UTF-8 or refuses them: guessing another encoding would garble names silently. */
export function decodeUtf8(bytes: Uint8Array): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes); // also drops a leading BOM
  } catch {
    throw new ApiException(
      HttpStatus.BAD_REQUEST,
      'csv_not_utf8',
      'The file is not UTF-8 text. In your spreadsheet, save it as "CSV UTF-8" and upload it again.',
    );
  }
}

function parseRecords(text: string): string[][] {
  try {
    return parse(text, { relax_column_count: true, skip_empty_lines: false }) as string[][];
  } catch (err) {
    if (err instanceof CsvError) {
      const line = (err as CsvError & { lines?: number }).lines;
      throw new ApiException(
        HttpStatus.BAD_REQUEST,
        'csv_malformed',
        `The file is not well-formed CSV${line ? ` near line ${line}` : ''}: check for an unclosed quote.`,
      );
    }
    throw err;
  }
}

function checkHeader(header: string[], columns: readonly string[]): CsvProblem[] {
  const names = header.map((h) => h.trim().toLowerCase());
  const problems: CsvProblem[] = [];
  names.forEach((name, i) => {
    if (!columns.includes(name)) {
      problems.push({ field: cellField(1, `${i + 1}`), message: `"${header[i]}" is not a column of this file type.` });
    } else if (names.indexOf(name) !== i) {
      problems.push({ field: cellField(1, name), message: `The column "${name}" appears twice.` });
    }
  });
  for (const column of columns) {
    if (!names.includes(column)) problems.push({ field: cellField(1, column), message: `The column "${column}" is missing.` });
  }
  return problems;
}

const isBlank = (record: string[]): boolean => record.every((cell) => cell.trim() === '');

/**
 * Decodes, parses and checks the header of an uploaded CSV. Throws the one error shape for
 * problems with the whole file; returns per-row structure problems for the caller's report.
 * Columns may come in any order; rows that are entirely empty are skipped but keep their numbers.
 */
export function readCsvTable<C extends string>(
  bytes: Uint8Array,
  columns: readonly C[],
  maxRows = CSV_MAX_ROWS,
): { rows: CsvRow<C>[]; problems: CsvProblem[] } {
  const records = parseRecords(decodeUtf8(bytes));
  const [header, ...body] = records;
  if (!header || isBlank(header)) {
    throw new ApiException(HttpStatus.BAD_REQUEST, 'csv_empty', 'The file is empty: it needs a header row and at least one row.');
  }
  const headerProblems = checkHeader(header, columns);
  if (headerProblems.length) {
    throw new ApiException(
      HttpStatus.BAD_REQUEST,
      'csv_bad_header',
      `The header row must name these columns: ${columns.join(', ')}.`,
      headerProblems,
    );
  }
  const names = header.map((h) => h.trim().toLowerCase() as C);
  const filled = body.map((record, i) => ({ record, rowNumber: i + 2 })).filter(({ record }) => !isBlank(record));
  if (filled.length === 0) throw new ApiException(HttpStatus.BAD_REQUEST, 'csv_empty', 'The file has a header row but no rows.');
  if (filled.length > maxRows) {
    throw new ApiException(
      HttpStatus.BAD_REQUEST,
      'csv_too_many_rows',
      `The file has ${filled.length} rows; one import takes at most ${maxRows}. Split it into smaller files.`,
    );
  }
  const problems: CsvProblem[] = [];
  const rows = filled.map(({ record, rowNumber }) => {
    if (record.length > names.length && !isBlank(record.slice(names.length))) {
      problems.push({
        field: cellField(rowNumber),
        message: `This row has ${record.length} cells but the header names ${names.length} columns; check for an unquoted comma.`,
      });
    }
    // Short rows are fine: spreadsheets drop trailing empty cells.
    const cells = Object.fromEntries(names.map((name, i) => [name, (record[i] ?? '').trim()])) as Record<C, string>;
    return { rowNumber, cells };
  });
  return { rows, problems };
}

/** CSV text with a header row; a UTF-8 BOM so spreadsheets open accents correctly. */
export function writeCsvTable<C extends string>(columns: readonly C[], rows: Record<C, string>[]): string {
  return '\uFEFF' + stringify(rows, { header: true, columns: [...columns], record_delimiter: 'unix' });
}

/** Throws the 400 report when any row had a problem; nothing has been written at that point. */
export function refuseIfProblems(problems: CsvProblem[]): void {
  if (problems.length === 0) return;
  throw new ApiException(
    HttpStatus.BAD_REQUEST,
    'validation_failed',
    problems.length === 1
      ? `${problems[0].field}: ${problems[0].message} Nothing was imported.`
      : `${problems.length} cells need attention. Nothing was imported.`,
    problems,
  );
}
