import { createLocalStorage } from '../../adapters/storage/file-storage';
import { readEnv } from '../../env';
import { createDb } from '../client';
import { seedDemo } from './seed';

const env = readEnv();
const db = createDb(env.DATABASE_URL, 2);
seedDemo({
  db,
  storage: createLocalStorage(env.UPLOAD_DIR),
  adminEmail: env.ADMIN_EMAIL,
  adminPassword: env.ADMIN_PASSWORD,
  log: (line) => console.log(`[baleproof] ${line}`),
})
  .finally(() => db.$client.end())
  .catch((error) => {
    console.error(error);
    process.exitCode = 1;
  });
