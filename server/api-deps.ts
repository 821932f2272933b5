import type Stripe from 'stripe';
import type { Mailer } from './adapters/mail/mailer';
import type { FileStorage } from './adapters/storage/file-storage';
import type { Db } from './db/client';
import type { Env } from './env';
import type { Logger } from './logger';

/** What the API and its features are built from; `createAppDeps()` makes the real ones, tests make their own. */
export interface ApiDeps {
  env: Env;
  db: Db;
  logger: Logger;
  mailer: Mailer;
  storage: FileStorage;
  stripe: Stripe;
}
