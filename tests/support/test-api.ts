import { mkdtempSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Stripe from 'stripe';
import request from 'supertest';
import { createStripeFake } from '../../docker-local-fakes/stripe/stripe-fake';
import { sql } from 'drizzle-orm';
import { createSmtpMailer, type Mailer, type OutgoingMail } from '../../server/adapters/mail/mailer';
import { createJobs } from '../../server/adapters/queue/jobs';
import { createLocalStorage } from '../../server/adapters/storage/file-storage';
import { createApi } from '../../server/api';
import type { ApiDeps } from '../../server/api-deps';
import { createDb } from '../../server/db/client';
import type { CatalogueCache } from '../../server/features/catalogue-cache/catalogue-cache';
import { readEnv } from '../../server/env';
import { createLogger } from '../../server/logger';
import { testClock } from './test-clock';

/**
 * The real API against the migrated test database (TEST_DATABASE_URL, prepared by `npm test`),
 * with the real job queue (no background workers: tests drain it) delivering to a capturing mailer,
 * a temporary upload folder and the Stripe fake on a free port.
 * With `smtp: true` mail goes out through SMTP to the mail catcher instead (SMTP_URL, set by `npm test`
 * or the Jest global setup); read it back with e2e/support/mail-catcher.ts.
 */
export async function startTestApi(overrides: Record<string, string> = {}, options: { smtp?: boolean; stripe?: StripeFakeServer; catalogueCache?: CatalogueCache } = {}) {
  const url = process.env['TEST_DATABASE_URL'];
  if (!url) throw new Error('TEST_DATABASE_URL is not set: run the suite with `npm test`, which prepares the test database.');
  // A test may pass its own fake to keep the provider's state across a restart of the API.
  const ownFake = options.stripe ? null : await startStripeFake();
  const stripeFake = options.stripe ?? ownFake!;
  const stripePort = stripeFake.port;
  // Each test API counts its own rate limits unless a test gives two APIs one scope (they share the database).
  const scope = `test_${process.pid}_${apiCounter + 1}_${Date.now()}:`;
  const env = readEnv({ NODE_ENV: 'test', DATABASE_URL: url, LOG_LEVEL: 'silent', SIGN_IN_RATE_LIMIT: '1000', SIGN_IN_IP_RATE_LIMIT: '1000', SIGN_UP_IP_RATE_LIMIT: '1000', RATE_LIMIT_SCOPE: scope, ...overrides });
  const mails: OutgoingMail[] = [];
  const clock = testClock();
  const uploadDir = mkdtempSync(join(tmpdir(), 'baleproof-test-'));
  /** The capturing mailer's SMTP: `smtp.down = true` makes every send fail, as an unreachable relay would. */
  const smtp = { down: false };
  const db = createDb(url, 4);
  const logger = createLogger('silent');
  // Each test API gets its own queue schema, so parallel test files never run each other's jobs.
  const queueSchema = `pgboss_test_${process.pid}_${++apiCounter}`;
  const smtpMailer = options.smtp ? createSmtpMailer(smtpUrl(), env.MAIL_FROM) : null;
  const mailer: Mailer = {
    send: async (mail) => {
      if (smtp.down) throw new Error('connect ECONNREFUSED (test SMTP is down)');
      if (smtpMailer) await smtpMailer.send(mail);
      else mails.push(mail);
    },
  };
  const jobs = createJobs({ pool: db.$client, logger, mailer, schema: queueSchema, workers: false });
  const deps: ApiDeps = {
    env,
    db,
    logger,
    jobs,
    storage: createLocalStorage(uploadDir),
    clock,
    stripe: new Stripe('sk_test_local_fake', { host: '127.0.0.1', port: stripePort, protocol: 'http', maxNetworkRetries: 0, telemetry: false }),
    catalogueCache: options.catalogueCache,
  };
  // The queue starts (and installs its schema) on first use, so tests that send nothing pay nothing.
  const api = createApi(deps);
  return {
    api,
    deps,
    /** E-mails the outbox has delivered; call `drainJobs()` first (jobs run only when drained in tests). */
    mails,
    smtp,
    /** Runs the queued jobs (e-mails, …) now; `{ includeDelayed: true }` also runs those waiting out a retry delay. */
    drainJobs: (options?: { includeDelayed?: boolean }) => jobs.drain(options),
    /** The fixed clock the API runs on (TEST_NOW); `clock.set(...)` lets time pass. */
    clock,
    /** The storage folder behind `deps.storage` (one per test API). */
    uploadDir,
    /** The Stripe fake this API talks to (its events, payment page). */
    stripeFake,
    /** A supertest agent that keeps cookies and sends the CSRF header like the Angular app does. */
    agent: () => csrfAgent(api),
    close: async () => {
      await jobs.stop();
      await db.execute(sql.raw(`drop schema if exists ${queueSchema} cascade`));
      await deps.db.$client.end();
      if (ownFake) await ownFake.close();
    },
  };
}

function smtpUrl(): string {
  const url = process.env['SMTP_URL'];
  if (!url) throw new Error('SMTP_URL is not set: the Jest global setup (tests/mail-catcher-setup.cjs) starts the mail catcher.');
  return url;
}

let apiCounter = 0;

export type TestApi = Awaited<ReturnType<typeof startTestApi>>;

/** The Stripe fake on a free port. */
export async function startStripeFake() {
  const fake = createStripeFake();
  const server = await new Promise<import('node:http').Server>((resolve) => {
    const s = fake.listen(0, '127.0.0.1', () => resolve(s));
  });
  const port = (server.address() as AddressInfo).port;
  return { fake, port, base: `http://127.0.0.1:${port}`, close: () => new Promise((resolve) => server.close(resolve)) };
}
export type StripeFakeServer = Awaited<ReturnType<typeof startStripeFake>>;

export function csrfAgent(api: Parameters<typeof request.agent>[0]) {
  const agent = request.agent(api);
  let token = '';
  // Remember the XSRF-TOKEN cookie whenever the server sets it, as the browser would.
  const capture = <T extends { headers: Record<string, unknown> }>(res: T): T => {
    const cookie = ([] as string[]).concat((res.headers['set-cookie'] as string[] | undefined) ?? []).find((c) => c.startsWith('XSRF-TOKEN='));
    if (cookie) token = decodeURIComponent(cookie.split(';')[0]!.split('=').slice(1).join('='));
    return res;
  };
  const prime = async () => {
    if (!token) capture(await agent.get('/auth/me'));
    return token;
  };
  return {
    raw: agent,
    get: async (path: string) => capture(await agent.get(path)),
    // The agent attaches cookies when a request is created, so the token must exist first.
    post: async (path: string, body?: object) => {
      const t = await prime();
      return capture(await agent.post(path).set('X-XSRF-TOKEN', t).send(body ?? {}));
    },
    put: async (path: string, body?: object) => {
      const t = await prime();
      return capture(await agent.put(path).set('X-XSRF-TOKEN', t).send(body ?? {}));
    },
    patch: async (path: string, body?: object) => {
      const t = await prime();
      return capture(await agent.patch(path).set('X-XSRF-TOKEN', t).send(body ?? {}));
    },
    delete: async (path: string) => {
      const t = await prime();
      return capture(await agent.delete(path).set('X-XSRF-TOKEN', t));
    },
    token: prime,
  };
}

let counter = 0;
/** A unique e-mail per call, so test files can share one database. */
export function uniqueEmail(prefix = 'user'): string {
  counter += 1;
  return `${prefix}.${process.pid}.${Date.now().toString(36)}.${counter}@test.baleproof.example`;
}
