import type { IncomingMessage } from 'node:http';

/** The visitor's address on the render request, as this server saw it; the renderer sends it to the API as X-Forwarded-For. */
export const VISITOR_ADDRESS_HEADER = 'x-baleproof-visitor-address';

/** Headers that name where a request came in (or claims to); the renderer takes none of them from the client. */
const ORIGIN_HEADERS = new Set(['host', 'x-forwarded-host', 'x-forwarded-proto', 'x-forwarded-port', 'x-forwarded-for', 'forwarded', VISITOR_ADDRESS_HEADER]);

/**
 * The request handed to Angular's server-side renderer, on the app's own loopback origin. The renderer
 * resolves the app's relative API calls (`/api/...`) against the page's origin and sends them with the
 * visitor's cookie; taking that origin from Host or X-Forwarded-Host would let a visitor point the calls
 * at any port (server-side request forgery). The path is appended to the origin, never resolved against it,
 * so `//elsewhere/x` stays a path on loopback. Pages do not use their own origin (links in e-mails use
 * PUBLIC_URL), so nothing else changes.
 */
export function loopbackRenderRequest(req: IncomingMessage & { originalUrl?: string; ip?: string }, port: number): Request {
  const headers = new Headers();
  for (const [name, value] of Object.entries(req.headers)) {
    if (value === undefined || name.startsWith(':') || ORIGIN_HEADERS.has(name)) continue;
    for (const one of ([] as string[]).concat(value)) headers.append(name, one);
  }
  headers.set('host', `127.0.0.1:${port}`);
  // The visitor's address as this server saw it (never a client-sent X-Forwarded-For): the renderer passes it
  // on to its own API calls, which trust loopback, so a lot view rendered here is counted for the visitor.
  const address = req.ip ?? req.socket?.remoteAddress;
  // (A header of our own: Angular warns about, and does not trust, X-Forwarded-* on the render request.)
  if (address) headers.set(VISITOR_ADDRESS_HEADER, address);
  const path = req.originalUrl ?? req.url ?? '/';
  const method = req.method ?? 'GET';
  return new Request(`http://127.0.0.1:${port}${path.startsWith('/') ? path : `/${path}`}`, { method: method === 'HEAD' ? 'HEAD' : 'GET', headers });
}
