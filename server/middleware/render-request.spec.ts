import type { IncomingMessage } from 'node:http';
import { loopbackRenderRequest } from './render-request';

const incoming = (url: string, headers: Record<string, string | string[]>) => ({ url, originalUrl: url, method: 'GET', headers }) as unknown as IncomingMessage;

describe('loopbackRenderRequest', () => {
  it('puts the page on the app’s own loopback port whatever Host says', () => {
    const req = loopbackRenderRequest(incoming('/hay?q=alfalfa', { host: '127.0.0.1:5432', cookie: 'baleproof.sid=abc' }), 4000);
    expect(req.url).toBe('http://127.0.0.1:4000/hay?q=alfalfa');
    expect(req.headers.get('host')).toBe('127.0.0.1:4000');
  });

  it('drops X-Forwarded-Host, X-Forwarded-Proto and Forwarded', () => {
    const req = loopbackRenderRequest(incoming('/', { host: 'baleproof.example', 'x-forwarded-host': '127.0.0.1:6379', 'x-forwarded-proto': 'https', forwarded: 'host=127.0.0.1:6379' }), 4000);
    expect(new URL(req.url).origin).toBe('http://127.0.0.1:4000');
    expect(req.headers.get('x-forwarded-host')).toBeNull();
    expect(req.headers.get('x-forwarded-proto')).toBeNull();
    expect(req.headers.get('forwarded')).toBeNull();
  });

  it('keeps a path that starts with two slashes on loopback (WHATWG URL would read it as another host)', () => {
    expect(new URL(loopbackRenderRequest(incoming('//127.0.0.1:6379/x', { host: 'a' }), 4000).url).host).toBe('127.0.0.1:4000');
  });

  it('keeps the cookie and the language the page is rendered for', () => {
    const req = loopbackRenderRequest(incoming('/', { host: 'a', cookie: 'baleproof.sid=abc; XSRF-TOKEN=x.y', 'accept-language': 'en-CA' }), 4000);
    expect(req.headers.get('cookie')).toBe('baleproof.sid=abc; XSRF-TOKEN=x.y');
    expect(req.headers.get('accept-language')).toBe('en-CA');
  });

  it('names the visitor by the address the server saw, never by a client-sent X-Forwarded-For', () => {
    const req = loopbackRenderRequest({ ...incoming('/lots/1', { host: 'a', 'x-forwarded-for': '198.51.100.9', 'x-baleproof-visitor-address': '198.51.100.10', 'user-agent': 'Firefox' }), socket: { remoteAddress: '203.0.113.7' } } as unknown as IncomingMessage, 4000);
    expect(req.headers.get('x-forwarded-for')).toBeNull();
    expect(req.headers.get('x-baleproof-visitor-address')).toBe('203.0.113.7');
    expect(req.headers.get('user-agent')).toBe('Firefox');
  });
});
