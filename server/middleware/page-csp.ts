import { createHash } from 'node:crypto';

/** Script types a browser runs (HTML Living Standard §4.12.1.1: empty, a JavaScript MIME type, or module); anything else, e.g. `application/json` (Angular's ng-state), is data. */
const RUN_TYPES = /^(|text\/javascript|application\/javascript|text\/ecmascript|application\/ecmascript|module)$/i;

/** The few character references Angular's serializer writes inside attribute values. */
const ENTITIES: Record<string, string> = { '&amp;': '&', '&quot;': '"', '&#39;': "'", '&#x27;': "'", '&lt;': '<', '&gt;': '>' };

const sha256 = (text: string) => `'sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}'`;

/**
 * Where the app's rendered markup lies: from `<app-root` to the last `</app-root>`. Everything a template renders
 * (and so anything that came from a user) is inside it; Angular's own inline scripts (event replay's contract
 * before it, event replay's start after it) and the built template's are outside.
 */
function appRootRange(html: string): [number, number] {
  const start = html.search(/<app-root\b/i);
  return start < 0 ? [html.length, html.length] : [start, Math.max(start, html.lastIndexOf('</app-root>'))];
}

/**
 * The CSP hash sources (CSP Level 3 §8.3: sha256 of the UTF-8 text, base64) of the page's own inline scripts
 * that run (classic or module `<script>` without `src`) outside the app's rendered markup. Script text is raw
 * text in HTML, so it is hashed exactly as written. A script inside the app root is never allowed, so markup
 * smuggled into a page cannot run even if it got past Angular's escaping and sanitising.
 */
export function inlineScriptHashes(html: string): string[] {
  const [rootStart, rootEnd] = appRootRange(html);
  const hashes = new Set<string>();
  for (const match of html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script\s*>/gi)) {
    const [, attributes, body] = match;
    if (/\ssrc\s*=/i.test(` ${attributes}`)) continue;
    const type = /\btype\s*=\s*["']?([^"'\s>]*)/i.exec(attributes!)?.[1] ?? '';
    if (!RUN_TYPES.test(type.trim())) continue;
    if (match.index < rootStart || match.index > rootEnd) hashes.add(sha256(body!));
  }
  return [...hashes];
}

/**
 * Hash sources of inline event handlers on `<link>` elements in `<head>`: Angular's critical-CSS inlining
 * loads a global stylesheet, when the build has one, with `media="print" onload="this.media='all'"` (this app
 * declares its global styles with the root component instead, src/app/app.ts). They run only under
 * 'unsafe-hashes' with their exact hash; handlers anywhere else are not allowed.
 */
export function inlineHandlerHashes(html: string): string[] {
  const headEnd = html.search(/<\/head\s*>/i);
  const head = headEnd < 0 ? '' : html.slice(0, headEnd);
  const hashes = new Set<string>();
  for (const [, , value] of head.matchAll(/<link\b[^>]*?\son[a-z]+\s*=\s*(["'])([\s\S]*?)\1/gi)) {
    hashes.add(sha256(value!.replace(/&(amp|quot|#39|#x27|lt|gt);/g, (entity) => ENTITIES[entity]!)));
  }
  return [...hashes];
}

/**
 * The Content-Security-Policy of a server-rendered page: scripts only from this origin plus the page's own
 * inline scripts by hash (no 'unsafe-inline', no nonce, so a kept page stays valid for every visitor it is
 * sent to). Styles keep 'unsafe-inline': Angular writes component styles and the critical CSS into `<style>`
 * elements and `style` attributes; a style cannot run code. Images come from this origin (lot photos under
 * /media) or data: URLs (Material's inline icons); the app talks only to its own API.
 */
export function pageContentSecurityPolicy(html: string): string {
  const handlers = inlineHandlerHashes(html);
  const scripts = ["'self'", ...inlineScriptHashes(html), ...(handlers.length ? ["'unsafe-hashes'", ...handlers] : [])];
  return [
    "default-src 'self'",
    `script-src ${scripts.join(' ')}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "frame-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/** The policy for responses that are not rendered pages (static files, error pages): no inline script at all. */
export const STATIC_CONTENT_SECURITY_POLICY = pageContentSecurityPolicy('');
