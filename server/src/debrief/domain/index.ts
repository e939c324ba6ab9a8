export { analyseSession } from './analyse-session';
export type { SessionAnalysis } from './analyse-session';
export { accuracyByTag } from './accuracy-by-tag';
export type { TaggedSession, TagAccuracyPoint, TagAccuracySeries } from './accuracy-by-tag';
export { DebriefInputError } from './debrief-input';
export type {
  DebriefExaminee,
  DebriefInput,
  DebriefItem,
  DebriefResponse,
  DebriefTeam,
  DebriefTeamRound,
} from './debrief-input';
export type { ExamineeResult, MissedItem } from './examinee-results';
export { computed, NOT_ENOUGH_DATA_LABEL, NotComputedReason, notComputed } from './figure';
export { mean } from './statistics';
export type { Figure } from './figure';
export { ItemFlag, ItemThresholds, itemFlags } from './item-analysis';
export type { DistractorTable, GroupShares, ItemAnalysis, OptionShares } from './item-analysis';
export {
  KELLEY_FRACTION,
  kelleyGroupSize,
  kelleyGroups,
  maxPossibleDiscrimination,
  rankByTotal,
} from './kelley-groups';
export type { KelleyGroups, RankedExaminee } from './kelley-groups';
export {
  cronbachAlpha,
  kuderRichardson20,
  kuderRichardson21,
  standardErrorOfMeasurement,
} from './reliability';
export type {
  KuderRichardson21Input,
  ReliabilityAnalysis,
  ReliabilityMethod,
  ScoreMatrix,
} from './reliability';
export type { TeamResult } from './team-results';
