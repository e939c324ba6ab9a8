import { configureRealtime, PlayerSocket, type PlayerSocketTransport } from '@/realtime';

type Handler = (...args: unknown[]) => void;
type Responder = (payload: unknown) => unknown;

/** What `emitWithAck` should do for one call: answer, or time out (reject). */
export const TIME_OUT = Symbol('time out');

export interface EmittedCommand {
  event: string;
  payload: unknown;
  timeoutMs: number;
}

/**
 * A socket.io client stand-in: records commands, answers them from per-event responders, and
 * lets a test play the server's side with `serverEmit`. No network.
 */
export class FakeSocket {
  active = true;
  connectCalls = 0;
  disconnected = false;
  readonly emitted: EmittedCommand[] = [];
  private readonly handlers = new Map<string, Set<Handler>>();
  private readonly responders = new Map<string, Responder[]>();
  private readonly defaults = new Map<string, Responder>();

  constructor(options: { serverOffsetMs?: number; now?: () => number } = {}) {
    const offset = options.serverOffsetMs ?? 0;
    const now = options.now ?? (() => 0);
    this.defaults.set('clock:sync', (p) => ({ ok: true, t0: (p as { t0: number }).t0, serverNow: now() + offset }));
  }

  asTransport(): PlayerSocketTransport {
    return this as unknown as PlayerSocketTransport;
  }

  on(event: string, handler: Handler): this {
    let set = this.handlers.get(event);
    if (!set) this.handlers.set(event, (set = new Set()));
    set.add(handler);
    return this;
  }

  connect(): this {
    this.connectCalls++;
    return this;
  }

  disconnect(): this {
    this.disconnected = true;
    return this;
  }

  timeout(timeoutMs: number) {
    return {
      emitWithAck: (event: string, payload: unknown): Promise<unknown> => {
        this.emitted.push({ event, payload: structuredClone(payload), timeoutMs });
        const responder = this.responders.get(event)?.shift() ?? this.defaults.get(event);
        if (!responder) return new Promise(() => undefined); // the server never answers
        return Promise.resolve().then(() => {
          const result = responder(payload);
          if (result === TIME_OUT) throw new Error('operation has timed out');
          return result;
        });
      },
    };
  }

  /** Queues answers for the next calls of `event`, in order; `TIME_OUT` simulates a lost ack. */
  respond(event: string, ...answers: (unknown | Responder)[]): this {
    const list = this.responders.get(event) ?? [];
    for (const answer of answers) list.push(typeof answer === 'function' ? (answer as Responder) : () => answer);
    this.responders.set(event, list);
    return this;
  }

  /** Sets the answer to every call of `event` without a queued one. */
  respondAlways(event: string, responder: Responder): this {
    this.defaults.set(event, responder);
    return this;
  }

  serverEmit(event: string, ...args: unknown[]): void {
    for (const handler of this.handlers.get(event) ?? []) handler(...args);
  }

  commands(event: string): unknown[] {
    return this.emitted.filter((e) => e.event === event).map((e) => e.payload);
  }
}

/** A `PlayerSocket` wired to a fresh fake, connected; message ids are m-1, m-2, … */
export async function connectedFake(
  options: { serverOffsetMs?: number; now?: () => number; clockSamples?: number; token?: string } = {},
) {
  const fake = new FakeSocket(options);
  let id = 0;
  const socket = new PlayerSocket({
    createSocket: async () => fake.asTransport(),
    now: options.now ?? (() => 0),
    newMessageId: () => `m-${++id}`,
    clockSamples: options.clockSamples ?? 5,
  });
  await socket.connect(options.token ?? 'tok-1');
  fake.serverEmit('connect');
  await flush();
  return { fake, socket };
}

/** Lets queued promise callbacks (fake acks) run. */
export async function flush(times = 10): Promise<void> {
  for (let i = 0; i < times; i++) await Promise.resolve();
}

/** Installs a fake-backed `PlayerSocket` as the app's socket; the fake is created on connect. */
export function installFakeSocket(options: { now?: () => number } = {}) {
  const now = options.now ?? (() => Date.now());
  const fake = new FakeSocket({ now });
  const tokens: string[] = [];
  let id = 0;
  const socket = new PlayerSocket({
    createSocket: async (auth) => {
      tokens.push(auth.token);
      return fake.asTransport();
    },
    now,
    newMessageId: () => `m-${++id}`,
    clockSamples: 1,
  });
  configureRealtime({ socket });
  return { fake, socket, tokens };
}
