import { chromium } from 'playwright-core';

export interface FirstLoad {
  requests: number;
  /** Bytes on the wire (headers + encoded bodies) until the network is idle. */
  totalBytes: number;
  /**
   * Encoded (compressed) bytes of JavaScript fetched for the first visit, and the same decoded: every .js
   * file, whether run at load or fetched ahead for later (prefetch hints on a page that waits for use).
   */
  jsBytes: number;
  jsDecodedBytes: number;
  /** The part of jsBytes the page runs at load (requested as scripts); the rest is fetched ahead. */
  jsRunAtLoadBytes: number;
  fontBytes: number;
  largest: { url: string; bytes: number }[];
}

/**
 * On a page that starts its app only when used (shared/contracts/page-wake.ts): milliseconds from the first
 * sign of use (the mouse moving over the page, once the first visit is loaded and idle) until the app has
 * hydrated the page (`<html data-interactive>`), with the CPU as it is and slowed 4 times (Lighthouse's phone).
 */
export async function measureFirstUse(url: string): Promise<{ asIs: number; cpuSlowedFourTimes: number }> {
  const browser = await chromium.launch({ executablePath: process.env['CHROMIUM_PATH'] ?? '/usr/bin/chromium' });
  try {
    const once = async (slowdown: number) => {
      const page = await browser.newPage();
      const cdp = await page.context().newCDPSession(page);
      await cdp.send('Emulation.setCPUThrottlingRate', { rate: slowdown });
      await page.goto(url, { waitUntil: 'networkidle', timeout: 180_000 });
      const started = Date.now();
      await page.mouse.move(20, 20);
      await page.locator('html[data-interactive]').waitFor({ state: 'attached', timeout: 60_000 });
      const ms = Date.now() - started;
      await page.close();
      return ms;
    };
    return { asIs: await once(1), cpuSlowedFourTimes: await once(4) };
  } finally {
    await browser.close();
  }
}

/** A first visit in Debian's Chromium with an empty cache: what the browser downloads to show `url`. */
export async function measureFirstLoad(url: string): Promise<FirstLoad> {
  const browser = await chromium.launch({ executablePath: process.env['CHROMIUM_PATH'] ?? '/usr/bin/chromium' });
  try {
    const page = await browser.newPage();
    const seen: { url: string; type: string; bytes: number; decoded: number }[] = [];
    const pending: Promise<void>[] = [];
    page.on('requestfinished', (request) => {
      pending.push(
        (async () => {
          const sizes = await request.sizes();
          const response = await request.response();
          const decoded = response ? (await response.body().catch(() => Buffer.alloc(0))).length : 0;
          seen.push({ url: request.url(), type: request.resourceType(), bytes: sizes.responseBodySize + sizes.responseHeadersSize, decoded });
        })(),
      );
    });
    await page.goto(url, { waitUntil: 'networkidle', timeout: 180_000 });
    await Promise.all(pending);
    const scripts = seen.filter((s) => s.type === 'script' || new URL(s.url).pathname.endsWith('.js'));
    return {
      requests: seen.length,
      totalBytes: seen.reduce((n, s) => n + s.bytes, 0),
      jsBytes: scripts.reduce((n, s) => n + s.bytes, 0),
      jsDecodedBytes: scripts.reduce((n, s) => n + s.decoded, 0),
      jsRunAtLoadBytes: scripts.filter((s) => s.type === 'script').reduce((n, s) => n + s.bytes, 0),
      fontBytes: seen.filter((s) => s.type === 'font').reduce((n, s) => n + s.bytes, 0),
      largest: [...seen].sort((a, b) => b.bytes - a.bytes).slice(0, 5).map((s) => ({ url: new URL(s.url).pathname, bytes: s.bytes })),
    };
  } finally {
    await browser.close();
  }
}
