import type { VoteLogEntry } from './types';

/**
 * The team answer of a huddle: the choice with most votes; on a tie, the choice
 * that reached that count first. "Reached" is the moment since which it has held
 * the count without interruption (a choice that dropped and came back re-reaches it).
 * Returns the canonical choice, or null when nobody voted.
 */
export function pluralityChoice(log: readonly VoteLogEntry[]): string | null {
  const count = new Map<string, number>();
  // riseSeq.get(c)[k-1] = seq at which c last rose from k−1 to k votes.
  const riseSeq = new Map<string, number[]>();
  for (const entry of [...log].sort((a, b) => a.seq - b.seq)) {
    if (entry.from === entry.to) continue;
    if (entry.from !== null) {
      count.set(entry.from, (count.get(entry.from) ?? 0) - 1);
      riseSeq.get(entry.from)?.pop();
    }
    count.set(entry.to, (count.get(entry.to) ?? 0) + 1);
    const rises = riseSeq.get(entry.to) ?? [];
    rises.push(entry.seq);
    riseSeq.set(entry.to, rises);
  }
  let best: { choice: string; votes: number; since: number } | null = null;
  for (const [choice, votes] of count) {
    if (votes <= 0) continue;
    const since = riseSeq.get(choice)?.[votes - 1] ?? Number.POSITIVE_INFINITY;
    if (!best || votes > best.votes || (votes === best.votes && since < best.since)) {
      best = { choice, votes, since };
    }
  }
  return best?.choice ?? null;
}
