import { DebriefInput } from './debrief-input';
import { ExamineeResult, examineeResults } from './examinee-results';
import { Figure, NotComputedReason, notComputed } from './figure';
import { ItemAnalysis, analyseItem } from './item-analysis';
import { KelleyGroups, kelleyGroups } from './kelley-groups';
import {
  ReliabilityAnalysis,
  ReliabilityMethod,
  ScoreMatrix,
  analyseReliability,
  cronbachAlpha,
  kuderRichardson20,
} from './reliability';
import { ResponseMatrix, buildResponseMatrix } from './response-matrix';
import { TeamResult, teamResults } from './team-results';

export interface SessionAnalysis {
  /** Present examinees: every figure is over these. */
  examineeCount: number;
  /** Examinees whose data was deleted on request: in no figure. */
  removedCount: number;
  itemCount: number;
  /** Kelley's upper and lower 27% by total score, shared by every item's D and distractor table. */
  groups: Figure<KelleyGroups>;
  items: ItemAnalysis[];
  reliability: ReliabilityAnalysis;
  examinees: ExamineeResult[];
  teams: TeamResult[];
}

function scoredColumns(matrix: ResponseMatrix): number[] {
  return matrix.items.flatMap((_, i) => (matrix.rows.some((row) => row.answered[i]) ? [i] : []));
}

function scoreMatrix(matrix: ResponseMatrix, columns: readonly number[]): ScoreMatrix {
  return matrix.rows.map((row) => columns.map((i) => row.credits[i]));
}

function reliabilityWithout(
  matrix: ResponseMatrix,
  columns: readonly number[],
  itemIndex: number,
  method: ReliabilityMethod,
  fallbackReason: string,
): Figure {
  if (!columns.includes(itemIndex)) return notComputed(fallbackReason);
  const scores = scoreMatrix(matrix, columns.filter((i) => i !== itemIndex));
  return method === 'kr20' ? kuderRichardson20(scores) : cronbachAlpha(scores);
}

/**
 * The debrief of one session (DESIGN.md §6).
 *
 * - p is mean credit over the examinees present, unanswered counting 0; an item nobody
 *   answered has p = null and is left out of the reliability.
 * - Groups: round(0.27·N), at least 1, ranked by total descending then id ascending.
 * - Every variance is ÷N; SEM uses the ÷N SD of total scores.
 */
export function analyseSession(input: DebriefInput): SessionAnalysis {
  const matrix = buildResponseMatrix(input);
  const columns = scoredColumns(matrix);
  const allDichotomous = columns.every((i) => matrix.items[i].dichotomous);
  const reliability = analyseReliability({
    itemIds: columns.map((i) => matrix.items[i].id),
    excludedItemIds: matrix.items.filter((_, i) => !columns.includes(i)).map((item) => item.id),
    allDichotomous,
    scores: scoreMatrix(matrix, columns),
  });
  const groups = kelleyGroups(matrix.rows.map((row) => ({ examineeId: row.examineeId, total: row.total })));
  const items = matrix.items.map((item, itemIndex) =>
    analyseItem({
      item,
      itemIndex,
      rows: matrix.rows,
      groups,
      reliabilityIfDeleted: reliabilityWithout(
        matrix,
        columns,
        itemIndex,
        reliability.method,
        matrix.rows.length === 0 ? NotComputedReason.noExaminees : NotComputedReason.nobodyAnswered,
      ),
    }),
  );
  return {
    examineeCount: matrix.rows.length,
    removedCount: matrix.removedCount,
    itemCount: matrix.items.length,
    groups,
    items,
    reliability,
    examinees: examineeResults(matrix),
    teams: teamResults(input, matrix.presentIds),
  };
}
