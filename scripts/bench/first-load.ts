import { chromium } from 'playwright-core';

export interface FirstLoad {
  requests: number;
  /** Bytes on the wire (headers + encoded bodies) until the network is idle. */
  totalBytes: number;
  /** Encoded (compressed) bytes of JavaScript fetched for the first visit, and the same decoded. */
  jsBytes: number;
  jsDecodedBytes: number;
  fontBytes: number;
  largest: { url: string; bytes: number }[];
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
    const scripts = seen.filter((s) => s.type === 'script');
    return {
      requests: seen.length,
      totalBytes: seen.reduce((n, s) => n + s.bytes, 0),
      jsBytes: scripts.reduce((n, s) => n + s.bytes, 0),
      jsDecodedBytes: scripts.reduce((n, s) => n + s.decoded, 0),
      fontBytes: seen.filter((s) => s.type === 'font').reduce((n, s) => n + s.bytes, 0),
      largest: [...seen].sort((a, b) => b.bytes - a.bytes).slice(0, 5).map((s) => ({ url: new URL(s.url).pathname, bytes: s.bytes })),
    };
  } finally {
    await browser.close();
  }
}
