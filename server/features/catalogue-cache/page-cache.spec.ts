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
