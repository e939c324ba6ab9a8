import type { RosterEntryDto } from '@covalent/shared-types';

export interface TableGroup {
  /** The table label, or null for students without a table. */
  table: string | null;
  /** By seat number (unseated last), then name. */
  entries: RosterEntryDto[];
}

const natural = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

function bySeat(a: RosterEntryDto, b: RosterEntryDto): number {
  if (a.seatNumber !== b.seatNumber) {
    if (a.seatNumber === null) return 1;
    if (b.seatNumber === null) return -1;
    return a.seatNumber - b.seatNumber;
  }
  return natural.compare(a.displayName, b.displayName);
}

/** The roster as the room is laid out: one group per table in natural order ("2" before "10"), free seating last. */
export function groupByTable(roster: readonly RosterEntryDto[]): TableGroup[] {
  const groups = new Map<string | null, RosterEntryDto[]>();
  for (const entry of roster) {
    const table = entry.tableGroup?.trim() || null;
    groups.set(table, [...(groups.get(table) ?? []), entry]);
  }
  return [...groups.entries()]
    .sort(([a], [b]) => (a === null ? 1 : b === null ? -1 : natural.compare(a, b)))
    .map(([table, entries]) => ({ table, entries: [...entries].sort(bySeat) }));
}
