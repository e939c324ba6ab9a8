import { Figure, NotComputedReason, computed, notComputed } from './figure';
import { isZeroVariance, mean, populationVariance, sum } from './statistics';

/**
 * Scores as rows of examinees × columns of items (credit 0..1).
 * Every variance here is the population variance (÷N), for items and total alike;
 * mixing Σpq with an n−1 total variance gives W10's 0.73782 instead of 0.69635.
 */
export type ScoreMatrix = readonly (readonly number[])[];

export type ReliabilityMethod = 'kr20' | 'alpha';

function column(scores: ScoreMatrix, j: number): number[] {
  return scores.map((row) => row[j]);
}

function totals(scores: ScoreMatrix): number[] {
  return scores.map((row) => sum(row));
}

/** Guards shared by KR-20 and alpha; returns the total variance when they pass. */
function guardedTotalVariance(scores: ScoreMatrix): Figure {
  if (scores.length < 2) return notComputed(NotComputedReason.fewerThanTwoExaminees);
  const k = scores[0].length;
  if (k < 2) return notComputed(NotComputedReason.fewerThanTwoItems);
  const variance = populationVariance(totals(scores));
  if (isZeroVariance(variance)) return notComputed(NotComputedReason.zeroTotalVariance);
  return computed(variance);
}

/** Cronbach's alpha: k/(k−1) · (1 − Σσ²ᵢ / σ²ₓ). Can be negative; reported as is. */
export function cronbachAlpha(scores: ScoreMatrix): Figure {
  const totalVariance = guardedTotalVariance(scores);
  if (totalVariance.value === null) return totalVariance;
  const k = scores[0].length;
  let itemVariances = 0;
  for (let j = 0; j < k; j += 1) itemVariances += populationVariance(column(scores, j));
  return computed((k / (k - 1)) * (1 - itemVariances / totalVariance.value));
}

/** KR-20 for 0/1 items: k/(k−1) · (1 − Σpq / σ²ₓ). */
export function kuderRichardson20(scores: ScoreMatrix): Figure {
  const totalVariance = guardedTotalVariance(scores);
  if (totalVariance.value === null) return totalVariance;
  const k = scores[0].length;
  let sumPq = 0;
  for (let j = 0; j < k; j += 1) {
    const p = mean(column(scores, j));
    sumPq += p * (1 - p);
  }
  return computed((k / (k - 1)) * (1 - sumPq / totalVariance.value));
}

export interface KuderRichardson21Input {
  itemCount: number;
  /** Mean total score. */
  mean: number;
  /** Population (÷N) variance of total scores. */
  variance: number;
}

/** KR-21 from summary figures alone (assumes equally difficult items): k/(k−1) · (1 − M(k−M)/(kσ²)). */
export function kuderRichardson21({ itemCount: k, mean: m, variance }: KuderRichardson21Input): Figure {
  if (k < 2) return notComputed(NotComputedReason.fewerThanTwoItems);
  if (isZeroVariance(variance)) return notComputed(NotComputedReason.zeroTotalVariance);
  return computed((k / (k - 1)) * (1 - (m * (k - m)) / (k * variance)));
}

/**
 * SEM = SD · √(1 − r), with SD the population (÷N) SD of total scores — the same
 * SD the reliability was computed from. A negative r gives SEM above SD; reported as is.
 */
export function standardErrorOfMeasurement(sd: number, reliability: number): number {
  return sd * Math.sqrt(1 - Math.min(1, reliability));
}

export interface ReliabilityAnalysis {
  method: ReliabilityMethod;
  /** Items that count: every item at least one examinee answered. */
  itemIds: string[];
  /** Items nobody answered: left out, they carry no information and would inflate k/(k−1). */
  excludedItemIds: string[];
  coefficient: Figure;
  /** Only for all-dichotomous sessions. */
  kr21: Figure;
  totalMean: Figure;
  /** Population (÷N). */
  totalVariance: Figure;
  /** Population (÷N): the SD used by `sem`. */
  totalSd: Figure;
  sem: Figure;
}

export interface ReliabilityInput {
  itemIds: string[];
  excludedItemIds: string[];
  allDichotomous: boolean;
  scores: ScoreMatrix;
}

export function analyseReliability(input: ReliabilityInput): ReliabilityAnalysis {
  const { scores, allDichotomous } = input;
  const method: ReliabilityMethod = allDichotomous ? 'kr20' : 'alpha';
  const coefficient = allDichotomous ? kuderRichardson20(scores) : cronbachAlpha(scores);
  const base = { method, itemIds: input.itemIds, excludedItemIds: input.excludedItemIds, coefficient };
  if (scores.length === 0) {
    const none = notComputed(NotComputedReason.noExaminees);
    return {
      ...base,
      coefficient: none,
      kr21: none,
      totalMean: none,
      totalVariance: none,
      totalSd: none,
      sem: none,
    };
  }
  const totalScores = totals(scores);
  const totalMean = mean(totalScores);
  const totalVariance = populationVariance(totalScores);
  const totalSd = Math.sqrt(totalVariance);
  const kr21 = allDichotomous
    ? coefficient.value === null
      ? notComputed(coefficient.reason)
      : kuderRichardson21({ itemCount: input.itemIds.length, mean: totalMean, variance: totalVariance })
    : notComputed(NotComputedReason.notDichotomous);
  const sem =
    coefficient.value === null
      ? notComputed(coefficient.reason)
      : computed(standardErrorOfMeasurement(totalSd, coefficient.value));
  return {
    ...base,
    kr21,
    totalMean: computed(totalMean),
    totalVariance: computed(totalVariance),
    totalSd: computed(totalSd),
    sem,
  };
}
