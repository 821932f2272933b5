import { layoutShiftSoFar, watchLayoutShifts } from './support/layout-shift';
import { expect, test } from './support/test';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { get } from 'node:http';
import { join } from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';

/**
 * Static files go out as the brotli or gzip copy made at build time (scripts/build/precompress.ts) when the
 * browser accepts it, and that copy is the very file the build wrote; a browser that accepts neither gets
 * the file itself. Read with node:http so the bytes on the wire are seen undecoded.
 */
const browserDist = join(process.cwd(), 'dist/baleproof/browser');
// The largest script the build compressed (main.js itself is now under a kilobyte, too small to be worth it).
const bigScript = readdirSync(browserDist)
  .filter((name) => name.endsWith('.js') && existsSync(join(browserDist, `${name}.br`)))
  .sort((a, b) => statSync(join(browserDist, b)).size - statSync(join(browserDist, a)).size)[0]!;

function fetchRaw(url: string, acceptEncoding: string): Promise<{ headers: Record<string, string | string[] | undefined>; body: Buffer }> {
  return new Promise((resolve, reject) => {
    get(url, { headers: { 'accept-encoding': acceptEncoding } }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }));
    }).on('error', reject);
  });
}

test.describe('precompressed static files', () => {
  test('brotli first, then gzip, then the plain file; each decodes to the built file', async ({ baseURL }) => {
    const original = readFileSync(join(browserDist, bigScript));
    const url = `${baseURL}/${bigScript}`;

    const br = await fetchRaw(url, 'gzip, deflate, br');
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.body.length).toBeLessThan(original.length / 2);
    expect(brotliDecompressSync(br.body).equals(original)).toBe(true);
    expect(br.headers['content-type']).toMatch(/javascript/);
    expect(br.headers['cache-control']).toContain('max-age=31536000');

    const gz = await fetchRaw(url, 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gz.body).equals(original)).toBe(true);

    const plain = await fetchRaw(url, 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body.equals(original)).toBe(true);
  });
});

test.describe('fonts', () => {
  // The brand's type (Source Sans 3, bundled from @fontsource) must reach the browser: a font the page's styles
  // name but the server answers 404 leaves every page in the reader's fallback font.
  test('every font file a page names is served as a font', async ({ page, baseURL }) => {
    const failed: string[] = [];
    page.on('response', (r) => {
      if (/\.woff2?$/.test(new URL(r.url()).pathname) && r.status() !== 200) failed.push(`${r.status()} ${r.url()}`);
    });
    await page.goto('/hay');
    const html = await (await page.request.get(`${baseURL}/hay`)).text();
    const named = [...new Set([...html.matchAll(/url\("?([^")]+\.woff2)"?\)/g)].map((m) => new URL(m[1]!, `${baseURL}/hay`).href))];
    expect(named.length).toBeGreaterThan(0);
    for (const url of named) {
      const res = await page.request.get(url);
      expect([url, res.status(), res.headers()['content-type']]).toEqual([url, 200, 'font/woff2']);
    }
    expect(await page.evaluate(async () => (await document.fonts.ready, [...document.fonts].filter((f) => f.status === 'error').map((f) => `${f.family} ${f.weight}`)))).toEqual([]);
    expect(failed).toEqual([]);
  });
});

test.describe('late fonts and styles', () => {
  // On a slow line the brand faces can arrive after the page has been drawn in the fallback font. Swapping a face
  // in then moves every line (Lighthouse measured a layout shift of 0.30 on the catalogue: "web font loaded"); the
  // page must keep the face it was first drawn in. Layout shifts as the browser reports them (Layout Instability
  // API, W3C); CLS 0.1 is the usual "good" limit, and a font must add nothing.
  test('brand faces arriving after the first paint: nothing on the catalogue moves', async ({ page }) => {
    await page.setViewportSize({ width: 412, height: 823 });
    await page.route(/\.woff2$/, async (route) => {
      await new Promise((r) => setTimeout(r, 1_500));
      await route.continue();
    });
    await watchLayoutShifts(page);
    const arrived = page.waitForResponse((r) => /\.woff2$/.test(new URL(r.url()).pathname));
    await page.goto('/hay');
    await arrived;
    await page.waitForTimeout(1_000);
    expect(await layoutShiftSoFar(page)).toBeLessThan(0.001);
  });

  // The global styles (theme, tokens, base rules) come inside the page with the components' styles, so no
  // stylesheet arrives after first paint to restyle and lay out the whole page again (or move it); a page
  // drawn without its scripts already wears the theme.
  test('the catalogue asks for no stylesheet and is drawn in the theme before any script runs', async ({ browser, baseURL }) => {
    const context = await browser.newContext({ javaScriptEnabled: false, baseURL });
    const page = await context.newPage();
    const stylesheets: string[] = [];
    page.on('request', (r) => {
      if (r.resourceType() === 'stylesheet') stylesheets.push(r.url());
    });
    await page.goto('/hay');
    expect(stylesheets).toEqual([]);
    // The page's background, from the theme's overrides (src/styles.scss), and the brand face's family.
    const look = await page.evaluate(() => {
      const body = getComputedStyle(document.body);
      return { background: body.backgroundColor, font: body.fontFamily };
    });
    expect(look.background).not.toBe('rgba(0, 0, 0, 0)');
    expect(look.font).toContain('Source Sans 3');
    await context.close();
  });
});
