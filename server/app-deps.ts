import { createSmtpMailer } from './adapters/mail/mailer';
import { createJobs } from './adapters/queue/jobs';
import { createStripeClient } from './adapters/payments/stripe-client';
import { createLocalStorage } from './adapters/storage/file-storage';
import type { ApiDeps } from './api-deps';
import { clockFromEnv } from './clock';
import { createDb } from './db/client';
import { CatalogueCache } from './features/catalogue-cache/catalogue-cache';
import { readEnv } from './env';
import { createLogger } from './logger';

/** Builds the real dependencies from the environment (the server entry and CLI scripts use this). */
export function createAppDeps(): ApiDeps {
  const env = readEnv();
  const db = createDb(env.DATABASE_URL);
  const logger = createLogger(env.LOG_LEVEL);
  return {
    env,
    db,
    logger,
    jobs: createJobs({ pool: db.$client, logger, mailer: createSmtpMailer(env.SMTP_URL, env.MAIL_FROM) }),
    storage: createLocalStorage(env.UPLOAD_DIR),
    stripe: createStripeClient(env),
    clock: clockFromEnv(env),
    catalogueCache: new CatalogueCache(env.CATALOGUE_CACHE_SECONDS * 1000),
  };
}
