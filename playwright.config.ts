import { defineConfig, devices } from '@playwright/test';
import { stackCount, stackPort } from './e2e/support/stack';

const port = Number(process.env['E2E_PORT'] ?? 4100);
const stacks = stackCount();
const smtpPort = Number(process.env['SMTP_PORT'] ?? 1026);
const stripeFakePort = Number(process.env['STRIPE_FAKE_PORT'] ?? 12112);
const uploadDir = process.env['UPLOAD_DIR'] ?? '.data/e2e-uploads';

/** Copy i of the app's database: `npm test` clones the seeded e2e database as `<name>_s<i>`. */
function stackDatabaseUrl(index: number): string {
  const url = process.env['DATABASE_URL'] ?? '';
  if (index === 0 || !url) return url;
  const moved = new URL(url);
  moved.pathname = `${moved.pathname}_s${index}`;
  return moved.toString();
}

/**
 * Journeys in Debian's Chromium against the built server-rendered app (`npm test` builds it, prepares
 * the e2e database and starts the fakes first). No browser download: the system Chromium is used.
 * With E2E_STACKS=n (npm test: 2) n workers run side by side, each against its own copy of the app
 * (server, database, uploads, mail catcher, Stripe fake: e2e/support/stack.ts); journeys within a file
 * stay in order on one worker.
 */
export default defineConfig({
  testDir: './e2e',
  fullyParallel: false,
  workers: stacks,
  retries: process.env['CI'] ? 1 : 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [['list']],
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: process.env['CHROMIUM_PATH'] ?? '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    },
  },
  projects: [{ name: 'chromium', use: { ...devices['Desktop Chrome'] } }],
  webServer: Array.from({ length: stacks }, (_, i) => ({
    // E2E_DIST lets several builds exist side by side (default: the normal build output).
    command: `node ${process.env['E2E_DIST'] ?? 'dist/baleproof'}/server/server.mjs`,
    url: `http://127.0.0.1:${stackPort(port, i)}/api/health`,
    reuseExistingServer: false,
    // The server's warnings and errors show beside the failing journey.
    stdout: 'pipe' as const,
    stderr: 'pipe' as const,
    timeout: 60_000,
    env: {
      PORT: String(stackPort(port, i)),
      PUBLIC_URL: `http://127.0.0.1:${stackPort(port, i)}`,
      NODE_ENV: 'production',
      // Production refuses the published development secrets: the end-to-end server gets its own.
      SESSION_SECRET: 'e2e-session-secret-not-the-public-default',
      ADMIN_PASSWORD: 'e2e-admin-password-unused-by-the-server',
      STRIPE_WEBHOOK_SECRET: process.env['STRIPE_WEBHOOK_SECRET'] ?? 'whsec_e2e_only_secret',
      COOKIE_SECURE: 'false',
      LOG_LEVEL: 'warn',
      DATABASE_URL: stackDatabaseUrl(i),
      UPLOAD_DIR: i === 0 ? uploadDir : `${uploadDir}-s${i}`,
      SMTP_URL: `smtp://127.0.0.1:${stackPort(smtpPort, i)}`,
      STRIPE_FAKE_PORT: String(stackPort(stripeFakePort, i)),
      SIGN_IN_RATE_LIMIT: '200',
      SIGN_IN_IP_RATE_LIMIT: '400',
      SIGN_UP_IP_RATE_LIMIT: '400',
    },
  })),
});
