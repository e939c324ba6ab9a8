import {
  PROTOCOL_VERSION,
  type ItemResponse,
  type PlayerServerEvents,
  type SubmitAnswerPayload,
} from '@covalent/shared-types';
import { useConnectionStore } from '@/stores/useConnectionStore';
import { useGameStore } from '@/stores/useGameStore';
import { useSessionStore } from '@/stores/useSessionStore';
import { bestClockSample, clockSample, type ClockSample } from './clockOffset';
import { clearPlayerToken } from './playerTokenStorage';
import {
  createSocketIoTransport,
  type CommandAck,
  type CommandName,
  type CommandPayload,
  type PlayerSocketTransport,
  type SocketFactory,
} from './socketTransport';

export interface PlayerSocketOptions {
  createSocket?: SocketFactory;
  /** This device's clock, in ms since the epoch. */
  now?: () => number;
  newMessageId?: () => string;
  ackTimeoutMs?: number;
  /** Clock samples taken after each (re)connect; the lowest round trip wins. */
  clockSamples?: number;
}

export interface CommandFailure {
  ok: false;
  error: string;
  message: string;
}

// Client-side failures use the server's ack shape so the UI has one path.
export const TIMED_OUT: CommandFailure = {
  ok: false,
  error: 'timeout',
  message: "The server didn't answer in time. Check your Wi-Fi and try again.",
};
export const NOT_CONNECTED: CommandFailure = {
  ok: false,
  error: 'not_connected',
  message: 'Not connected yet. Wait a moment and try again.',
};
const BAD_ACK: CommandFailure = {
  ok: false,
  error: 'bad_response',
  message: 'Something went wrong on our side. Try again in a moment.',
};
const REFUSED_MESSAGE = "We couldn't get you back into that session. Join again with the code on the board.";

type ServerListeners = { [E in keyof PlayerServerEvents]: PlayerServerEvents[E] };

