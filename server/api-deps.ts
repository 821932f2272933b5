import type Stripe from 'stripe';
import type { Jobs } from './adapters/queue/jobs';
import type { FileStorage } from './adapters/storage/file-storage';
import type { Clock } from './clock';
import type { CatalogueCache } from './features/catalogue-cache/catalogue-cache';
import type { Db } from './db/client';
import type { Env } from './env';
import type { Logger } from './logger';

/**
 * What the API and its features are built from; `createAppDeps()` makes the real ones, tests make their own.
 * Features import this module, never `api.ts` (which imports the features): no import loop.
 */
export interface ApiDeps {
  env: Env;
  db: Db;
  logger: Logger;
  /** Background jobs and the e-mail outbox: requests enqueue, they never talk to SMTP. */
  jobs: Jobs;
  storage: FileStorage;
  stripe: Stripe;
  /** The current time for every service (a fixed clock in tests). */
  clock: Clock;
  /** Short-lived caches of what every visitor sees alike; absent in tests that do not exercise them. */
  catalogueCache?: CatalogueCache;
}
