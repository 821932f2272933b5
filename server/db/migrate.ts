import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { resolve } from 'node:path';
import type { Db } from './client';

/** Applies the committed migrations in drizzle/ (idempotent). */
export async function runMigrations(db: Db, folder = resolve(process.cwd(), 'drizzle')): Promise<void> {
  await migrate(db, { migrationsFolder: folder });
}
