import { createStripeClient } from '../../server/adapters/payments/stripe-client';
import { createLocalStorage } from '../../server/adapters/storage/file-storage';
import { readEnv } from '../../server/env';
import { createDb } from '../../server/db/client';
import { createLogger } from '../../server/logger';
import { seedDemo } from './seed';

const env = readEnv();
// The demo scenario's accounts have published passwords: never in production.
if (env.NODE_ENV === 'production') {
  console.error('[baleproof] the demo seed does not run with NODE_ENV=production; create the admin account by hand.');
  process.exit(1);
}
const db = createDb(env.DATABASE_URL, 2);
seedDemo({
  deps: { env, db, logger: createLogger(env.LOG_LEVEL), storage: createLocalStorage(env.UPLOAD_DIR), stripe: createStripeClient(env) },
  adminEmail: env.ADMIN_EMAIL,
  adminPassword: env.ADMIN_PASSWORD,
  log: (line) => console.log(`[baleproof] ${line}`),
})
  .finally(() => db.$client.end())
  .catch((error) => {
    console.error(error);
    process.exitCode = 1;
  });
