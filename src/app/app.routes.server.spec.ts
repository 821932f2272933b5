import { routes } from './app.routes';

// @angular/ssr ships only as an ES module with a server-only dependency; the routes need its enum alone.
jest.mock('@angular/ssr', () => ({ RenderMode: { Server: 0, Client: 1, Prerender: 2 } }));

import { serverRoutes } from './app.routes.server';

/**
 * Every page of the app needs a server route of its own: a page that only the catch-all matches is
 * answered with the "not found" status (404) even though the browser then shows it.
 */
describe('server routes', () => {
  const serverPaths = serverRoutes.map((r) => r.path).filter((p) => p !== '**');
  const covered = (path: string) =>
    serverPaths.some((s) => s === path || (s.endsWith('/**') && path.startsWith(s.slice(0, -2))) || (s.includes(':') && s.split('/').length === path.split('/').length && s.split('/').every((part, i) => part.startsWith(':') || part === path.split('/')[i])));

  it.each(routes.filter((r) => r.path !== undefined && r.path !== '**').map((r) => r.path!))('the page at /%s has a server route other than the catch-all', (path) => {
    expect(covered(path)).toBe(true);
  });
});
