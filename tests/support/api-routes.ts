import type { Express } from 'express';

/** One route the API answers: method in lower case, path with its `:params` as declared. */
export interface ApiRoute {
  method: string;
  path: string;
}

interface Layer {
  rawPath?: string | string[];
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/**
 * Every route of an assembled Express 5 app, read from its router stack (mount paths included), so a
 * test built on it covers a route the day it is added.
 */
export function apiRoutes(app: Express): ApiRoute[] {
  const root = (app as unknown as { router: { stack: Layer[] } }).router;
  return walk(root.stack, '');
}

function walk(stack: Layer[], prefix: string): ApiRoute[] {
  const out: ApiRoute[] = [];
  for (const layer of stack) {
    if (layer.route) {
      for (const method of Object.keys(layer.route.methods)) {
        if (method === '_all') continue;
        out.push({ method, path: join(prefix, layer.route.path) });
      }
    } else if (layer.handle?.stack) {
      const mount = Array.isArray(layer.rawPath) ? layer.rawPath[0]! : (layer.rawPath ?? '/');
      out.push(...walk(layer.handle.stack, join(prefix, mount)));
    }
  }
  return out;
}

function join(prefix: string, path: string): string {
  const joined = `${prefix}/${path}`.replace(/\/+/g, '/');
  return joined.length > 1 ? joined.replace(/\/$/, '') : joined;
}
