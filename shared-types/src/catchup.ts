import type { FigureDto } from './debrief';
import type { ItemKey, ItemResponse, PlayerItemView } from './items';
import type { Format } from './protocol';

/** A Leitner box of the catch-up schedule: 1 (daily) … 5 (every 16 days). */
export type CatchupBox = 1 | 2 | 3 | 4 | 5;

/** `POST /api/sessions/:id/catchups`: the new catch-up and how many cards it holds. */
export interface CreateCatchupResponse {
  id: string;
  /** 6 characters from JOIN_CODE_ALPHABET, unique among open catch-ups. */
  code: string;
  cardCount: number;
}

/** One student's card in the teacher's results. */
export interface CatchupCardResultDto {
  itemId: string;
  prompt: string;
  box: CatchupBox;
  /** ISO time of the next review. */
  dueAt: string;
  attempts: number;
  correctAttempts: number;
  /** Null before the first attempt. */
  lastCorrect: boolean | null;
  lastAnsweredAt: string | null;
}

export interface CatchupStudentResultDto {
  rosterEntryId: string;
  displayName: string;
  items: CatchupCardResultDto[];
}

/** `GET /api/sessions/:id/catchups/:catchupId/results`. */
export interface CatchupResultsDto {
  id: string;
  sessionId: string;
  code: string;
  createdAt: string;
  closedAt: string | null;
  students: CatchupStudentResultDto[];
}

/** `GET /api/play/catchups/:code`: the names that have items to catch up on. */
export interface CatchupInfoResponse {
  ok: true;
  title: string;
  students: { rosterEntryId: string; displayName: string }[];
}

/** `POST /api/play/catchups/:code/start` body. */
export interface CatchupStartRequest {
  rosterEntryId: string;
}

/** A due item as the student sees it: no key, no explanation. */
export interface CatchupItemView extends PlayerItemView {
  itemId: string;
  box: CatchupBox;
}

export interface CatchupStartResponse {
  ok: true;
  /** Scoped to this catch-up and this roster entry. */
  token: string;
  displayName: string;
  title: string;
  /** Items due now, least known first. */
  items: CatchupItemView[];
  /** ISO time of the earliest review, over all the student's cards (null when there are none). */
  nextDueAt: string | null;
}

/** `POST /api/play/catchups/answers` body. */
export interface CatchupAnswerRequest {
  token: string;
  itemId: string;
  response: ItemResponse;
}

export interface CatchupAnswerResponse {
  ok: true;
  /** 0..1 */
  credit: number;
  /** Full credit: the card moves up a box; otherwise back to box 1. */
  correct: boolean;
  key: ItemKey;
  explanation: string;
  box: CatchupBox;
  /** ISO time this card is due again. */
  dueAt: string;
  /** ISO time of the earliest review over all the student's cards. */
  nextDueAt: string;
}

/** Cards in each Leitner box, box 1 first (five numbers). */
export type CatchupBoxCounts = [number, number, number, number, number];

/**
 * One catch-up's headline, as `GET /api/sessions/:id/catchups` lists it and the class page shows it.
 * "Cleared" cards are those whose last answer was right (box 2 or higher).
 */
export interface CatchupSummaryDto {
  id: string;
  sessionId: string;
  bankTitle: string;
  code: string;
  createdAt: string;
  closedAt: string | null;
  /** Students with at least one card. */
  studentCount: number;
  /** Students who answered at least once. */
  startedCount: number;
  cardCount: number;
  clearedCount: number;
  boxCounts: CatchupBoxCounts;
  attempts: number;
  correctAttempts: number;
  /** correctAttempts / attempts; null before the first answer. */
  accuracy: FigureDto;
}

/** One catch-up as one student's history shows it: their cards only. */
export interface StudentCatchupDto {
  catchupId: string;
  sessionId: string;
  bankTitle: string;
  createdAt: string;
  closedAt: string | null;
  cardCount: number;
  clearedCount: number;
  attempts: number;
  correctAttempts: number;
  items: CatchupCardResultDto[];
}

/** One ended session as one student's history shows it. */
export interface StudentSessionDto {
  sessionId: string;
  bankTitle: string;
  playedAt: string;
  endedAt: string | null;
  format: Format;
  /** The student's figures in the debrief (their team's in `numbered`); percent 0..100. */
  score: number | null;
  percent: FigureDto;
  itemCount: number;
  answered: number;
  /** Items without full credit, in the order played. */
  missed: { itemId: string; prompt: string; credit: number; answerText: string; keyText: string }[];
}

/** `GET /api/classes/:classId/roster/:entryId/history`: every session and catch-up of one student in this class, oldest first. */
export interface StudentHistoryDto {
  classId: string;
  className: string;
  rosterEntryId: string;
  displayName: string;
  tableGroup: string | null;
  sessions: StudentSessionDto[];
  catchups: StudentCatchupDto[];
  /** Mean of the session percents (0..100, as the debrief's student percent) that could be computed. */
  meanPercent: FigureDto;
  /** The class's owner may delete this student's data (DELETE …/roster/:entryId/data); co-teachers and admins read only. */
  canDeleteData: boolean;
}

/** One student's line on the class page. */
export interface ClassStudentTrendDto {
  rosterEntryId: string;
  displayName: string;
  sessionsPlayed: number;
  /** 0..100, the mean of the session percents that could be computed. */
  meanPercent: FigureDto;
  /** Cards still in box 1 of open catch-ups (not answered right since made or last missed; closed catch-ups left out). */
  openCards: number;
  clearedCards: number;
}
