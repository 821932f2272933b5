import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema';

export type Db = NodePgDatabase<typeof schema> & { $client: pg.Pool };

/** One pool per process; `casing` maps camelCase fields to snake_case columns as in the migrations. */
export function createDb(databaseUrl: string, max = 10): Db {
  const pool = new pg.Pool({ connectionString: databaseUrl, max });
  return drizzle({ client: pool, schema, casing: 'snake_case' }) as Db;
}
