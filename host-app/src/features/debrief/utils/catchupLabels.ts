import type { CatchupBoxCounts, CatchupCardResultDto } from '@covalent/shared-types';

/** A card's last answer in words, so it never rests on colour alone. */
export function lastResultText(card: Pick<CatchupCardResultDto, 'lastCorrect'>): 'right' | 'wrong' | 'not yet' {
  if (card.lastCorrect === null) return 'not yet';
  return card.lastCorrect ? 'right' : 'wrong';
}

/** "Box 1: 4 · Box 2: 1 · …", every box listed so a column reads the same in each row. */
export function boxCountsText(counts: CatchupBoxCounts): string {
  return counts.map((n, i) => `Box ${i + 1}: ${n}`).join(' · ');
}

/** "3 of 12". */
export const ofTotal = (part: number, total: number): string => `${part} of ${total}`;
