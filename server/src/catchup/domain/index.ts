export { BOX_COUNT, DAY_MS, dueCards, intervalDays, isDue, newCard, review } from './leitner';
export type { Box, LeitnerCard } from './leitner';
export { earliestDue, isCorrect, planCards, type MissedSource, type PlannedCard } from './catchup-plan';
