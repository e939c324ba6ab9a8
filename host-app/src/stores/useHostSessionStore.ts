import type { HostSessionView } from '@covalent/shared-types';
import { create } from 'zustand';

/** Where the host screen's socket stands. */
export type HostConnectionStatus = 'idle' | 'connecting' | 'connected' | 'reconnecting' | 'failed';

export interface HostSessionState {
  sessionId: string | null;
  status: HostConnectionStatus;
  /** Why the connection failed (e.g. a protocol mismatch), in a sentence. */
  statusMessage: string | null;
  view: HostSessionView | null;
  /** serverClock − clientClock (ms), from the best `clock:sync` sample. */
  clockOffsetMs: number;
  /** The last refused command's message, until the next command. */
  commandError: string | null;
  /** A command awaiting its ack, so buttons can show it is on its way. */
  pendingCommand: string | null;

  begin: (sessionId: string) => void;
  setStatus: (status: HostConnectionStatus, message?: string | null) => void;
  setView: (view: HostSessionView) => void;
  setClockOffset: (offsetMs: number) => void;
  setPending: (command: string | null) => void;
  setCommandError: (message: string | null) => void;
  reset: () => void;
}

const initial = {
  sessionId: null,
  status: 'idle',
  statusMessage: null,
  view: null,
  clockOffsetMs: 0,
  commandError: null,
  pendingCommand: null,
} as const satisfies Partial<HostSessionState>;

/** The live session on the host screen. Written only by `src/realtime/`; components read it by selector. */
export const useHostSessionStore = create<HostSessionState>()((set) => ({
  ...initial,
  begin: (sessionId) => set({ ...initial, sessionId, status: 'connecting' }),
  setStatus: (status, message = null) => set({ status, statusMessage: message }),
  // A view of another session (a late push after switching) is ignored.
  setView: (view) => set((s) => (s.sessionId && view.session.id !== s.sessionId ? s : { view })),
  setClockOffset: (clockOffsetMs) => set({ clockOffsetMs }),
  setPending: (pendingCommand) => set({ pendingCommand }),
  setCommandError: (commandError) => set({ commandError }),
  reset: () => set(initial),
}));
