const DAY_MS = 24 * 60 * 60 * 1000;

/** "next review now", "next review tomorrow" or "next review in 4 days", rounding up to whole days. */
export function nextReviewText(nextDueAt: string | null, now: number): string {
  if (nextDueAt === null) return 'nothing left to review';
  const days = Math.ceil((Date.parse(nextDueAt) - now) / DAY_MS);
  if (days <= 0) return 'next review now';
  if (days === 1) return 'next review tomorrow';
  return `next review in ${days} days`;
}
