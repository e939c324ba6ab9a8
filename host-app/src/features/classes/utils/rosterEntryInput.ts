import type { TimeMultiplier } from '@covalent/shared-types';
import type { RosterEntryInput } from '../hooks/useClassMutations';

/** A roster row as typed in the form. */
export interface RosterRowDraft {
  displayName: string;
  tableGroup: string;
  seatNumber: string;
  timeMultiplier: TimeMultiplier;
}

export const emptyRosterRow: RosterRowDraft = { displayName: '', tableGroup: '', seatNumber: '', timeMultiplier: 1 };

/** What the roster routes take: empty table and seat mean none; a seat is sent as typed (the server checks 1–999). */
export function rosterEntryInput(draft: RosterRowDraft): RosterEntryInput {
  const seat = draft.seatNumber.trim();
  return {
    displayName: draft.displayName.trim(),
    tableGroup: draft.tableGroup.trim() || null,
    seatNumber: seat === '' ? null : Number(seat),
    timeMultiplier: draft.timeMultiplier,
  };
}
