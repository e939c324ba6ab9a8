import type { BankDetailDto } from '@covalent/shared-types';
import { isSafetyTagged } from './isSafetyTagged';

/**
 * Whether the lab-safety caution applies: the bank is tagged safety, or the item on screen is.
 * The live view carries no item id or tags, so the item is found by its prompt.
 */
export function needsSafetyCaution(bank: Pick<BankDetailDto, 'tags' | 'items'> | undefined, prompt: string | null): boolean {
  if (!bank) return false;
  if (isSafetyTagged(bank.tags)) return true;
  if (prompt === null) return false;
  return (bank.items ?? []).some((item) => item.prompt === prompt && isSafetyTagged(item.tags));
}
