import type { Ack, HostCommand, HostSessionView } from '@covalent/shared-types';
import { useHostSessionStore } from '@/stores/useHostSessionStore';
import { bestClockSample, clockSample, type ClockSample } from './clockOffset';
import type { HostSocket } from './HostSocket';

export type HostSocketFactory = (sessionId: string) => HostSocket;

export interface HostConnectionOptions {
  sessionId: string;
  createSocket: HostSocketFactory;
  /** The client clock; injected so tests can drive it. */
  now?: () => number;
  /** How many `clock:sync` exchanges to run on each connect. */
  clockSamples?: number;
  ackTimeoutMs?: number;
}

type ViewAck = Ack<{ view: HostSessionView }>;

const TIMEOUT_ACK = {
  ok: false,
  error: 'ack_timeout',
  message: 'The server did not answer in time. Check the connection and try again.',
} as const;
const NOT_CONNECTED_ACK = { ok: false, error: 'not_connected', message: 'The host screen is not connected yet.' } as const;

function connectErrorMessage(error: Error & { data?: unknown }): string | null {
  const data = error.data as { message?: unknown } | undefined;
  return typeof data?.message === 'string' ? data.message : null;
}

/**
 * The host screen's one socket. It registers every listener and writes what arrives into
 * `useHostSessionStore`; components only read the store and call the commands in `./hostSession`.
 */
export class HostConnection {
  private socket: HostSocket | null = null;
  private readonly store = useHostSessionStore.getState;
  private readonly now: () => number;
  private readonly clockSamples: number;
  private readonly ackTimeoutMs: number;

  constructor(private readonly options: HostConnectionOptions) {
    this.now = options.now ?? (() => Date.now());
    this.clockSamples = options.clockSamples ?? 5;
    this.ackTimeoutMs = options.ackTimeoutMs ?? 8000;
  }

  start(): void {
    const { sessionId, createSocket } = this.options;
    this.store().begin(sessionId);
    const socket = createSocket(sessionId);
    this.socket = socket;

    socket.on('connect', () => {
      this.store().setStatus('connected');
      void this.syncClock();
      void this.resync();
    });
    socket.on('disconnect', () => this.store().setStatus('reconnecting', 'Connection lost. Reconnecting…'));
    socket.on('connect_error', (error) => {
      // A refusal from the server (not signed in, not your session, old protocol) carries a message
      // and is final; anything else is the network, and socket.io keeps retrying.
      const refusal = connectErrorMessage(error);
      if (refusal) this.store().setStatus('failed', refusal);
      else this.store().setStatus('reconnecting', 'Trying to reach the Covalent server…');
    });
    socket.on('host:state', (view) => this.store().setView(view));
  }

  stop(): void {
    this.socket?.disconnect();
    this.socket = null;
  }

  /** Sends one host command; a successful ack carries the new view. */
  async send(command: HostCommand): Promise<ViewAck> {
    const store = this.store();
    store.setPending(command.type);
    store.setCommandError(null);
    const ack = await this.ask<ViewAck>((done) => this.socket?.emit('host:command', command, done));
    this.store().setPending(null);
    if (ack.ok) this.store().setView(ack.view);
    else this.store().setCommandError(ack.message);
    return ack;
  }

  /** Asks for the full view again (after a reconnect). */
  async resync(): Promise<void> {
    const ack = await this.ask<ViewAck>((done) => this.socket?.emit('session:resync', {}, done));
    if (ack.ok) this.store().setView(ack.view);
  }

  /** Runs a few NTP-style exchanges one after another and keeps the lowest-round-trip offset. */
  async syncClock(): Promise<ClockSample | null> {
    const samples: ClockSample[] = [];
    for (let i = 0; i < this.clockSamples; i += 1) {
      const t0 = this.now();
      const ack = await this.ask<Ack<{ t0: number; serverNow: number }>>((done) =>
        this.socket?.emit('clock:sync', { t0 }, done),
      );
      if (!ack.ok) continue;
      samples.push(clockSample(t0, ack.serverNow, this.now()));
    }
    const best = bestClockSample(samples);
    if (best) this.store().setClockOffset(best.offsetMs);
    return best;
  }

  private ask<T>(emit: (done: (ack: T) => void) => unknown): Promise<T | typeof TIMEOUT_ACK | typeof NOT_CONNECTED_ACK> {
    if (!this.socket) return Promise.resolve(NOT_CONNECTED_ACK);
    return new Promise((resolve) => {
      const timer = setTimeout(() => resolve(TIMEOUT_ACK), this.ackTimeoutMs);
      emit((ack) => {
        clearTimeout(timer);
        resolve(ack);
      });
    });
  }
}
