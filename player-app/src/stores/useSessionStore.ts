import { create } from 'zustand';

export type SessionPhase = 'notJoined' | 'joined';

export interface SessionState {
  phase: SessionPhase;
  sessionId: string | null;
  playerToken: string | null;
  nickname: string | null;
  setJoined: (joined: { sessionId: string; playerToken: string; nickname: string }) => void;
  /** A reload with a stored token: back in without re-joining; the rest arrives with the state. */
  resume: (playerToken: string) => void;
  reset: () => void;
}

const initial = {
  phase: 'notJoined',
  sessionId: null,
  playerToken: null,
  nickname: null,
} as const satisfies Partial<SessionState>;

/** The player's membership of a live session. Written by `src/realtime/`, read by components. */
export const useSessionStore = create<SessionState>()((set) => ({
  ...initial,
  setJoined: ({ sessionId, playerToken, nickname }) =>
    set({ phase: 'joined', sessionId, playerToken, nickname }),
  resume: (playerToken) => set({ phase: 'joined', playerToken }),
  reset: () => set(initial),
}));
