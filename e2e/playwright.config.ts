import { defineConfig } from '@playwright/test';
import { join } from 'node:path';

// Browser suites: Debian's Chromium (never a downloaded browser) against the built apps
// served by the real server, on ports of their own so a running `npm start` is not disturbed.
const root = join(__dirname, '..');
export const E2E_PORT = Number(process.env.E2E_PORT ?? 3100);
export const E2E_SMTP_PORT = Number(process.env.E2E_SMTP_PORT ?? 2626);
export const E2E_MAIL_HTTP_PORT = Number(process.env.E2E_MAIL_HTTP_PORT ?? 8126);
export const E2E_OIDC_PORT = Number(process.env.E2E_OIDC_PORT ?? 9126);
const baseURL = `http://127.0.0.1:${E2E_PORT}`;
const oidcIssuer = `http://127.0.0.1:${E2E_OIDC_PORT}`;
// The local demo sign-on provider's one client; the server gets the same values.
const oidcClient = {
  OIDC_CLIENT_ID: 'covalent-e2e',
  OIDC_CLIENT_SECRET: 'e2e-sign-on-client-secret-local-only',
  OIDC_REDIRECT_URI: `${baseURL}/api/auth/sign-on/callback`,
};

export default defineConfig({
  testDir: '.',
  testMatch: '**/*.e2e.ts',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: [['list']],
  use: {
    baseURL,
    trace: 'off',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
    },
  },
  webServer: [
    {
      command: `node server/dist/mail/dev/mail-catcher.js ${E2E_SMTP_PORT} ${E2E_MAIL_HTTP_PORT}`,
      cwd: root,
      url: `http://127.0.0.1:${E2E_MAIL_HTTP_PORT}/messages`,
      reuseExistingServer: false,
      timeout: 20_000,
    },
    {
      command: `node server/dev/oidc-provider.mjs ${E2E_OIDC_PORT}`,
      cwd: root,
      url: `${oidcIssuer}/.well-known/openid-configuration`,
      reuseExistingServer: false,
      timeout: 20_000,
      env: oidcClient,
    },
    {
      command: 'node server/dist/main.js',
      cwd: root,
      url: `${baseURL}/api/health`,
      reuseExistingServer: false,
      timeout: 60_000,
      env: {
        NODE_ENV: 'test',
        DATABASE_URL: process.env.DATABASE_URL ?? '',
        APP_SECRET: 'e2e-secret-e2e-secret-e2e-secret-0123456',
        PORT: String(E2E_PORT),
        HOST: '127.0.0.1',
        PUBLIC_URL: baseURL,
        SMTP_HOST: '127.0.0.1',
        SMTP_PORT: String(E2E_SMTP_PORT),
        HOST_APP_DIST: join(root, 'host-app/dist'),
        PLAYER_APP_DIST: join(root, 'player-app/dist'),
        LOG_LEVEL: 'warn',
        OIDC_ISSUER: oidcIssuer,
        ...oidcClient,
      },
    },
  ],
});
