import { createServer, Server, Socket, connect } from 'node:net';
import { AddressInfo } from 'node:net';

/**
 * A small TCP fault proxy of our own, for loopback fault tests: no network emulator (netem) is
 * available here. Every client connection gets a fault profile that can change while it runs.
 */
export interface FaultProfile {
  /** Added one-way delay per chunk, in ms. */
  delayMs: number;
  /** Uniform jitter ± this many ms around the delay (order within a connection is kept). */
  jitterMs: number;
  /** Chance of closing the connection abruptly on each chunk (0..1). */
  resetChance: number;
  /** While true, chunks are held (not lost) and nothing flows: a network black hole. */
  blackhole: boolean;
}

export const CLEAN: FaultProfile = { delayMs: 0, jitterMs: 0, resetChance: 0, blackhole: false };

interface Pipe {
  id: number;
  client: Socket;
  upstream: Socket;
  profile: FaultProfile;
  /** The time the last chunk in each direction is due, so jitter never reorders bytes. */
  due: { up: number; down: number };
  held: { dir: 'up' | 'down'; chunk: Buffer }[];
}

export class FaultProxy {
  private server: Server | null = null;
  private readonly pipes = new Map<number, Pipe>();
  private nextId = 1;
  /** Profile for connections opened from now on; `assign` can pick one per connection. */
  defaultProfile: FaultProfile = { ...CLEAN };
  /** Chooses the profile of a new connection by its sequence number (e.g. a fifth of them). */
  assign: ((connectionNumber: number) => FaultProfile) | null = null;
  port = 0;

  constructor(
    private readonly targetPort: number,
    private readonly rng: () => number = Math.random,
    private readonly targetHost = '127.0.0.1',
  ) {}

  async listen(port = 0): Promise<number> {
    this.server = createServer((client) => this.accept(client));
    await new Promise<void>((resolve) => this.server!.listen(port, '127.0.0.1', resolve));
    this.port = (this.server.address() as AddressInfo).port;
    return this.port;
  }

  get connections(): number {
    return this.pipes.size;
  }

  /** Changes the profile of every open connection matching `filter` (all by default). */
  setProfile(profile: Partial<FaultProfile>, filter: (connectionNumber: number) => boolean = () => true): void {
    for (const pipe of this.pipes.values()) {
      if (!filter(pipe.id)) continue;
      const wasHoled = pipe.profile.blackhole;
      pipe.profile = { ...pipe.profile, ...profile };
      if (wasHoled && !pipe.profile.blackhole) this.release(pipe);
    }
  }

  /** Resets (RST) every open connection matching `filter`. */
  resetConnections(filter: (connectionNumber: number) => boolean = () => true): number {
    let n = 0;
    for (const pipe of [...this.pipes.values()]) {
      if (filter(pipe.id)) {
        this.destroy(pipe, true);
        n++;
      }
    }
    return n;
  }

  async close(): Promise<void> {
    for (const pipe of [...this.pipes.values()]) this.destroy(pipe, false);
    if (this.server) await new Promise<void>((resolve) => this.server!.close(() => resolve()));
  }

  private accept(client: Socket): void {
    const id = this.nextId++;
    const upstream = connect(this.targetPort, this.targetHost);
    const profile = this.assign ? this.assign(id) : { ...this.defaultProfile };
    const pipe: Pipe = { id, client, upstream, profile, due: { up: 0, down: 0 }, held: [] };
    this.pipes.set(id, pipe);
    client.setNoDelay(true);
    upstream.setNoDelay(true);
    client.on('data', (chunk) => this.forward(pipe, 'up', chunk));
    upstream.on('data', (chunk) => this.forward(pipe, 'down', chunk));
    const end = () => this.destroy(pipe, false);
    client.on('close', end);
    upstream.on('close', end);
    client.on('error', end);
    upstream.on('error', end);
  }

  private forward(pipe: Pipe, dir: 'up' | 'down', chunk: Buffer): void {
    if (!this.pipes.has(pipe.id)) return;
    const p = pipe.profile;
    if (p.resetChance > 0 && this.rng() < p.resetChance) {
      this.destroy(pipe, true);
      return;
    }
    if (p.blackhole) {
      pipe.held.push({ dir, chunk });
      return;
    }
    const jitter = p.jitterMs ? (this.rng() * 2 - 1) * p.jitterMs : 0;
    const wanted = Date.now() + Math.max(0, p.delayMs + jitter);
    const at = Math.max(wanted, pipe.due[dir]);
    pipe.due[dir] = at;
    const target = dir === 'up' ? pipe.upstream : pipe.client;
    const send = () => {
      if (this.pipes.has(pipe.id) && !target.destroyed) target.write(chunk);
    };
    const wait = at - Date.now();
    if (wait <= 0) send();
    else setTimeout(send, wait);
  }

  private release(pipe: Pipe): void {
    const held = pipe.held.splice(0);
    for (const { dir, chunk } of held) this.forward(pipe, dir, chunk);
  }

  private destroy(pipe: Pipe, reset: boolean): void {
    if (!this.pipes.delete(pipe.id)) return;
    if (reset) {
      pipe.client.resetAndDestroy();
      pipe.upstream.resetAndDestroy();
    } else {
      pipe.client.destroy();
      pipe.upstream.destroy();
    }
  }
}
