import type { ItemFlagDto } from '@covalent/shared-types';

/** Flags as words, so they never rely on colour alone (WCAG 1.4.1). */
export const flagLabels: Record<ItemFlagDto, string> = {
  hard: 'hard',
  easy: 'easy',
  weak: 'weak',
  possibleMiskey: 'possible mis-key',
};

export function flagText(flags: readonly ItemFlagDto[]): string {
  return flags.map((f) => flagLabels[f]).join(', ');
}
