import { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { DataSource } from 'typeorm';
import { AppModule } from '../../src/app.module';
import { configureApp } from '../../src/app.setup';
import { AUTH_CLOCK, Clock } from '../../src/auth/auth.constants';
import { MailCatcher, startMailCatcher } from '../../src/mail/dev/mail-catcher';

/** A clock the test moves by hand. */
export class FakeClock implements Clock {
  constructor(private t = Date.now()) {}
  now(): number {
    return this.t;
  }
  advance(ms: number): void {
    this.t += ms;
  }
}

export interface TestContext {
  app: INestApplication;
  db: DataSource;
  mail: MailCatcher;
  clock: FakeClock;
  close(): Promise<void>;
}

/**
 * The real app against the real test database (migrated by `npm test`) and a real SMTP catcher.
 * `env` overrides configuration for this suite.
 */
export async function createTestApp(env: Record<string, string> = {}): Promise<TestContext> {
  if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL is not set: run the suites through `npm test`.');
  const mail = await startMailCatcher();
  Object.assign(process.env, {
    NODE_ENV: 'test',
    APP_SECRET: 'test-secret-test-secret-test-secret-0123',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(mail.smtpPort),
    PUBLIC_URL: 'http://127.0.0.1:3999',
    LOG_LEVEL: 'error',
    ...env,
  });
  const clock = new FakeClock();
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] })
    .overrideProvider(AUTH_CLOCK)
    .useValue(clock)
    .compile();
  const app = moduleRef.createNestApplication({ bodyParser: false, logger: ['error', 'fatal'] });
  configureApp(app, { logRequests: false });
  await app.init();
  const db = app.get(DataSource);
  return {
    app,
    db,
    mail,
    clock,
    async close() {
      await app.close();
      await mail.close();
    },
  };
}

/** Empties every table but the migrations bookkeeping, so each suite starts clean. */
export async function resetDatabase(db: DataSource): Promise<void> {
  const tables: { tablename: string }[] = await db.query(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'migrations'`,
  );
  if (!tables.length) return;
  const truncate = `TRUNCATE ${tables.map((t) => `"${t.tablename}"`).join(', ')} CASCADE`;
  // Sockets closed by the previous test still write (a player marked away) while TRUNCATE takes its
  // locks; PostgreSQL then aborts one side with a deadlock (40P01). The write is harmless: try again.
  for (let attempt = 1; ; attempt++) {
    try {
      await db.query(truncate);
      return;
    } catch (err) {
      const code = (err as { driverError?: { code?: string } }).driverError?.code;
      if (code !== '40P01' || attempt >= 5) throw err;
      await new Promise((r) => setTimeout(r, 50 * attempt));
    }
  }
}
