import type { ItemKey } from '@covalent/shared-types';
import { type CheckResult, NO_CREDIT, graded } from './check-result';

type OrderKey = Extract<ItemKey, { type: 'order' }>;

/** True when `candidate` holds exactly the ids of `reference`, each once. */
export function isPermutationOf(reference: readonly string[], candidate: readonly string[]): boolean {
  if (reference.length !== candidate.length) return false;
  const remaining = new Set(reference);
  if (remaining.size !== reference.length) return false;
  for (const id of candidate) {
    if (!remaining.delete(id)) return false;
  }
  return remaining.size === 0;
}

/**
 * Kendall tau distance: the number of pairs of steps placed in opposite relative order.
 * Both arguments must be permutations of each other (check with isPermutationOf); n ≤ 8, so O(n²) is fine.
 */
export function countDiscordantPairs(reference: readonly string[], response: readonly string[]): number {
  const rank = new Map(reference.map((id, index) => [id, index] as const));
  const ranks = response.map((id) => rank.get(id) ?? -1);
  let discordant = 0;
  for (let i = 0; i < ranks.length; i += 1) {
    for (let j = i + 1; j < ranks.length; j += 1) {
      if (ranks[i] > ranks[j]) discordant += 1;
    }
  }
  return discordant;
}

/** DESIGN §5: 1 − discordant pairs / all pairs. */
export function orderCredit(reference: readonly string[], response: readonly string[]): number {
  const n = reference.length;
  const pairs = (n * (n - 1)) / 2;
  if (pairs === 0) return 1;
  return 1 - countDiscordantPairs(reference, response) / pairs;
}

export function checkOrder(key: OrderKey, sequence: readonly string[]): CheckResult {
  if (key.sequence.length === 0 || new Set(key.sequence).size !== key.sequence.length) {
    return NO_CREDIT('invalid_key');
  }
  if (sequence.length === 0) return NO_CREDIT('no_answer');
  if (!isPermutationOf(key.sequence, sequence)) return NO_CREDIT('unparseable');
  return graded(orderCredit(key.sequence, sequence));
}
