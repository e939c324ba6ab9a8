import type { ItemKey, ItemResponse, ItemType } from './items';
import type { CatchupSummaryDto, ClassStudentTrendDto } from './catchup';
import type { Format } from './protocol';

/**
 * A computed figure, or null with the reason it could not be computed. Show every null
 * figure as {@link NOT_ENOUGH_DATA}; the reason is for tooltips and exports.
 */
export type FigureDto<T = number> = { value: T; reason: null } | { value: null; reason: string };

/** The label shown for a figure that could not be computed. */
export const NOT_ENOUGH_DATA = 'not enough data';

/** Item flags of DESIGN.md §6: p < 0.30 hard, p > 0.90 easy, D < 0.20 weak, D < 0 possible mis-key. */
export const ITEM_FLAGS = ['hard', 'easy', 'weak', 'possibleMiskey'] as const;
/** One of {@link ITEM_FLAGS}. */
export type ItemFlagDto = (typeof ITEM_FLAGS)[number];

/**
 * What one row of the item analysis stands for: a player, or in `numbered` a team
 * submission (only the called member answers, so the team is the unit).
 */
export type DebriefUnit = 'player' | 'team';

/** KR-20 for all-dichotomous sessions, Cronbach's alpha otherwise; SEM = SD · √(1 − r). */
export interface ReliabilityDto {
  method: 'kr20' | 'alpha';
  value: FigureDto;
  sem: FigureDto;
  /** Items nobody answered, left out of the coefficient. */
  excludedItemIds: string[];
}

/** The headline of one ended session, as `GET /api/debriefs` lists it and the debrief opens with. */
export interface DebriefSummaryDto {
  sessionId: string;
  bankId: string | null;
  bankTitle: string;
  classId: string | null;
  className: string | null;
  format: Format;
  unit: DebriefUnit;
  /** ISO 8601: when the session started (its creation when it never started). */
  playedAt: string;
  endedAt: string | null;
  /** Students whose data is in the debrief. */
  playerCount: number;
  /** Students whose data was deleted (on request or by the school's retention): in no figure. */
  removedCount: number;
  /** Items played (rounds opened). */
  itemCount: number;
  /** Mean percent of the units, as a share 0..1. */
  classAccuracy: FigureDto;
  reliability: ReliabilityDto;
  /** Items with p under the revisit threshold. */
  revisitCount: number;
}

/** One row of an item's distractor table: shares 0..1, overall and in Kelley's upper and lower 27%. */
export interface DistractorRowDto {
  optionId: string;
  /** "A", "B", … in the item's option order. */
  letter: string;
  text: string;
  isKey: boolean;
  overall: number;
  upper: FigureDto;
  lower: FigureDto;
  /** A distractor chosen by under 5% overall. */
  nonFunctional: boolean;
  /** A distractor that draws the upper group more than the lower. */
  review: boolean;
}

export interface DistractorTableDto {
  rows: DistractorRowDto[];
  /** Units that gave no answer. */
  notAnswered: { overall: number; upper: FigureDto; lower: FigureDto };
}

/** Item analysis of one item played in a session (DESIGN.md §6). */
export interface DebriefItemDto {
  id: string;
  /** 0-based order in which the item was played. */
  position: number;
  prompt: string;
  type: ItemType;
  tags: string[];
  answeredCount: number;
  /** Difficulty: mean credit, unanswered counting 0. */
  p: FigureDto;
  /** Discrimination: p(upper 27%) − p(lower 27%). */
  D: FigureDto;
  upperP: FigureDto;
  lowerP: FigureDto;
  /** Corrected point-biserial: r of item credit with the rest score. */
  pointBiserial: FigureDto;
  /** KR-20 or alpha without this item. */
  reliabilityIfDeleted: FigureDto;
  flags: ItemFlagDto[];
  /** p under the revisit threshold: listed among the items to revisit. */
  revisit: boolean;
  /** Choice items (single, multi, truefalse) only. */
  distractors: FigureDto<DistractorTableDto>;
  explanation: string;
  key: ItemKey;
  /** The key as a teacher reads it ("B. Volumetric pipette"). */
  keyText: string;
}

/** An item a student did not get full credit on. */
export interface MissedItemDto {
  itemId: string;
  position: number;
  prompt: string;
  credit: number;
  answered: boolean;
  answer: ItemResponse | null;
  answerText: string;
  key: ItemKey;
  keyText: string;
}

/** One student's results. In `numbered` the figures are their team's (the unit). */
export interface DebriefStudentDto {
  playerId: string;
  nickname: string;
  rosterEntryId: string | null;
  rosterName: string | null;
  teamId: string | null;
  /** Sum of credit over the items played; null when removed. */
  score: number | null;
  percent: FigureDto;
  answered: number;
  missed: MissedItemDto[];
  /** Data deleted on request or by retention: counted, in no figure. */
  removed: boolean;
}

export interface DebriefTeamDto {
  id: string;
  name: string;
  points: number;
  /** Share 0..1 of rounds answered correctly (solo: mean share of correct members). */
  accuracy: FigureDto;
  /** Share 0..1 of rounds in which every member chose the correct answer (huddle). */
  unityRate: FigureDto;
  memberCount: number;
}

/** `GET /api/sessions/:id/debrief`. */
export interface DebriefDto extends DebriefSummaryDto {
  items: DebriefItemDto[];
  students: DebriefStudentDto[];
  teams: DebriefTeamDto[];
}

/** One point of a tag's series: the class's accuracy on that tag in one session. */
export interface TagTrendPointDto {
  sessionId: string;
  endedAt: string;
  itemCount: number;
  accuracy: FigureDto;
}

/** `GET /api/classes/:id/trends`: accuracy by tag across the class's ended sessions, oldest first. */
export interface ClassTrendDto {
  classId: string;
  className: string;
  sessions: { sessionId: string; bankTitle: string; endedAt: string }[];
  tags: { tag: string; points: TagTrendPointDto[] }[];
  /** The class's catch-ups, oldest first, with how far the students have got. */
  catchups: CatchupSummaryDto[];
  /** Every student on the class list, by name: sessions played, mean percent, catch-up cards. */
  students: ClassStudentTrendDto[];
}

/** `POST /api/sessions/:id/debrief/email` success. */
export interface DebriefEmailResponse {
  ok: true;
  recipients: string[];
}

/** `DELETE …/players/:playerId/data` success. */
export interface DeletePlayerDataResponse {
  ok: true;
  deletedResponses: number;
}
