import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { eq, sql } from 'drizzle-orm';
import { lots } from '../../db/schema';
import { createLogger } from '../../logger';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { until } from '../../../tests/support/raw-get';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { CatalogueCache, listenForCatalogueChanges } from './catalogue-cache';

describe('catalogue cache', () => {
  let t: TestApi;
  let cache: CatalogueCache;
  let stop: () => Promise<void>;
  let lotId: number;
  const tag = `C${randomUUID().slice(0, 8)}`;

  beforeAll(async () => {
    cache = new CatalogueCache(60_000);
    t = await startTestApi({}, { catalogueCache: cache });
    stop = listenForCatalogueChanges(process.env['TEST_DATABASE_URL']!, cache, createLogger('silent'));
    const grower = await createGrower(t.deps.db);
    lotId = (await createLot(t.deps.db, grower.farm.id, { title: `${tag} lot`, priceDollarsPerTon: 200 })).id;
    await until(() => cache.searches.enabled);
  });
  afterAll(async () => {
    await stop();
    await t.close();
  });

  it('answers a repeated search from memory, with caching headers for browsers', async () => {
    const first = await t.agent().get(`/lots?q=${tag}`);
    expect(first.headers['cache-control']).toBe('public, max-age=10, stale-while-revalidate=60');
    expect(first.headers['etag']).toBeDefined();
    expect(cache.searches.size).toBeGreaterThan(0);
    // Answered from memory: a change made behind the triggers' back (they are bypassed here) is not seen.
    await t.deps.db.transaction(async (tx) => {
      await tx.execute(sql`set local session_replication_role = replica`);
      await tx.update(lots).set({ title: `${tag} renamed` }).where(eq(lots.id, lotId));
    });
    expect((await t.agent().get(`/lots?q=${tag}`)).body.items[0].title).toBe(`${tag} lot`);
  });

  it('answers 304 when the browser already holds the same result (ETag)', async () => {
    const first = await t.agent().get(`/lots?q=${tag}`);
    const again = await request(t.api).get(`/lots?q=${tag}`).set('If-None-Match', first.headers['etag'] as string);
    expect(again.status).toBe(304);
  });

  it('keeps entries when only a page view is counted, and drops them when a lot changes', async () => {
    await t.agent().get(`/lots?q=${tag}`);
    await t.deps.db.update(lots).set({ viewCount: sql`${lots.viewCount} + 1` }).where(eq(lots.id, lotId));
    await new Promise((r) => setTimeout(r, 300));
    expect(cache.searches.size).toBeGreaterThan(0);
    await t.deps.db.update(lots).set({ priceCentsPerTon: 18_000 }).where(eq(lots.id, lotId));
    await until(() => cache.searches.size === 0);
    const res = await t.agent().get(`/lots?q=${tag}`);
    expect(res.body.items[0]).toMatchObject({ priceCentsPerTon: 18_000 });
  });
});
