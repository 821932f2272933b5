import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/** A relative import of another built file: `import("./chunk-X.js")` (dynamic), or `from"./chunk-X.js"` and `import"./chunk-X.js"` (static). */
const DYNAMIC_IMPORT = /\bimport\(\s*["']\.\/([\w.-]+\.js)["']\s*\)/g;
const STATIC_IMPORT = /(?:\bfrom|\bimport)\s*["']\.\/([\w.-]+\.js)["']/g;

/** What a page that waits for use hints the browser to fetch, read from the build. */
export interface AppStartFiles {
  /** The module that main.js imports to start the app (src/main.ts has that one dynamic import), and every file it imports in turn. */
  readonly start: readonly string[];
  /** Files every page preloads for main.js itself (index.csr.html); they stay as they are. */
  readonly withMain: readonly string[];
}

/**
 * The files the browser needs to start the app on a page that waits for use (shared/contracts/page-wake.ts),
 * read from the build in `browserDir` (its index.csr.html names main.js and its preloads). Nothing when the
 * build is not there or not as expected: the app then fetches its code on first use instead of ahead of it.
 */
export function appStartFiles(browserDir: string, read: (path: string) => string = (path) => readFileSync(path, 'utf8')): AppStartFiles {
  try {
    const index = read(join(browserDir, 'index.csr.html'));
    const main = /<script src="([\w.-]+\.js)" type="module">/.exec(index)?.[1];
    if (!main) return NONE;
    const starts = [...read(join(browserDir, main)).matchAll(DYNAMIC_IMPORT)].map((m) => m[1]);
    if (starts.length !== 1) return NONE;
    const found = new Set<string>();
    const visit = (file: string) => {
      if (found.has(file)) return;
      found.add(file);
      for (const m of read(join(browserDir, file)).matchAll(STATIC_IMPORT)) visit(m[1]);
    };
    visit(starts[0]);
    return { start: [...found], withMain: [...index.matchAll(MODULE_PRELOAD)].map((m) => m[1]) };
  } catch {
    return NONE;
  }
}

const NONE: AppStartFiles = { start: [], withMain: [] };

/** A module preload hint; besides main.js's own, Angular's server renderer adds them for the route's code. */
const MODULE_PRELOAD = /\n?<link rel="modulepreload" href="([\w.-]+\.js)">/g;

/**
 * The page for a visit that starts the app only when used: the app's start files, then the route's code that
 * Angular asked to preload with the page, become prefetch hints just before `</body>` (main.js's own few
 * preloads stay). `prefetch` is the lowest priority and only fills the HTTP cache, so nothing is compiled or
 * run and nothing competes with the page.
 */
export function withPrefetchHints(html: string, files: AppStartFiles): string {
  const end = html.lastIndexOf('</body>');
  if (end === -1) return html;
  const route: string[] = [];
  const page = html.slice(0, end).replace(MODULE_PRELOAD, (link: string, file: string) => (files.withMain.includes(file) ? link : (route.push(file), '')));
  const hinted = [...new Set([...files.start, ...route])].filter((file) => !files.withMain.includes(file));
  return page + hinted.map((file) => `<link rel="prefetch" href="${file}">`).join('') + html.slice(end);
}

/** The rendered page with its prefetch hints (withPrefetchHints), when it is HTML; anything else as it came. */
export async function pageWithPrefetchHints(response: Response, files: AppStartFiles): Promise<Response> {
  if (!response.body || !response.headers.get('content-type')?.startsWith('text/html')) return response;
  const headers = new Headers(response.headers);
  headers.delete('content-length');
  return new Response(withPrefetchHints(await response.text(), files), { status: response.status, statusText: response.statusText, headers });
}
