/**
 * Test data and factories for the debrief specs (one place, per STYLE.md §15).
 * Published datasets are from REFERENCES.md §1.
 */
import { DebriefInput, DebriefItem, DebriefResponse } from './debrief-input';

/**
 * LSAT6: Bock & Lieberman (1970), Psychometrika 35:179–197; R psych `bock.table` Ob6.
 * Counts of the 32 response patterns of Q1..Q5 in binary order 00000, 00001, …, 11111.
 */
export const LSAT6_PATTERN_COUNTS = [
  3, 6, 2, 11, 1, 1, 3, 4, 1, 8, 0, 16, 0, 3, 2, 15, 10, 29, 14, 81, 3, 28, 15, 80, 16, 56, 21, 173, 11,
  61, 28, 298,
] as const;

/** LSAT6 expanded to 1000 rows of 0/1 in pattern order (Q1 is the leftmost bit). */
export function lsat6Rows(): number[][] {
  return LSAT6_PATTERN_COUNTS.flatMap((count, pattern) => {
    const row = [4, 3, 2, 1, 0].map((bit) => (pattern >> bit) & 1);
    return Array.from({ length: count }, () => [...row]);
  });
}

/** Zero-padded so code-unit order equals row order: x0001 … x1000. */
export function lsat6Ids(): string[] {
  return lsat6Rows().map((_, index) => `x${String(index + 1).padStart(4, '0')}`);
}

/** W10: Wuensch, "The Kuder-Richardson 20", East Carolina Univ. (KR20.txt): 10 students × 10 items. */
export const W10_STUDENTS: Record<string, string> = {
  A: '1111110110',
  B: '1011011101',
  C: '1111011001',
  D: '0010001000',
  E: '0000010010',
  F: '1110111111',
  G: '1101110111',
  H: '1111111101',
  I: '0101111101',
  J: '1101101110',
};

export function w10Ids(): string[] {
  return Object.keys(W10_STUDENTS);
}

export function w10Rows(): number[][] {
  return Object.values(W10_STUDENTS).map((bits) => [...bits].map(Number));
}

export function itemId(index: number): string {
  return `Q${index + 1}`;
}

export function openItem(id: string, dichotomous = true): DebriefItem {
  return { id, optionIds: [], correctOptionIds: [], dichotomous };
}

export function choiceItem(id: string, optionIds: string[], correctOptionIds: string[]): DebriefItem {
  return { id, optionIds, correctOptionIds, dichotomous: true };
}

export function answer(examineeId: string, item: string, credit: number, chosenOptionIds: string[] = []): DebriefResponse {
  return { examineeId, itemId: item, credit, chosenOptionIds, answered: true };
}

/**
 * A session from a credit matrix: every cell is an answered response. Items are
 * non-choice and dichotomous unless `dichotomous` is false.
 */
export function inputFromRows(rows: readonly (readonly number[])[], ids: readonly string[], dichotomous = true): DebriefInput {
  const itemCount = rows[0]?.length ?? 0;
  return {
    items: Array.from({ length: itemCount }, (_, i) => openItem(itemId(i), dichotomous)),
    examinees: ids.map((id) => ({ id })),
    responses: rows.flatMap((row, r) => row.map((credit, i) => answer(ids[r], itemId(i), credit))),
  };
}

export function lsat6Input(): DebriefInput {
  return inputFromRows(lsat6Rows(), lsat6Ids());
}

export function w10Input(): DebriefInput {
  return inputFromRows(w10Rows(), w10Ids());
}

/** Column j of a row matrix. */
export function columnOf(rows: readonly (readonly number[])[], j: number): number[] {
  return rows.map((row) => row[j]);
}

export function rowTotals(rows: readonly (readonly number[])[]): number[] {
  return rows.map((row) => row.reduce((acc, x) => acc + x, 0));
}
