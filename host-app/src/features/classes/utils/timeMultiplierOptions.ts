import { TIME_MULTIPLIERS, type TimeMultiplier } from '@covalent/shared-types';

/** "×1.25 time" for a badge; the standard time says nothing. */
export const timeMultiplierLabel = (m: TimeMultiplier): string => (m === 1 ? 'Standard time' : `×${m} time`);

/** The select's choices: exactly the multipliers DESIGN.md §4 allows. */
export const timeMultiplierOptions = TIME_MULTIPLIERS.map((m) => ({ value: String(m), label: m === 1 ? '1 (standard)' : `${m}` }));
