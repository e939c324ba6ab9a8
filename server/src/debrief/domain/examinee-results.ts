import { Figure, NotComputedReason, computed, notComputed } from './figure';
import { ExamineeRow, ResponseMatrix } from './response-matrix';

/** An item an examinee did not get full credit on; the caller maps option ids to text and key. */
export interface MissedItem {
  itemId: string;
  credit: number;
  answered: boolean;
  chosenOptionIds: string[];
}

export interface ExamineeResult {
  examineeId: string;
  /** Sum of credit over the items played. */
  score: number;
  /** score / items played × 100. */
  percent: Figure;
  answeredCount: number;
  /** Items with credit below 1, in item order. */
  missedItems: MissedItem[];
}

function missedItems(matrix: ResponseMatrix, row: ExamineeRow): MissedItem[] {
  return matrix.items.flatMap((item, i): MissedItem[] => {
    if (row.credits[i] >= 1) return [];
    return [{ itemId: item.id, credit: row.credits[i], answered: row.answered[i], chosenOptionIds: row.chosen[i] }];
  });
}

function percentOf(score: number, itemCount: number): Figure {
  return itemCount === 0 ? notComputed(NotComputedReason.noItems) : computed((100 * score) / itemCount);
}

export function examineeResults(matrix: ResponseMatrix): ExamineeResult[] {
  return matrix.rows.map((row) => ({
    examineeId: row.examineeId,
    score: row.total,
    percent: percentOf(row.total, matrix.items.length),
    answeredCount: row.answered.filter(Boolean).length,
    missedItems: missedItems(matrix, row),
  }));
}
