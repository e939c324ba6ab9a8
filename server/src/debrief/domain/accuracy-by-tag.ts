import { DebriefInputError } from './debrief-input';
import { Figure, NotComputedReason, computed, notComputed } from './figure';
import { mean } from './statistics';

export interface TaggedSession {
  sessionId: string;
  /** ISO 8601 timestamp. */
  endedAt: string;
  items: { tags: string[]; p: number | null }[];
}

export interface TagAccuracyPoint {
  sessionId: string;
  endedAt: string;
  /** Items with this tag in the session, answered or not. */
  itemCount: number;
  /** Unweighted mean p (0..1) of this tag's answered items. */
  accuracy: Figure;
}

export interface TagAccuracySeries {
  tag: string;
  /** Oldest first; only sessions that played an item with this tag. */
  points: TagAccuracyPoint[];
}

/** Code-unit order: the same on every server whatever its locale. */
function compareIds(a: string, b: string): number {
  if (a < b) return -1;
  return a > b ? 1 : 0;
}

function endedAtMs(session: TaggedSession): number {
  const ms = Date.parse(session.endedAt);
  if (Number.isNaN(ms)) {
    throw new DebriefInputError(`session "${session.sessionId}": endedAt "${session.endedAt}" is not a date`);
  }
  return ms;
}

function chronological(sessions: readonly TaggedSession[]): TaggedSession[] {
  const keyed = sessions.map((session) => ({ session, ms: endedAtMs(session) }));
  keyed.sort((a, b) => a.ms - b.ms || compareIds(a.session.sessionId, b.session.sessionId));
  return keyed.map(({ session }) => session);
}

/** Per tag (in code-unit order), the class's accuracy on that tag in each session, over time. */
export function accuracyByTag(sessions: readonly TaggedSession[]): TagAccuracySeries[] {
  const series = new Map<string, TagAccuracyPoint[]>();
  for (const session of chronological(sessions)) {
    const byTag = new Map<string, (number | null)[]>();
    for (const item of session.items) {
      for (const tag of new Set(item.tags)) byTag.set(tag, [...(byTag.get(tag) ?? []), item.p]);
    }
    for (const [tag, ps] of byTag) {
      const answered = ps.filter((p): p is number => p !== null);
      const point: TagAccuracyPoint = {
        sessionId: session.sessionId,
        endedAt: session.endedAt,
        itemCount: ps.length,
        accuracy:
          answered.length === 0 ? notComputed(NotComputedReason.nobodyAnswered) : computed(mean(answered)),
      };
      series.set(tag, [...(series.get(tag) ?? []), point]);
    }
  }
  return [...series.keys()]
    .sort(compareIds)
    .map((tag) => ({ tag, points: series.get(tag) ?? [] }));
}
