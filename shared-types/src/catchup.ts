import type { ItemKey, ItemResponse, PlayerItemView } from './items';

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
