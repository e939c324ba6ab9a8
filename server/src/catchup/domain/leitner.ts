/**
 * Leitner boxes for catch-up (DESIGN.md §6). The rule — a correct answer moves the item to the
 * next box, a wrong one back to box 1 — is Leitner's (1972, "So lernt man lernen"), as described
 * in Wikipedia "Leitner system". The five boxes and their intervals doubling from one day
 * (1, 2, 4, 8, 16 days) are this product's choice; Leitner's own scheme was capacity-driven.
 */

export const BOX_COUNT = 5;
export const DAY_MS = 24 * 60 * 60 * 1000;

export type Box = 1 | 2 | 3 | 4 | 5;

/** One student's schedule for one item. Times are ms since the epoch, from an injected clock. */
export interface LeitnerCard {
  box: Box;
  dueAt: number;
  reviewedAt: number | null;
}

/** Days between reviews in a box: 2^(box − 1), i.e. 1, 2, 4, 8, 16. */
export function intervalDays(box: Box): number {
  return 2 ** (box - 1);
}

/** A missed item enters box 1 and is due at once. */
export function newCard(now: number): LeitnerCard {
  return { box: 1, dueAt: now, reviewedAt: null };
}

/** Correct → next box (box 5 stays in 5); wrong → box 1. The next review is one interval of the new box from now. */
export function review(card: LeitnerCard, correct: boolean, now: number): LeitnerCard {
  const box = (correct ? Math.min(BOX_COUNT, card.box + 1) : 1) as Box;
  return { box, dueAt: now + intervalDays(box) * DAY_MS, reviewedAt: now };
}

export function isDue(card: LeitnerCard, now: number): boolean {
  return card.dueAt <= now;
}

/** Due cards, lowest box first (the least known), then the longest overdue, then by id. */
export function dueCards<T extends { id: string; card: LeitnerCard }>(cards: readonly T[], now: number): T[] {
  return cards
    .filter((c) => isDue(c.card, now))
    .sort((a, b) => a.card.box - b.card.box || a.card.dueAt - b.card.dueAt || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}