function randomMessageId(): string {
  if (typeof crypto !== 'undefined' && typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  return `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`;
}

function isAck(value: unknown): value is { ok: boolean } {
  return typeof value === 'object' && value !== null && typeof (value as { ok?: unknown }).ok === 'boolean';
}

function refusalMessage(error: Error & { data?: unknown }): string {
  const data = error.data as { message?: unknown } | undefined;
  return typeof data?.message === 'string' && data.message !== '' ? data.message : REFUSED_MESSAGE;
}

/**
 * The player app's one socket: connects with the player token, registers every listener,
 * writes what arrives into the stores, and sends commands with an ack timeout and one retry.
 */
export class PlayerSocket {
  private readonly createSocket: SocketFactory;
  private readonly now: () => number;
  private readonly newMessageId: () => string;
  private readonly ackTimeoutMs: number;
  private readonly clockSamples: number;

  private socket: PlayerSocketTransport | null = null;
  private token: string | null = null;
  private everConnected = false;
  /** Bumped on every connect/disconnect so a slow factory cannot resurrect an old socket. */
  private generation = 0;
  /** The last answer that timed out twice: sending the same answer again reuses its id. */
  private timedOutAnswer: { key: string; clientMessageId: string } | null = null;

  constructor(options: PlayerSocketOptions = {}) {
    this.createSocket = options.createSocket ?? createSocketIoTransport;
    this.now = options.now ?? (() => Date.now());
    this.newMessageId = options.newMessageId ?? randomMessageId;
    this.ackTimeoutMs = options.ackTimeoutMs ?? 5000;
    this.clockSamples = options.clockSamples ?? 5;
  }

  async connect(token: string): Promise<void> {
    if (this.token === token && this.socket) return;
    this.disconnect();
    this.token = token;
    const generation = ++this.generation;
    useConnectionStore.getState().setStatus('connecting');
    let socket: PlayerSocketTransport;
    try {
      socket = await this.createSocket({ token, protocolVersion: PROTOCOL_VERSION });
    } catch {
      // The socket.io chunk failed to load (offline mid-reload): nothing to retry with.
      if (generation === this.generation) this.refuse("Couldn't reach Covalent. Check your Wi-Fi and reload.");
      return;
    }
    if (generation !== this.generation) {
      socket.disconnect();
      return;
    }
    this.socket = socket;
    this.register(socket);
    socket.connect();
  }

  /** Closes the socket for good (leaving, removed, refused). Stores are left to the caller. */
  disconnect(): void {
    this.generation++;
    const socket = this.socket;
    this.socket = null;
    this.token = null;
    this.everConnected = false;
    this.timedOutAnswer = null;
    socket?.disconnect();
  }

  /** Sends an answer (or a huddle vote). A resend of the same answer keeps its clientMessageId. */
  async submitAnswer(
    roundIndex: number,
    response: ItemResponse,
    lock?: boolean,
  ): Promise<CommandAck<'answer:submit'>> {
    const key = JSON.stringify([roundIndex, response, lock ?? null]);
    const clientMessageId =
      this.timedOutAnswer?.key === key ? this.timedOutAnswer.clientMessageId : this.newMessageId();
    const payload: SubmitAnswerPayload = { clientMessageId, roundIndex, response };
    if (lock !== undefined) payload.lock = lock;
    const ack = await this.send('answer:submit', payload);
    this.timedOutAnswer = ack === TIMED_OUT ? { key, clientMessageId } : null;
    if (ack.ok) useGameStore.getState().setYourAnswer(roundIndex, { response, locked: ack.locked });
    return ack;
  }

  async lockAnswer(roundIndex: number): Promise<CommandAck<'answer:lock'>> {
    const ack = await this.send('answer:lock', { roundIndex });
    if (ack.ok) useGameStore.getState().markLocked(roundIndex);
    return ack;
  }

  async resync(): Promise<CommandAck<'session:resync'>> {
    const ack = await this.send('session:resync', {});
    if (ack.ok) useGameStore.getState().applySessionState(ack.view);
    return ack;
  }

  /** Takes `clockSamples` NTP-style samples one after another and keeps the lowest round trip. */
  async syncClock(): Promise<void> {
    const socket = this.socket;
    if (!socket) return;
    const samples: ClockSample[] = [];
    for (let i = 0; i < this.clockSamples && this.socket === socket; i++) {
      const t0 = this.now();
      try {
        const ack = await socket.timeout(this.ackTimeoutMs).emitWithAck('clock:sync', { t0 });
        const t3 = this.now();
        if (isAck(ack) && ack.ok && ack.t0 === t0) samples.push(clockSample(t0, ack.serverNow, t3));
      } catch {
        // A lost sample is skipped; the others still count.
      }
    }
    const best = bestClockSample(samples);
    if (best && this.socket === socket) useConnectionStore.getState().setOffset(best.offsetMs, best.roundTripMs);
  }

  /** One attempt, and one retry with the identical payload when the ack times out. */
  private async send<E extends CommandName>(
    event: E,
    payload: CommandPayload<E>,
  ): Promise<CommandAck<E> | CommandFailure> {
    const socket = this.socket;
    if (!socket) return NOT_CONNECTED;
    for (let attempt = 0; attempt < 2; attempt++) {
      try {
        const ack = await socket.timeout(this.ackTimeoutMs).emitWithAck(event, payload);
        return isAck(ack) ? ack : BAD_ACK;
      } catch {
        // socket.io rejects on timeout; try once more.
      }
    }
    return TIMED_OUT;
  }

  private refuse(message: string): void {
    this.disconnect();
    clearPlayerToken();
    useSessionStore.getState().reset();
    useGameStore.getState().reset();
    useConnectionStore.getState().setRefused(message);
  }

  private register(socket: PlayerSocketTransport): void {
    const live = () => this.socket === socket;
    const connection = useConnectionStore.getState;
    const game = useGameStore.getState;

    socket.on('connect', () => {
      if (!live()) return;
      const reconnected = this.everConnected;
      this.everConnected = true;
      connection().setStatus('connected');
      void this.syncClock();
      // The server pushes `session:state` on connect; after a drop, ask for it explicitly too.
      if (reconnected) void this.resync();
    });
    socket.on('disconnect', (reason) => {
      if (!live()) return;
      connection().setStatus(this.everConnected ? 'reconnecting' : 'connecting');
      // socket.io does not retry after a server-side disconnect; the handshake decides again.
      if (reason === 'io server disconnect') socket.connect();
    });
    socket.on('connect_error', (error) => {
      if (!live()) return;
      // `active` false: the server's middleware refused the handshake, so retrying is pointless.
      if (!socket.active) this.refuse(refusalMessage(error));
    });

    const listeners: ServerListeners = {
      'session:state': (view) => {
        game().applySessionState(view);
        // Until a clock sample lands, a zero-latency estimate beats assuming equal clocks.
        if (connection().offsetRoundTripMs === null) connection().setOffset(view.serverNow - this.now(), null);
      },
      'round:opened': (payload) => game().applyRoundOpened(payload),
      'round:timing': (timing) => game().applyTiming(timing),
      'round:votes': (payload) => game().applyVotes(payload),
      'round:call': (payload) => game().applyCall(payload),
      'round:closed': (payload) => game().applyClosed(payload),
      'round:revealed': (reveal) => game().applyRevealed(reveal),
      'standings:update': (payload) => game().applyStandings(payload),
      'session:status': ({ status }) => game().applyStatus(status),
      'player:removed': ({ message }) => {
        game().applyRemoved(message);
        clearPlayerToken();
        this.disconnect();
        connection().setStatus('idle');
      },
    };
    for (const event of Object.keys(listeners) as (keyof ServerListeners)[]) {
      socket.on(event, (...args: unknown[]) => {
        if (live()) (listeners[event] as (...a: unknown[]) => void)(...args);
      });
    }
  }
}
