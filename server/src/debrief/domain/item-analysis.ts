import { DebriefItem } from './debrief-input';
import { Figure, NotComputedReason, computed, notComputed } from './figure';
import { KelleyGroups, maxPossibleDiscrimination } from './kelley-groups';
import { ExamineeRow } from './response-matrix';
import { isZeroVariance, mean, pearson, populationVariance, roundForComparison } from './statistics';

/** Thresholds of DESIGN.md §6; all comparisons are strict. */
export const ItemThresholds = {
  /** p below this: hard. */
  hard: 0.3,
  /** p above this: easy. */
  easy: 0.9,
  /** D below this: weak (Ebel 1954: D < 0.20 is low). */
  weak: 0.2,
  /** D below this: possible mis-key. */
  possibleMiskey: 0,
  /** A distractor chosen by fewer than this share is non-functional (Haladyna & Downing 1993). */
  functionalDistractor: 0.05,
} as const;

export const ItemFlag = {
  hard: 'hard',
  easy: 'easy',
  weak: 'weak',
  possibleMiskey: 'possibleMiskey',
} as const;
export type ItemFlag = (typeof ItemFlag)[keyof typeof ItemFlag];

/** Shares (0..1) of examinees overall and in the Kelley groups. */
export interface GroupShares {
  overall: number;
  upper: Figure;
  lower: Figure;
}

export interface OptionShares extends GroupShares {
  optionId: string;
  isKey: boolean;
  /** A distractor chosen by under 5% overall. Never set on a key. */
  nonFunctional: boolean;
  /** A distractor that draws the upper group more than the lower. Never set on a key. */
  review: boolean;
}

export interface DistractorTable {
  options: OptionShares[];
  /** Examinees who gave no answer, as a share of the same groups. */
  notAnswered: GroupShares;
}

export interface ItemAnalysis {
  itemId: string;
  answeredCount: number;
  /** p: mean credit over present examinees, unanswered counting 0. */
  difficulty: Figure;
  upperP: Figure;
  lowerP: Figure;
  /** D = p(upper 27%) − p(lower 27%). */
  discrimination: Figure;
  /** Highest D this p allows with 27% groups (Lopez 1998). */
  maxDiscrimination: Figure;
  /** Corrected point-biserial: Pearson r of item credit with the rest score (total minus this item). */
  pointBiserial: Figure;
  /** Uncorrected: Pearson r of item credit with the total that includes it. */
  itemTotalCorrelation: Figure;
  /** KR-20 or alpha (the session's method) without this item. */
  reliabilityIfDeleted: Figure;
  distractors: Figure<DistractorTable>;
  flags: ItemFlag[];
}

export interface ItemContext {
  item: DebriefItem;
  itemIndex: number;
  rows: readonly ExamineeRow[];
  groups: Figure<KelleyGroups>;
  reliabilityIfDeleted: Figure;
}

interface GroupRows {
  upper: ExamineeRow[];
  lower: ExamineeRow[];
}

function groupRows(rows: readonly ExamineeRow[], groups: KelleyGroups): GroupRows {
  const byId = new Map(rows.map((row) => [row.examineeId, row]));
  const pick = (ids: string[]): ExamineeRow[] => ids.map((id) => byId.get(id) as ExamineeRow);
  return { upper: pick(groups.upperIds), lower: pick(groups.lowerIds) };
}

function shareOf(rows: readonly ExamineeRow[], test: (row: ExamineeRow) => boolean): number {
  return rows.filter(test).length / rows.length;
}

function groupShares(
  rows: readonly ExamineeRow[],
  groups: GroupRows | null,
  groupReason: string,
  test: (row: ExamineeRow) => boolean,
): GroupShares {
  return {
    overall: shareOf(rows, test),
    upper: groups ? computed(shareOf(groups.upper, test)) : notComputed(groupReason),
    lower: groups ? computed(shareOf(groups.lower, test)) : notComputed(groupReason),
  };
}

