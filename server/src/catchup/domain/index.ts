export { BOX_COUNT, DAY_MS, dueCards, intervalDays, isDue, newCard, review } from './leitner';
export type { Box, LeitnerCard } from './leitner';
