import { inlineHandlerHashes, inlineScriptHashes, pageContentSecurityPolicy } from './page-csp';

/**
 * The page policy hashes the inline scripts Angular's server renderer writes (the shapes below are copied from
 * a rendered Baleproof page) and nothing else. The hash of `alert('Hello, world.');` is the worked example of
 * a hash source in the CSP Level 2 specification (§4.2.5.1, from memory).
 */
const SPEC_EXAMPLE = "alert('Hello, world.');";
const SPEC_EXAMPLE_HASH = "'sha256-qznLcsROx4GACP2dm0UCKCzCG+HiZ1guq6ZZDob/Tng='";
const REPLAY_START = 'window.__jsaction_bootstrap(document.body,"ng",["click","submit","input"],["blur","focus"]);';

const page = (head: string, afterRoot: string, inRoot = '<main><h1>Find hay</h1></main>') =>
  `<!DOCTYPE html><html lang="en"><head><meta charset="utf-8"><title>Find hay</title>${head}</head><body><app-root ngh="0">${inRoot}</app-root>${afterRoot}</body></html>`;

describe('page content security policy', () => {
  it('hashes an inline script in the head as the CSP specification does', () => {
    expect(inlineScriptHashes(page(`<script type="text/javascript" id="ng-event-dispatch-contract">${SPEC_EXAMPLE}</script>`, ''))).toEqual([SPEC_EXAMPLE_HASH]);
  });

  it('allows event replay’s start after the app root, but no script inside the app root and no JSON data block', () => {
    const html = page(
      '<script src="main-3OWAZMVB.js" type="module"></script>',
      `<script>${REPLAY_START}</script><script id="ng-state" type="application/json">{"a":1}</script>`,
      `<p>Lot 4</p><script>${SPEC_EXAMPLE}</script></app-root><script>${SPEC_EXAMPLE}</script><app-root>`,
    );
    const hashes = inlineScriptHashes(html);
    expect(hashes).toHaveLength(1);
    expect(hashes).not.toContain(SPEC_EXAMPLE_HASH);
  });

  it('allows the deferred stylesheet’s onload in the head only, by hash with unsafe-hashes', () => {
    const head = `<link rel="stylesheet" href="styles.css" media="print" onload="${SPEC_EXAMPLE.replace(/'/g, '&#39;')}">`;
    expect(inlineHandlerHashes(page(head, ''))).toEqual([SPEC_EXAMPLE_HASH]);
    expect(inlineHandlerHashes(page('', `<img src="x" onerror="${SPEC_EXAMPLE}">`))).toEqual([]);
    expect(pageContentSecurityPolicy(page(head, ''))).toContain(`'unsafe-hashes' ${SPEC_EXAMPLE_HASH}`);
  });

  it('never allows inline scripts wholesale and closes plugins, base and framing', () => {
    const policy = pageContentSecurityPolicy(page(`<script>${SPEC_EXAMPLE}</script>`, ''));
    const scriptSrc = policy.split('; ').find((d) => d.startsWith('script-src '))!;
    expect(scriptSrc).toBe(`script-src 'self' ${SPEC_EXAMPLE_HASH}`);
    expect(policy).toContain("object-src 'none'");
    expect(policy).toContain("base-uri 'self'");
    expect(policy).toContain("frame-ancestors 'none'");
    expect(policy).toContain("form-action 'self'");
  });
});
