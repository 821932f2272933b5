import { and, desc, eq, sql } from 'drizzle-orm';
import type { SavedSearchView } from '@shared/contracts/saved-searches';
import type { Db } from '../../db/client';
import { savedSearches } from '../../db/schema';
import { conflict, notFound } from '../../middleware/http-error';

/** A buyer keeps a handful of searches; more than this is a sign of a script, not a person. */
export const MAX_SAVED_SEARCHES = 25;

type Row = typeof savedSearches.$inferSelect;

export function savedSearchView(row: Row): SavedSearchView {
  return {
    id: row.id,
    name: row.name,
    query: row.query,
    alerts: row.alerts,
    lastAlertedAt: row.lastAlertedAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
  };
}

/** A buyer's saved catalogue queries. Every method is scoped to the owner. */
export class SavedSearchesService {
  constructor(private readonly db: Db) {}

  async list(userId: number): Promise<SavedSearchView[]> {
    const rows = await this.db.select().from(savedSearches).where(eq(savedSearches.userId, userId)).orderBy(desc(savedSearches.createdAt), desc(savedSearches.id));
    return rows.map(savedSearchView);
  }

  async create(userId: number, input: { name: string; query: Record<string, string>; alerts: boolean }): Promise<SavedSearchView> {
    const [count] = await this.db.select({ n: sql<number>`count(*)`.mapWith(Number) }).from(savedSearches).where(eq(savedSearches.userId, userId));
    if ((count?.n ?? 0) >= MAX_SAVED_SEARCHES) {
      throw conflict('too_many_saved_searches', `You can keep up to ${MAX_SAVED_SEARCHES} saved searches. Delete one first.`);
    }
    const [row] = await this.db.insert(savedSearches).values({ userId, ...input }).returning();
    return savedSearchView(row!);
  }

  async remove(userId: number, id: number): Promise<void> {
    const deleted = await this.db
      .delete(savedSearches)
      .where(and(eq(savedSearches.id, id), eq(savedSearches.userId, userId)))
      .returning({ id: savedSearches.id });
    if (deleted.length === 0) throw notFound('That saved search');
  }
}
