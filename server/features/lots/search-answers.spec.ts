import { randomUUID } from 'node:crypto';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import express from 'express';
import helmet from 'helmet';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { LotSearchSchema } from '@shared/contracts/lots';
import { lots } from '../../db/schema';
import { createLogger } from '../../logger';
import { createLot } from '../../../tests/support/fixtures';
import { signedInGrower } from '../../../tests/support/grower-lot';
import { rawGet, until } from '../../../tests/support/raw-get';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { CatalogueCache, listenForCatalogueChanges } from '../catalogue-cache/catalogue-cache';
import { LotsService } from './lots.service';
import { keptSearchAnswers } from './search-answers';

/**
 * A visitor's repeated catalogue search is answered from kept bytes before the session, passport and CSRF
 * middleware. `fastOnly` mounts that step alone in front of a stand-in that answers 418, so a 418 means
 * "went on to the full chain" and anything else was answered by the kept bytes.
 */
describe('kept search answers', () => {
  let t: TestApi;
  let cache: CatalogueCache;
  let stop: () => Promise<void>;
  let grower: Awaited<ReturnType<typeof signedInGrower>>;
  let cheapId: number;
  let draftId: number;
  const tag = `K${randomUUID().slice(0, 8)}`;
  const path = `/lots?q=${tag}&sort=price`;
  const fastOnly = () => {
    const app = express();
    app.use(keptSearchAnswers(cache, helmet()));
    app.use((_req, res) => void res.status(418).end());
    return app;
  };

  beforeAll(async () => {
    cache = new CatalogueCache(60_000);
    t = await startTestApi({}, { catalogueCache: cache });
    stop = listenForCatalogueChanges(process.env['TEST_DATABASE_URL']!, cache, createLogger('silent'));
    grower = await signedInGrower(t);
    cheapId = (await createLot(t.deps.db, grower.farm.id, { title: `${tag} cheap`, priceDollarsPerTon: 180 })).id;
    // Enough lots that the answer passes the 1 kB below which nothing is compressed.
    for (const price of [210, 240, 270]) await createLot(t.deps.db, grower.farm.id, { title: `${tag} at ${price}`, priceDollarsPerTon: price });
    draftId = (await createLot(t.deps.db, grower.farm.id, { title: `${tag} draft`, status: 'draft' })).id;
    await until(() => cache.searches.enabled);
  });
  afterAll(async () => {
    await stop();
    await t.close();
  });

  it('answers a repeated visitor search with the very bytes the full chain sent, and those are the search as the service returns it', async () => {
    const full = await raw(t.api, path, 'identity');
    expect(full.status).toBe(200);
    const fast = await raw(fastOnly(), path, 'identity');
    expect(fast.status).toBe(200);
    expect(fast.body.equals(full.body)).toBe(true);
    expect(fast.headers['etag']).toBe(full.headers['etag']);
    expect(fast.headers['cache-control']).toBe('public, max-age=10, stale-while-revalidate=60');
    expect(fast.headers['content-type']).toBe('application/json; charset=utf-8');
    // Same results, totals and ordering as the search itself gives (serialised as Express's res.json does).
    const searched = await new LotsService(t.deps.db).search(LotSearchSchema.parse({ q: tag, sort: 'price' }));
    expect(fast.body.toString('utf8')).toBe(JSON.stringify(searched));
    expect(searched.items.map((i) => i.title)).toEqual([`${tag} cheap`, `${tag} at 210`, `${tag} at 240`, `${tag} at 270`]);
    // The same search written another way (parameters reordered, a default spelled out) is the same kept answer.
    const reordered = await raw(fastOnly(), `/lots?sort=price&q=${tag}&page=1`, 'identity');
    expect(reordered.body.equals(full.body)).toBe(true);
  });

  it('keeps the security headers on kept answers: the same as the full chain sends', async () => {
    const full = await raw(t.api, path, 'identity', { cookie: await sessionCookie() });
    const res = await request(t.api).get(path);
    expect((await raw(fastOnly(), path, 'identity')).status).toBe(200);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    for (const name of ['content-security-policy', 'strict-transport-security', 'x-frame-options', 'referrer-policy', 'cross-origin-resource-policy']) expect(res.headers[name]).toBe(full.headers[name]);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  // RFC 9110 §13.1.2: If-None-Match with the current entity tag → 304 Not Modified, no body.
  it('answers 304 to a browser that already holds the answer, on the fast path and the full one', async () => {
    const first = await raw(t.api, path, 'identity');
    const etag = first.headers['etag'] as string;
    expect(etag).toMatch(/^W\/".+"$/);
    const fast = await raw(fastOnly(), path, 'identity', { 'if-none-match': etag });
    expect(fast.status).toBe(304);
    expect(fast.body.length).toBe(0);
    expect((await raw(t.api, path, 'gzip', { 'if-none-match': etag })).status).toBe(304);
    expect((await raw(fastOnly(), path, 'identity', { 'if-none-match': 'W/"something-else"' })).status).toBe(200);
  });

  // RFC 9110 §8.4: Content-Encoding br (RFC 7932) and gzip (RFC 1952) must decode to the same representation.
  it('sends brotli and gzip copies that decode to the same body, made once and kept', async () => {
    const plain = await raw(t.api, path, 'identity');
    expect(plain.body.length).toBeGreaterThan(1024);
    const br = await raw(fastOnly(), path, 'gzip, deflate, br');
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(Number(br.headers['content-length'])).toBe(br.body.length);
    expect(brotliDecompressSync(br.body).equals(plain.body)).toBe(true);
    const gz = await raw(fastOnly(), path, 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gz.body).equals(plain.body)).toBe(true);
    // The full chain sends the kept copy too, not a second compression.
    const fullBr = await raw(t.api, path, 'br');
    expect(fullBr.body.equals(br.body)).toBe(true);
  });

  it('drops the kept answer when a lot changes: the next search shows the change', async () => {
    await raw(t.api, path, 'identity');
    expect((await raw(fastOnly(), path, 'identity')).status).toBe(200);
    await t.deps.db.update(lots).set({ priceCentsPerTon: 30_000 }).where(eq(lots.id, cheapId));
    await until(() => cache.searches.size === 0);
    expect((await raw(fastOnly(), path, 'identity')).status).toBe(418);
    const after = JSON.parse((await raw(t.api, path, 'identity')).body.toString('utf8'));
    expect(after.items.map((i: { title: string }) => i.title)).toEqual([`${tag} at 210`, `${tag} at 240`, `${tag} at 270`, `${tag} cheap`]);
    expect(after.items[3]).toMatchObject({ id: cheapId, priceCentsPerTon: 30_000 });
    expect(JSON.parse((await raw(fastOnly(), path, 'identity')).body.toString('utf8'))).toEqual(after);
  });

  it('sends a request carrying a session cookie through the session: a signed-in grower gets the same search and still sees their own draft', async () => {
    const anonymous = await raw(t.api, path, 'identity');
    const cookie = await sessionCookie();
    expect((await raw(fastOnly(), path, 'identity', { cookie })).status).toBe(418);
    const signedIn = await raw(t.api, path, 'identity', { cookie });
    expect(signedIn.status).toBe(200);
    expect(signedIn.body.equals(anonymous.body)).toBe(true);
    // The session ran: it is rolled forward (express-session `rolling`) on the signed-in answer.
    expect(String(signedIn.headers['set-cookie'])).toContain('baleproof.sid=');
    expect((await grower.agent.get(`/lots/${draftId}`)).status).toBe(200);
    expect((await t.agent().get(`/lots/${draftId}`)).status).toBe(404);
  });

  it('leaves bad input to the full chain and its 400', async () => {
    expect((await raw(fastOnly(), '/lots?rfvMin=lots', 'identity')).status).toBe(418);
    expect((await raw(t.api, '/lots?rfvMin=lots', 'identity')).status).toBe(400);
  });

  /** The grower agent's session cookie, as the browser would send it. */
  async function sessionCookie(): Promise<string> {
    const res = await grower.agent.raw.get('/auth/me');
    const set = ([] as string[]).concat((res.headers['set-cookie'] as unknown as string[] | undefined) ?? []);
    const sid = set.find((c) => c.startsWith('baleproof.sid='));
    if (!sid) throw new Error('the signed-in grower has no session cookie');
    return sid.split(';')[0]!;
  }
});

const raw = (app: express.Express, path: string, acceptEncoding: string, headers: Record<string, string> = {}) => rawGet(app, path, { 'accept-encoding': acceptEncoding, ...headers });
