import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { layoutShiftSoFar, watchLayoutShifts } from './support/layout-shift';
import { expect, test } from './support/test';

/**
 * A page arrives in pieces on a slow line, and the browser draws what it has parsed so far. On a phone the
 * header's main links sit in a row of their own under the mark and the account links; if that first row only
 * takes its height (or wraps) once the account links arrive, the links row jumps down on screen. Seen as a layout
 * shift of 0.007–0.014 when the parser paused between the two on a busy machine (fallback font, 412 px). Layout
 * shifts as the browser reports them (Layout Instability API, W3C); CLS 0.1 is the usual "good" limit, and the
 * header must add nothing.
 */
test.describe('the header while the page streams in', () => {
  let proxy: Server;
  let proxyUrl: string;

  // Passes every request through to the app; the catalogue page is sent in two parts, held 700 ms after the
  // main links, so the browser draws the header without its account links first.
  test.beforeAll(async ({ baseURL }) => {
    proxy = createServer(async (req, res) => {
      try {
        const upstream = await fetch(`${baseURL}${req.url}`, { headers: { 'accept-encoding': 'identity' } });
        res.writeHead(upstream.status, { 'content-type': upstream.headers.get('content-type') ?? 'application/octet-stream' });
        if (!req.url?.startsWith('/hay')) return void res.end(Buffer.from(await upstream.arrayBuffer()));
        const html = await upstream.text();
        const cut = html.indexOf('</nav>') + '</nav>'.length;
        res.write(html.slice(0, cut));
        await new Promise((r) => setTimeout(r, 700));
        res.end(html.slice(cut));
      } catch {
        res.destroy();
      }
    });
    await new Promise<void>((resolve) => proxy.listen(0, '127.0.0.1', resolve));
    proxyUrl = `http://127.0.0.1:${(proxy.address() as AddressInfo).port}`;
  });
  test.afterAll(async () => {
    await new Promise((resolve) => proxy.close(resolve));
  });

  for (const width of [412, 360, 320]) {
    test(`a phone ${width} px wide: the main links stay put when the account links arrive`, async ({ page }) => {
      await page.setViewportSize({ width, height: 800 });
      // The fallback font is the wider one, as for a visitor whose brand faces did not come in time.
      await page.route(/\.woff2$/, (route) => route.abort());
      await watchLayoutShifts(page);
      await page.goto(`${proxyUrl}/hay`);
      await expect(page.getByRole('link', { name: 'Open an account' })).toBeVisible();
      await page.waitForTimeout(500);
      expect(await layoutShiftSoFar(page)).toBeLessThan(0.001);
      // Nothing runs off the side of the phone.
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
    });
  }
});
