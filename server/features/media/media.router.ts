import express, { Router, type ErrorRequestHandler } from 'express';
import { posix } from 'node:path';
import type { FileStorage } from '../../adapters/storage/file-storage';

/**
 * The only keys /media serves: WebP variants `photos/<uuid>/<width>.webp`. Originals (which may carry
 * GPS and camera data) live under `private/` and lab reports under `reports/`; neither can match.
 */
const VARIANT_KEY = /^photos\/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}\/\d{2,4}\.webp$/;

/** Serves stored photo variants (public). Lab report PDFs go through their own access-checked route. */
export function mediaRouter(storage: FileStorage): Router {
  const router = Router();
  router.get('/photos/{*key}', async (req, res) => {
    // Express has decoded each segment once (so `..%2F` arrived as `../`); normalise, then allow only variants.
    const parts = (req.params as { key: string[] }).key;
    const key = posix.normalize(`photos/${parts.join('/')}`);
    if (!VARIANT_KEY.test(key) || parts.some((p) => p.includes('/') || p.includes('\\'))) return plain(res, 404, 'Not found');
    const file = await storage.read(key);
    if (!file) return plain(res, 404, 'Not found');
    res.setHeader('Content-Type', 'image/webp');
    res.setHeader('Content-Length', String(file.size));
    // Variant keys never change content, so they can be cached for a long time.
    res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
    res.setHeader('X-Content-Type-Options', 'nosniff');
    file.stream.on('error', () => res.destroy());
    file.stream.pipe(res);
  });
  router.use((_req, res) => plain(res, 404, 'Not found'));
  router.use(mediaErrors);
  return router;
}

/** Any failure (a malformed escape, a storage error) answers a short plain-text status: no stack, no paths. */
const mediaErrors: ErrorRequestHandler = (err, _req, res, _next) => {
  const status = typeof err?.status === 'number' && err.status >= 400 && err.status < 500 ? err.status : 500;
  plain(res, status, status === 500 ? 'Server error' : 'Bad request');
};

function plain(res: express.Response, status: number, text: string): void {
  if (res.headersSent) return void res.destroy();
  res.status(status).type('text/plain; charset=utf-8').setHeader('X-Content-Type-Options', 'nosniff');
  res.setHeader('Cache-Control', 'no-store');
  res.send(text);
}
