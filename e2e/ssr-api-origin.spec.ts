import { expect, test } from './support/test';
import { createServer, request, type IncomingHttpHeaders, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';

/**
 * Server-side rendering calls the API with the visitor's cookie, so where it sends those calls must never
 * come from the request: a Host or X-Forwarded-Host of `127.0.0.1:<another port>` passes a host-name
 * allow-list, and a renderer that built its API address from it would hand the cookie to that port and
 * render its answer into the page (server-side request forgery). A stand-in service on a free port
 * records any call and answers as a signed-in admin would.
 */
test.describe('server-side rendering and the Host header', () => {
  let trap: Server;
  let trapPort: number;
  const calls: { url: string; cookie: string | undefined }[] = [];

  test.beforeAll(async () => {
    trap = createServer((req, res) => {
      calls.push({ url: req.url ?? '', cookie: req.headers.cookie });
      res.setHeader('Content-Type', 'application/json');
      res.end(JSON.stringify({ user: { id: 1, email: 'decoy@decoy.example', displayName: 'Decoy Renderer Account', role: 'admin' }, items: [], total: 0 }));
    });
    await new Promise<void>((resolve) => trap.listen(0, '127.0.0.1', resolve));
    trapPort = (trap.address() as AddressInfo).port;
  });
  test.afterAll(() => new Promise<void>((resolve) => trap.close(() => resolve())));

  const cases: { name: string; headers: (port: number) => Record<string, string> }[] = [
    { name: 'Host', headers: (port) => ({ host: `127.0.0.1:${port}` }) },
    { name: 'X-Forwarded-Host', headers: (port) => ({ 'x-forwarded-host': `127.0.0.1:${port}`, 'x-forwarded-proto': 'http' }) },
  ];
  for (const c of cases) {
    test(`a page asked for with ${c.name} naming another local port calls only the app's own API`, async ({ baseURL }) => {
      calls.length = 0;
      const page = await get(new URL('/hay', baseURL), { cookie: 'baleproof.sid=s%3Avisitor-session-cookie', ...c.headers(trapPort) });
      expect(calls).toEqual([]);
      expect(page.body).not.toContain('Decoy Renderer Account');
      // Still a real page: the catalogue rendered from the app's own API.
      expect(page.status).toBe(200);
      expect(page.body).toContain('<app-root');
    });
  }
});

function get(url: URL, headers: IncomingHttpHeaders & Record<string, string>): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const req = request({ host: url.hostname, port: url.port, path: url.pathname, method: 'GET', headers, setHost: !headers.host }, (res) => {
      let body = '';
      res.setEncoding('utf8');
      res.on('data', (chunk: string) => (body += chunk));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
    });
    req.on('error', reject);
    req.end();
  });
}
