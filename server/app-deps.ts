import { createSmtpMailer } from './adapters/mail/mailer';
import { createStripeClient } from './adapters/payments/stripe-client';
import { createLocalStorage } from './adapters/storage/file-storage';
import type { ApiDeps } from './api-deps';
import { clockFromEnv } from './clock';
import { createDb } from './db/client';
import { readEnv } from './env';
import { createLogger } from './logger';

/** Builds the real dependencies from the environment (the server entry and CLI scripts use this). */
export function createAppDeps(): ApiDeps {
  const env = readEnv();
  return {
    env,
    db: createDb(env.DATABASE_URL),
    logger: createLogger(env.LOG_LEVEL),
    mailer: createSmtpMailer(env.SMTP_URL, env.MAIL_FROM),
    storage: createLocalStorage(env.UPLOAD_DIR),
    stripe: createStripeClient(env),
    clock: clockFromEnv(env),
  };
}
