import compression from 'compression';
import express from 'express';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { rawGet } from '../../../tests/support/raw-get';
import { CatalogueCache } from './catalogue-cache';
import { cachedPages } from './page-cache';

/**
 * The page cache in front of the renderer: an anonymous visitor's page is rendered once, and each later
 * visitor gets the same bytes in the encoding their browser asked for (RFC 9110 §12.5.3 Accept-Encoding),
 * compressed once, not per request. The renderer here stands in for Angular's and counts its calls.
 */
describe('cached pages', () => {
  const html = `<!doctype html><html><body>${'<li>Second-cutting orchard grass, 60 lb small squares</li>'.repeat(400)}</body></html>`;
  let renders = 0;

  function app(cache: CatalogueCache) {
    const server = express();
    server.use(compression());
    server.use(
      cachedPages(
        async () => {
          renders++;
          return new Response(html, { status: 200, headers: { 'content-type': 'text/html;charset=UTF-8' } });
        },
        async (response, res) => {
          res.status(response.status).type('html').send(Buffer.from(await response.arrayBuffer()));
        },
        cache,
      ),
    );
    return server;
  }

  /** GET /hay as sent (bytes not decoded). */
  const raw = (server: express.Express, acceptEncoding: string, cookie?: string, acceptLanguage?: string) =>
    rawGet(server, '/hay', { 'accept-encoding': acceptEncoding, ...(cookie ? { cookie } : {}), ...(acceptLanguage ? { 'accept-language': acceptLanguage } : {}) });

  it('renders once and serves later visitors the same page as brotli, gzip or plain, as each asks', async () => {
    const cache = new CatalogueCache(60_000);
    cache.setListening(true);
    const server = app(cache);
    renders = 0;

    const first = await raw(server, 'br');
    expect(first.status).toBe(200);
    expect(renders).toBe(1);

    const br = await raw(server, 'gzip, deflate, br, zstd');
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(Number(br.headers['content-length'])).toBe(br.body.length);
    expect(brotliDecompressSync(br.body).toString()).toBe(html);
    expect(br.body.length).toBeLessThan(html.length / 10);

    const gz = await raw(server, 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gz.body).toString()).toBe(html);

    const plain = await raw(server, 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body.toString()).toBe(html);

    expect(renders).toBe(1);
    expect(cache.pages.get('en-US /hay')?.encoded).toEqual({ br: expect.any(Buffer), gzip: expect.any(Buffer) });
  });

  it('renders every time for a signed-in visitor (session cookie)', async () => {
    const cache = new CatalogueCache(60_000);
    cache.setListening(true);
    const server = app(cache);
    renders = 0;
    await raw(server, 'gzip', 'baleproof.sid=abc');
    await raw(server, 'gzip', 'baleproof.sid=abc');
    expect(renders).toBe(2);
  });

  it('keeps one page per reader language: a Canadian French visitor never gets the page rendered for a US reader', async () => {
    const cache = new CatalogueCache(60_000);
    cache.setListening(true);
    const server = app(cache);
    renders = 0;
    await raw(server, 'identity', undefined, 'en-US,en;q=0.9');
    const french = await raw(server, 'identity', undefined, 'fr-CA,fr;q=0.9,en;q=0.8');
    expect(renders).toBe(2);
    // RFC 9110 §12.5.5: a response chosen by Accept-Language says so in Vary, so shared caches keep them apart too.
    expect(french.headers['vary']).toMatch(/Accept-Language/i);
    await raw(server, 'identity', undefined, 'fr-CA');
    // Languages the app does not ship fall back to US English and share its page (no render per odd header).
    await raw(server, 'identity', undefined, 'ja-JP');
    expect(renders).toBe(2);
  });
});

/**
 * A kept page past its time: sent at once while a fresh one renders behind it (stale-while-revalidate, RFC 5861,
 * applied to the server's own page cache). The renderer here answers with its render count, held until released.
 */
describe('cached pages past their time', () => {
  const ttl = 10_000;
  const stale = 60_000;

  function setup(fail = false) {
    let now = 1_000_000;
    const cache = new CatalogueCache(ttl, () => now, stale);
    cache.setListening(true);
    let renders = 0;
    const waiting: Array<() => void> = [];
    const hits: string[] = [];
    const errors: unknown[] = [];
    let hold = false;
    const server = express();
    server.use(
      cachedPages(
        async () => {
          const n = ++renders;
          if (hold) await new Promise<void>((release) => waiting.push(release));
          if (fail && n > 1) throw new Error('renderer down');
          return new Response(`<p>render ${n}</p>`, { status: 200, headers: { 'content-type': 'text/html;charset=UTF-8' } });
        },
        async (response, res) => {
          res.status(response.status).type('html').send(Buffer.from(await response.arrayBuffer()));
        },
        cache,
        (req) => hits.push(req.originalUrl),
        (error) => errors.push(error),
      ),
    );
    const page = async () => (await rawGet(server, '/hay', { 'accept-encoding': 'identity' })).body.toString();
    /** Lets the renders behind sent pages finish (each answers after its release). */
    const settle = async () => {
      for (let i = 0; i < 20; i++) await new Promise((r) => setImmediate(r));
    };
    return {
      cache,
      page,
      settle,
      hits,
      errors,
      renders: () => renders,
      advance: (ms: number) => (now += ms),
      holdRenders: (on: boolean) => (hold = on),
      release: () => waiting.splice(0).forEach((go) => go()),
    };
  }

  it('sends the kept page at once and renders a fresh one behind it, which the next visitor gets', async () => {
    const t = setup();
    expect(await t.page()).toBe('<p>render 1</p>');
    t.advance(ttl + 1);
    t.holdRenders(true);
    // Sent while the render behind it is still held.
    expect(await t.page()).toBe('<p>render 1</p>');
    expect(t.renders()).toBe(2);
    // A second visitor meanwhile: the same kept page, and no second render of the same page.
    expect(await t.page()).toBe('<p>render 1</p>');
    expect(t.renders()).toBe(2);
    t.release();
    await t.settle();
    expect(await t.page()).toBe('<p>render 2</p>');
    // The render behind the first stale visit stands for that visitor's view; the others count as kept hits.
    expect(t.hits).toEqual(['/hay', '/hay']);
  });

  it('renders in front again once a page is past its stale time too', async () => {
    const t = setup();
    await t.page();
    t.advance(ttl + stale);
    t.holdRenders(true);
    const pending = t.page();
    // The render in front has begun (and is held) once the request reaches it.
    while (t.renders() < 2) await new Promise((r) => setTimeout(r, 5));
    t.release();
    expect(await pending).toBe('<p>render 2</p>');
  });

  it('keeps no page rendered across a change: a render that began before the cache was emptied is sent but not kept', async () => {
    const t = setup();
    await t.page();
    t.advance(ttl + 1);
    t.holdRenders(true);
    await t.page(); // stale page sent, render 2 held behind it
    t.cache.clear(); // the catalogue changed meanwhile
    t.release();
    await t.settle();
    t.holdRenders(false);
    expect(await t.page()).toBe('<p>render 3</p>');
  });

  it('reports a render behind a sent page that failed, and keeps sending the stale page until its time', async () => {
    const t = setup(true);
    await t.page();
    t.advance(ttl + 1);
    expect(await t.page()).toBe('<p>render 1</p>');
    await t.settle();
    expect(t.errors).toEqual([new Error('renderer down')]);
    expect(await t.page()).toBe('<p>render 1</p>');
  });
});
