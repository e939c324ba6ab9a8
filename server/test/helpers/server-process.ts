import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import * as path from 'node:path';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { dataSourceOptions } from '../../src/database/data-source';
import type { UserEntity } from '../../src/users/entities/user.entity';
import { itemInputs, makeSchool, makeUser, PASSWORD, sessionRequest } from './factories';

/** The built server (the test script builds it before the suites run). */
export const SERVER_MAIN = path.resolve(__dirname, '../../dist/main.js');

/** A free loopback port, found by letting the OS pick one and releasing it. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => resolve(port));
    });
  });
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/**
 * The real server as a child process on a fixed port, so it can be killed with
 * SIGKILL and started again on the same port (what a crash and a supervisor do).
 */
export class ServerProcess {
  private child: ChildProcess | null = null;
  private exit: Promise<{ code: number | null; signal: NodeJS.Signals | null }> | null = null;
  /** The last lines the server printed (for failure messages). */
  readonly output: string[] = [];
  /** Exits nobody asked for (a crash), with the tail of the output. */
  readonly crashes: string[] = [];
  private expectingExit = false;

  private constructor(
    readonly port: number,
    private readonly env: Record<string, string>,
  ) {}

  get url(): string {
    return `http://127.0.0.1:${this.port}`;
  }

  get pid(): number | undefined {
    return this.child?.pid;
  }

  get running(): boolean {
    return this.child !== null && this.child.exitCode === null && this.child.signalCode === null;
  }

  /**
   * Starts the built server on a free port (or `opts.port`, for a peer that must know it first,
   * like a sign-on provider's redirect URI) and waits until /api/health answers 200.
   */
  static async start(extraEnv: Record<string, string> = {}, opts: { port?: number } = {}): Promise<ServerProcess> {
    if (!existsSync(SERVER_MAIN)) {
      throw new Error(`${SERVER_MAIN} is missing: build the server first (cd server && npx tsc -p tsconfig.build.json).`);
    }
    const databaseUrl = process.env.DATABASE_URL;
    if (!databaseUrl) throw new Error('DATABASE_URL is not set: run the suites through `npm test`.');
    const port = opts.port ?? (await freePort());
    // Nothing listens on this port: mail sending fails, which no fault suite needs.
    const smtpPort = await freePort();
    const sp = new ServerProcess(port, {
      PATH: process.env.PATH ?? '',
      NODE_ENV: 'test',
      DATABASE_URL: databaseUrl,
      APP_SECRET: process.env.APP_SECRET ?? 'test-secret-test-secret-test-secret-0123',
      HOST: '127.0.0.1',
      PORT: String(port),
      PUBLIC_URL: `http://127.0.0.1:${port}`,
      LOG_LEVEL: 'warn',
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtpPort),
      ...extraEnv,
    });
    await sp.spawn();
    return sp;
  }

  private async spawn(): Promise<void> {
    this.expectingExit = false;
    const child = spawn(process.execPath, [SERVER_MAIN], { env: this.env, stdio: ['ignore', 'pipe', 'pipe'] });
    this.child = child;
    const keep = (chunk: Buffer) => {
      for (const line of chunk.toString().split('\n')) if (line.trim()) this.output.push(line);
      if (this.output.length > 200) this.output.splice(0, this.output.length - 200);
    };
    child.stdout!.on('data', keep);
    child.stderr!.on('data', keep);
    this.exit = new Promise((resolve) =>
      child.once('exit', (code, signal) => {
        if (!this.expectingExit) this.crashes.push(`exit code=${code} signal=${signal}\n${this.output.slice(-30).join('\n')}`);
        resolve({ code, signal });
      }),
    );
    await this.waitHealthy(20_000);
  }

  /** Polls /api/health until 200; fails early if the process exits. */
  async waitHealthy(timeoutMs = 20_000): Promise<void> {
    const end = Date.now() + timeoutMs;
    for (;;) {
      if (!this.running) throw new Error(`the server exited while starting:\n${this.output.slice(-30).join('\n')}`);
      const status = await this.health();
      if (status === 200) return;
      if (Date.now() > end) throw new Error(`/api/health not 200 within ${timeoutMs} ms (last: ${status}):\n${this.output.slice(-30).join('\n')}`);
      await sleep(100);
    }
  }

  /** The status of GET /api/health, or 0 when nothing answers. */
  async health(): Promise<number> {
    try {
      const res = await fetch(`${this.url}/api/health`, { signal: AbortSignal.timeout(2000) });
      return res.status;
    } catch {
      return 0;
    }
  }

  /** Sends a signal and waits for the process to exit. */
  async kill(signal: NodeJS.Signals = 'SIGKILL'): Promise<void> {
    if (!this.child || !this.running) return;
    this.expectingExit = true;
    this.child.kill(signal);
    await this.exit;
  }

  /** Starts the server again on the same port. */
  async restart(): Promise<void> {
    await this.kill('SIGKILL');
    await this.spawn();
  }

  /** A clean stop (SIGTERM: the shutdown hooks run). */
  async stop(): Promise<void> {
    if (!this.child || !this.running) return;
    this.expectingExit = true;
    this.child.kill('SIGTERM');
    const timer = setTimeout(() => this.child?.kill('SIGKILL'), 5000);
    await this.exit;
    clearTimeout(timer);
  }
}

/** A TypeORM connection of the test's own to the server's database (for set-up and for the checkers). */
export async function openDatabase(): Promise<DataSource> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: run the suites through `npm test`.');
  return new DataSource({ ...dataSourceOptions(url, 4), migrations: [] }).initialize();
}

export interface LiveFixture {
  teacher: UserEntity;
  /** The teacher's sign-in cookie, for the host namespace. */
  cookie: string;
  sessionId: string;
  joinCode: string;
  items: { id: string; type: string; options: { id: string; text: string }[]; key: any }[];
  players: { playerId: string; token: string; nickname: string }[];
}

/**
 * A teacher, a bank of `itemCount` single-choice items and a session with `nicknames` joined,
 * all made through the running server's REST API.
 */
export async function setUpSession(
  server: { url: string },
  db: DataSource,
  nicknames: string[],
  overrides: Record<string, unknown> = {},
  itemCount = 2,
): Promise<LiveFixture> {
  const school = await makeSchool(db);
  const teacher = await makeUser(db, school);
  const agent = request.agent(server.url);
  const signIn = await agent.post('/api/auth/sign-in').send({ email: teacher.email, password: PASSWORD }).expect(200);
  const cookie = ([] as string[])
    .concat(signIn.headers['set-cookie'] ?? [])
    .map((c) => c.split(';')[0])
    .join('; ');
  const bank = (await agent.post('/api/banks').send({ title: 'Fume cupboard checks' }).expect(201)).body;
  const items = [];
  for (let i = 0; i < itemCount; i++) items.push((await agent.post(`/api/banks/${bank.id}/items`).send(itemInputs.single()).expect(201)).body);
  const session = (await agent.post('/api/sessions').send(sessionRequest(bank.id, overrides)).expect(201)).body;
  const players = [];
  for (const nickname of nicknames) {
    const res = await request(server.url).post('/api/play/join').send({ code: session.joinCode, nickname }).expect(201);
    players.push({ playerId: res.body.playerId as string, token: res.body.playerToken as string, nickname });
  }
  return { teacher, cookie, sessionId: session.id, joinCode: session.joinCode, items, players };
}
