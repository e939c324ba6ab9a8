import type { Acceptance, SessionState } from '../domain';

/**
 * PostgreSQL jsonb cannot hold U+0000, and the engine keys its acceptances by
 * `${playerId}\u0000${clientMessageId}`. Stored snapshots keep the acceptances as
 * a list; loading rebuilds the engine's keys from each acceptance's own fields.
 */
export interface StoredSnapshot extends Omit<SessionState, 'acceptances'> {
  acceptances: Acceptance[] | Record<string, Acceptance>;
}

export function encodeSnapshot(state: Readonly<SessionState>): StoredSnapshot {
  return { ...state, acceptances: Object.values(state.acceptances) };
}

export function decodeSnapshot(stored: StoredSnapshot): SessionState {
  const list = Array.isArray(stored.acceptances) ? stored.acceptances : Object.values(stored.acceptances);
  return { ...stored, acceptances: Object.fromEntries(list.map((a) => [`${a.playerId}\u0000${a.clientMessageId}`, a])) };
}
