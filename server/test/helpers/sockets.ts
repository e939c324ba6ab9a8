import { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { NAMESPACES, PROTOCOL_VERSION } from '@covalent/shared-types';
import type { AddressInfo } from 'node:net';
import { io, type Socket } from 'socket.io-client';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { AppModule } from '../../src/app.module';
import { configureApp } from '../../src/app.setup';
import { MailCatcher, startMailCatcher } from '../../src/mail/dev/mail-catcher';
import { JoinAttemptLimiter } from '../../src/sessions/join-rate-limit.guard';
import { SessionsModule } from '../../src/sessions/sessions.module';
import {
  DEFAULT_PLAY_RATE_LIMIT,
  DEFAULT_SESSION_TUNING,
  PLAY_RATE_LIMIT,
  SESSION_CLOCK,
  SESSION_TUNING,
  type PlayRateLimit,
  type SessionTuning,
} from '../../src/sessions/sessions.constants';
import type { UserEntity } from '../../src/users/entities/user.entity';
import { PASSWORD } from './factories';
import { FakeClock } from './test-app';

export interface LiveApp {
  app: INestApplication;
  db: DataSource;
  url: string;
  /** The live runtime's clock: tests step it past deadlines. */
  clock: FakeClock;
  limiter: JoinAttemptLimiter;
  /** Closes the app without ending any session (what a crash leaves behind, minus the crash). */
  close(): Promise<void>;
}

export interface LiveAppOptions {
  clock?: FakeClock;
  tuning?: Partial<SessionTuning>;
  rateLimit?: Partial<PlayRateLimit>;
}

/** The real app on a real port (sockets need one), against the real database. */
export async function createLiveApp(opts: LiveAppOptions = {}): Promise<LiveApp> {
  if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL is not set: run the suites through `npm test`.');
  const mail: MailCatcher = await startMailCatcher();
  Object.assign(process.env, { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mail.smtpPort) });
  const clock = opts.clock ?? new FakeClock();
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
    .overrideProvider(SESSION_CLOCK)
    .useValue(clock)
    .overrideProvider(SESSION_TUNING)
    .useValue({ ...DEFAULT_SESSION_TUNING, awayGraceMs: 0, ...opts.tuning })
    .overrideProvider(PLAY_RATE_LIMIT)
    .useValue({ ...DEFAULT_PLAY_RATE_LIMIT, ...opts.rateLimit })
    .compile();
  const app = moduleRef.createNestApplication({ bodyParser: false, logger: ['error', 'fatal'] });
  configureApp(app, { logRequests: false });
  await app.listen(0, '127.0.0.1');
  const port = (app.getHttpServer().address() as AddressInfo).port;
  return {
    app,
    db: app.get(DataSource),
    url: `http://127.0.0.1:${port}`,
    clock,
    // The sessions module's own limiter (the catch-up module keeps another, for its own codes).
    limiter: app.select(SessionsModule).get(JoinAttemptLimiter, { strict: true }),
    async close() {
      await app.close();
      await mail.close();
    },
  };
}

/** The sign-in cookie header of a staff user, for the host namespace's handshake. */
export async function signInCookie(live: LiveApp, user: UserEntity): Promise<string> {
  const res = await request(live.app.getHttpServer()).post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD }).expect(200);
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  return cookies.map((c) => c.split(';')[0]).join('; ');
}

export interface Recorded {
  event: string;
  args: unknown[];
}

export interface TestSocket {
  socket: Socket;
  /** Every server event this socket received, in order. */
  log: Recorded[];
}

function connect(url: string, auth: object, headers: Record<string, string> = {}): Promise<TestSocket> {
  const socket = io(url, { auth, transports: ['websocket'], reconnection: false, forceNew: true, extraHeaders: headers, timeout: 5000 });
  const log: Recorded[] = [];
  socket.onAny((event: string, ...args: unknown[]) => log.push({ event, args }));
  return new Promise((resolve, reject) => {
    socket.once('connect', () => resolve({ socket, log }));
    socket.once('connect_error', (err: Error & { data?: unknown }) => {
      socket.close();
      reject(Object.assign(new Error(err.message), { data: err.data }));
    });
  });
}

export function connectHost(live: LiveApp, cookie: string | null, sessionId: string, protocolVersion = PROTOCOL_VERSION): Promise<TestSocket> {
  return connect(`${live.url}${NAMESPACES.host}`, { sessionId, protocolVersion }, cookie ? { cookie } : {});
}

export function connectPlayer(live: LiveApp, token: string, protocolVersion = PROTOCOL_VERSION): Promise<TestSocket> {
  return connect(`${live.url}${NAMESPACES.player}`, { token, protocolVersion });
}

/** Emits with an ack and resolves with the ack (or rejects after a timeout: a missing ack is a failure). */
export function emitAck<T = any>(socket: Socket, event: string, ...args: unknown[]): Promise<T> {
  return socket.timeout(5000).emitWithAck(event, ...args) as Promise<T>;
}

/** The next `event` on the socket that passes `accept` (also one already recorded after index `from`). */
export function waitFor<T = any>(ts: TestSocket, event: string, accept: (payload: T) => boolean = () => true, from = 0, timeoutMs = 5000): Promise<T> {
  const seen = ts.log.slice(from).find((r) => r.event === event && accept(r.args[0] as T));
  if (seen) return Promise.resolve(seen.args[0] as T);
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      ts.socket.off(event, on);
      reject(new Error(`no ${event} within ${timeoutMs} ms`));
    }, timeoutMs);
    const on = (payload: T) => {
      if (!accept(payload)) return;
      clearTimeout(timer);
      ts.socket.off(event, on);
      resolve(payload);
    };
    ts.socket.on(event, on);
  });
}

export function closeAll(sockets: (TestSocket | undefined)[]): void {
  for (const s of sockets) s?.socket.close();
}

/** Lets in-flight broadcasts land. */
export const settle = (ms = 50) => new Promise((r) => setTimeout(r, ms));
