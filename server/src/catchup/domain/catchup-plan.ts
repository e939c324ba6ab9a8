/** What the catch-up needs of a debrief student row (DebriefStudentDto has this shape). */
export interface MissedSource {
  rosterEntryId: string | null;
  removed: boolean;
  missed: { itemId: string; credit: number }[];
}

export interface PlannedCard {
  rosterEntryId: string;
  itemId: string;
}

/**
 * One card per (roster entry, item) the student missed: credit under 1, unanswered included.
 * Nicknamed players have no roster entry to come back as, and deleted students are left out;
 * a student who rejoined under the same name appears once.
 */
export function planCards(students: readonly MissedSource[]): PlannedCard[] {
  const seen = new Set<string>();
  const out: PlannedCard[] = [];
  for (const s of students) {
    if (s.rosterEntryId === null || s.removed) continue;
    for (const m of s.missed) {
      const k = `${s.rosterEntryId}/${m.itemId}`;
      if (m.credit >= 1 || seen.has(k)) continue;
      seen.add(k);
      out.push({ rosterEntryId: s.rosterEntryId, itemId: m.itemId });
    }
  }
  return out;
}

/** Full credit counts as known; anything less sends the card back to box 1. */
export function isCorrect(credit: number): boolean {
  return credit >= 1;
}

/** The earliest due time among cards, or null for none. */
export function earliestDue(cards: readonly { dueAt: number }[]): number | null {
  return cards.reduce<number | null>((min, c) => (min === null || c.dueAt < min ? c.dueAt : min), null);
}