function distractorTable(
  context: ItemContext,
  groups: GroupRows | null,
  groupReason: string,
): DistractorTable {
  const { item, itemIndex: i, rows } = context;
  const keys = new Set(item.correctOptionIds);
  const options = item.optionIds.map((optionId): OptionShares => {
    const shares = groupShares(rows, groups, groupReason, (row) => row.chosen[i].includes(optionId));
    const isKey = keys.has(optionId);
    const drawsUpper =
      shares.upper.value !== null &&
      shares.lower.value !== null &&
      roundForComparison(shares.upper.value) > roundForComparison(shares.lower.value);
    return {
      optionId,
      isKey,
      ...shares,
      nonFunctional: !isKey && roundForComparison(shares.overall) < ItemThresholds.functionalDistractor,
      review: !isKey && drawsUpper,
    };
  });
  return { options, notAnswered: groupShares(rows, groups, groupReason, (row) => !row.answered[i]) };
}

export function itemFlags(p: number | null, d: number | null): ItemFlag[] {
  const flags: ItemFlag[] = [];
  if (p !== null && roundForComparison(p) < ItemThresholds.hard) flags.push(ItemFlag.hard);
  if (p !== null && roundForComparison(p) > ItemThresholds.easy) flags.push(ItemFlag.easy);
  if (d !== null && roundForComparison(d) < ItemThresholds.weak) flags.push(ItemFlag.weak);
  if (d !== null && roundForComparison(d) < ItemThresholds.possibleMiskey) {
    flags.push(ItemFlag.possibleMiskey);
  }
  return flags;
}

/** An item with no data at all: every figure null for the same reason. */
function withoutData(reason: string, context: ItemContext): ItemAnalysis {
  const none = notComputed(reason);
  return {
    itemId: context.item.id,
    answeredCount: 0,
    difficulty: none,
    upperP: none,
    lowerP: none,
    discrimination: none,
    maxDiscrimination: none,
    pointBiserial: none,
    itemTotalCorrelation: none,
    reliabilityIfDeleted: context.reliabilityIfDeleted,
    distractors:
      context.item.optionIds.length === 0
        ? notComputed(NotComputedReason.notChoiceItem)
        : notComputed(reason),
    flags: [],
  };
}

function correlation(x: number[], y: number[], restOrTotal: 'rest' | 'total'): Figure {
  if (x.length < 2) return notComputed(NotComputedReason.fewerThanTwoExaminees);
  const r = pearson(x, y);
  if (r !== null) return computed(r);
  if (isZeroVariance(populationVariance(x))) return notComputed(NotComputedReason.zeroItemVariance);
  return notComputed(
    restOrTotal === 'rest' ? NotComputedReason.zeroRestVariance : NotComputedReason.zeroTotalVariance,
  );
}

export function analyseItem(context: ItemContext): ItemAnalysis {
  const { item, itemIndex: i, rows } = context;
  const answeredCount = rows.filter((row) => row.answered[i]).length;
  if (rows.length === 0) return withoutData(NotComputedReason.noExaminees, context);
  if (answeredCount === 0) return withoutData(NotComputedReason.nobodyAnswered, context);

  const credits = rows.map((row) => row.credits[i]);
  const p = mean(credits);
  const groups = context.groups.value === null ? null : groupRows(rows, context.groups.value);
  const groupReason = context.groups.reason ?? NotComputedReason.noGroups;
  const groupP = (group: ExamineeRow[]): Figure => computed(mean(group.map((row) => row.credits[i])));
  const upperP = groups ? groupP(groups.upper) : notComputed(groupReason);
  const lowerP = groups ? groupP(groups.lower) : notComputed(groupReason);
  const discrimination =
    upperP.value !== null && lowerP.value !== null
      ? computed(upperP.value - lowerP.value)
      : notComputed(groupReason);

  return {
    itemId: item.id,
    answeredCount,
    difficulty: computed(p),
    upperP,
    lowerP,
    discrimination,
    maxDiscrimination: computed(maxPossibleDiscrimination(p)),
    pointBiserial: correlation(credits, rows.map((row) => row.total - row.credits[i]), 'rest'),
    itemTotalCorrelation: correlation(credits, rows.map((row) => row.total), 'total'),
    reliabilityIfDeleted: context.reliabilityIfDeleted,
    distractors:
      item.optionIds.length === 0
        ? notComputed(NotComputedReason.notChoiceItem)
        : computed(distractorTable(context, groups, groupReason)),
    flags: itemFlags(p, discrimination.value),
  };
}
