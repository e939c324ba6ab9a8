import { create } from 'zustand';

/**
 * `connecting`: first connection; `reconnecting`: the socket dropped after being connected;
 * `refused`: the server turned the token away (ended session, bad token).
 */
export type ConnectionStatus = 'idle' | 'connecting' | 'connected' | 'reconnecting' | 'refused';

export interface ConnectionData {
  status: ConnectionStatus;
  /** Server clock minus this device's clock, in ms (see `realtime/clockOffset.ts`). */
  offsetMs: number;
  /** Round trip of the sample the offset came from; null while only estimated. */
  offsetRoundTripMs: number | null;
  refusedMessage: string | null;
}

export interface ConnectionState extends ConnectionData {
  setStatus: (status: ConnectionStatus) => void;
  setOffset: (offsetMs: number, roundTripMs: number | null) => void;
  setRefused: (message: string) => void;
  reset: () => void;
}

const initial: ConnectionData = {
  status: 'idle',
  offsetMs: 0,
  offsetRoundTripMs: null,
  refusedMessage: null,
};

/** The socket's health and the measured clock offset. Written only by `src/realtime/`. */
export const useConnectionStore = create<ConnectionState>()((set) => ({
  ...initial,
  setStatus: (status) => set({ status }),
  setOffset: (offsetMs, offsetRoundTripMs) => set({ offsetMs, offsetRoundTripMs }),
  setRefused: (refusedMessage) => set({ status: 'refused', refusedMessage }),
  reset: () => set(initial),
}));
