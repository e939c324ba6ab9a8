import { TIME_MULTIPLIERS, type TimeMultiplier } from '@covalent/shared-types';
import { cellField, type CsvProblem, type CsvRow } from '../../media/csv-table';

/** The roster CSV layout, documented in docs/roster-csv.md. */
export const ROSTER_CSV_COLUMNS = ['display_name', 'table_group', 'seat_number', 'time_multiplier'] as const;
export type RosterCsvColumn = (typeof ROSTER_CSV_COLUMNS)[number];

export const DISPLAY_NAME_MAX = 40;
export const TABLE_GROUP_MAX = 20;
export const SEAT_MAX = 999;

/** A roster entry as the service stores it. */
export interface RosterEntryFields {
  displayName: string;
  tableGroup: string | null;
  seatNumber: number | null;
  timeMultiplier: TimeMultiplier;
}

/** Names compare case- and space-insensitively: "Mateo R." and "mateo  r." are one student. */
export const nameKey = (name: string): string => name.normalize('NFKC').replace(/\s+/g, ' ').trim().toLowerCase();

export function parseTimeMultiplier(text: string): TimeMultiplier | null {
  if (text === '') return 1;
  const value = Number(text.replace(/^x/i, '').replace(/x$/i, ''));
  return (TIME_MULTIPLIERS as readonly number[]).includes(value) ? (value as TimeMultiplier) : null;
}

/**
 * Every row → an entry, or problems by row and column. `taken` holds name keys already on the
 * roster (append mode), so a repeat is reported rather than refused by the database.
 */
export function rowsToEntries(
  rows: CsvRow<RosterCsvColumn>[],
  taken: Set<string>,
): { entries: RosterEntryFields[]; problems: CsvProblem[] } {
  const problems: CsvProblem[] = [];
  const seen = new Map<string, number>();
  const entries = rows.map(({ rowNumber, cells }) => {
    const flag = (column: RosterCsvColumn, message: string) => problems.push({ field: cellField(rowNumber, column), message });
    const displayName = cells.display_name.replace(/\s+/g, ' ');
    const key = nameKey(displayName);
    if (displayName === '') flag('display_name', 'Write the student\'s name as the class knows it, e.g. "Mateo R.".');
    else if (displayName.length > DISPLAY_NAME_MAX) flag('display_name', `Keep names to ${DISPLAY_NAME_MAX} characters or fewer.`);
    else if (seen.has(key)) flag('display_name', `"${displayName}" is already on row ${seen.get(key)}; add a letter to tell them apart.`);
    else if (taken.has(key)) flag('display_name', `"${displayName}" is already on this class's roster.`);
    seen.set(key, seen.get(key) ?? rowNumber);
    if (cells.table_group.length > TABLE_GROUP_MAX) flag('table_group', `Keep table names to ${TABLE_GROUP_MAX} characters or fewer.`);
    let seatNumber: number | null = null;
    if (cells.seat_number !== '') {
      seatNumber = Number(cells.seat_number);
      if (!Number.isInteger(seatNumber) || seatNumber < 1 || seatNumber > SEAT_MAX) {
        flag('seat_number', `"${cells.seat_number}" is not a seat number from 1 to ${SEAT_MAX}.`);
        seatNumber = null;
      }
    }
    const timeMultiplier = parseTimeMultiplier(cells.time_multiplier);
    if (timeMultiplier === null) flag('time_multiplier', `"${cells.time_multiplier}" is not one of ${TIME_MULTIPLIERS.join(', ')} (or empty for 1).`);
    return { displayName, tableGroup: cells.table_group === '' ? null : cells.table_group, seatNumber, timeMultiplier: timeMultiplier ?? 1 };
  });
  return { entries, problems };
}
