import { create } from 'zustand';

export type SessionPhase = 'notJoined' | 'joined';

export interface SessionState {
  phase: SessionPhase;
  sessionId: string | null;
  playerToken: string | null;
  nickname: string | null;
  setJoined: (joined: { sessionId: string; playerToken: string; nickname: string }) => void;
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
  reset: () => set(initial),
}));
