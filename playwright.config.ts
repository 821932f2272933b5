import { defineConfig, devices } from '@playwright/test';

const port = Number(process.env['E2E_PORT'] ?? 4100);

/**
 * Journeys in Debian's Chromium against the built server-rendered app (`npm test` builds it, prepares
 * the e2e database and starts the fakes first). No browser download: the system Chromium is used.
 */
export default defineConfig({
  testDir: './e2e',
  fullyParallel: false,
  workers: 1,
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
  webServer: {
    // E2E_DIST lets several builds exist side by side (default: the normal build output).
    command: `node ${process.env['E2E_DIST'] ?? 'dist/baleproof'}/server/server.mjs`,
    url: `http://127.0.0.1:${port}/api/health`,
    reuseExistingServer: false,
    // The server's warnings and errors show beside the failing journey.
    stdout: 'pipe',
    stderr: 'pipe',
    timeout: 60_000,
    env: {
      PORT: String(port),
      PUBLIC_URL: `http://127.0.0.1:${port}`,
      NODE_ENV: 'production',
      // Production refuses the published development secrets: the end-to-end server gets its own.
      SESSION_SECRET: 'e2e-session-secret-not-the-public-default',
      ADMIN_PASSWORD: 'e2e-admin-password-unused-by-the-server',
      STRIPE_WEBHOOK_SECRET: process.env['STRIPE_WEBHOOK_SECRET'] ?? 'whsec_e2e_only_secret',
      COOKIE_SECURE: 'false',
      LOG_LEVEL: 'warn',
      DATABASE_URL: process.env['DATABASE_URL'] ?? '',
      UPLOAD_DIR: process.env['UPLOAD_DIR'] ?? '.data/e2e-uploads',
      SMTP_URL: process.env['SMTP_URL'] ?? 'smtp://127.0.0.1:1026',
      STRIPE_FAKE_PORT: process.env['STRIPE_FAKE_PORT'] ?? '12112',
      SIGN_IN_RATE_LIMIT: '200',
      SIGN_IN_IP_RATE_LIMIT: '400',
      SIGN_UP_IP_RATE_LIMIT: '400',
    },
  },
});
