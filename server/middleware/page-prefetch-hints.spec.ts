import { join } from 'node:path';
import { appStartFiles, pageWithPrefetchHints, withPrefetchHints } from './page-prefetch-hints';

/** A build as esbuild writes it (minified ES modules), as files in a folder. */
function build(files: Record<string, string>): (path: string) => string {
  return (path) => {
    const name = path.slice(join('/b', '/').length);
    if (!(name in files)) throw Object.assign(new Error(`ENOENT: ${path}`), { code: 'ENOENT' });
    return files[name];
  };
}

const INDEX = '<html><head></head><body><app-root></app-root><link rel="modulepreload" href="chunk-M1.js"><script src="main-X1.js" type="module"></script></body></html>';

describe('appStartFiles', () => {
  it('follows the one import main.js makes on start, then every static import in turn (once each, cycles too)', () => {
    const read = build({
      'index.csr.html': INDEX,
      'main-X1.js': 'import{a as o}from"./chunk-M1.js";o();function s(){import("./chunk-BOOT.js").then(t=>t.boot())}',
      'chunk-M1.js': 'export const a=()=>1;',
      'chunk-BOOT.js': 'import{b}from"./chunk-CORE.js";import"./chunk-SIDE.js";export function boot(){}',
      'chunk-CORE.js': 'import{c}from"./chunk-COMMON.js";export const b=1;',
      'chunk-COMMON.js': 'import{b}from"./chunk-CORE.js";export const c=2;',
      'chunk-SIDE.js': 'globalThis.x=1;',
      'chunk-ROUTE.js': 'export default 1;',
    });
    expect(appStartFiles('/b', read)).toEqual({ start: ['chunk-BOOT.js', 'chunk-CORE.js', 'chunk-COMMON.js', 'chunk-SIDE.js'], withMain: ['chunk-M1.js'] });
  });

  it('hints nothing when the build is missing or main.js does not start the app with one import', () => {
    const none = { start: [], withMain: [] };
    expect(appStartFiles('/b', build({}))).toEqual(none);
    expect(appStartFiles('/b', build({ 'index.csr.html': INDEX, 'main-X1.js': 'bootstrap();' }))).toEqual(none);
    expect(appStartFiles('/b', build({ 'index.csr.html': INDEX, 'main-X1.js': 'import("./chunk-A.js");import("./chunk-B.js")' }))).toEqual(none);
    expect(appStartFiles('/b', build({ 'index.csr.html': '<html><body></body></html>' }))).toEqual(none);
  });
});

describe('withPrefetchHints', () => {
  const files = { start: ['chunk-BOOT.js', 'chunk-CORE.js', 'chunk-M1.js'], withMain: ['chunk-M1.js'] };
  const page =
    '<html><head><link rel="modulepreload" href="chunk-M1.js"></head><body><main>Hay</main><script src="main-X1.js" type="module"></script>\n' +
    '<link rel="modulepreload" href="chunk-ROUTE.js">\n<link rel="modulepreload" href="chunk-CORE.js">\n</body></html>';

  it("hints the start files, then the route's preloads, as prefetches before </body>; main.js's own preloads stay", () => {
    expect(withPrefetchHints(page, files)).toBe(
      '<html><head><link rel="modulepreload" href="chunk-M1.js"></head><body><main>Hay</main><script src="main-X1.js" type="module"></script>\n' +
        '<link rel="prefetch" href="chunk-BOOT.js"><link rel="prefetch" href="chunk-CORE.js"><link rel="prefetch" href="chunk-ROUTE.js"></body></html>',
    );
  });

  it('leaves a page without a body end as it is', () => {
    expect(withPrefetchHints('<p>partial', files)).toBe('<p>partial');
  });

  it('rewrites only HTML answers, keeping status and headers but not the old length', async () => {
    const html = await pageWithPrefetchHints(new Response(page, { status: 200, headers: { 'content-type': 'text/html; charset=utf-8', 'content-length': '1', 'x-kept': 'yes' } }), files);
    expect(await html.text()).toContain('<link rel="prefetch" href="chunk-BOOT.js">');
    expect(html.headers.get('x-kept')).toBe('yes');
    expect(html.headers.has('content-length')).toBe(false);
    const json = new Response('{"a":1}', { headers: { 'content-type': 'application/json' } });
    expect(await pageWithPrefetchHints(json, files)).toBe(json);
  });
});
