import { readEnv } from '../env';
import { createDb } from './client';
import { runMigrations } from './migrate';

const env = readEnv();
const db = createDb(env.DATABASE_URL, 1);
runMigrations(db)
  .then(() => console.log('[baleproof] migrations applied'))
  .finally(() => db.$client.end())
  .catch((error) => {
    console.error(error);
    process.exitCode = 1;
  });
