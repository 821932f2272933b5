import { Router } from 'express';
import type { FileStorage } from '../../adapters/storage/file-storage';
import { notFound } from '../../middleware/http-error';

const TYPES: Record<string, string> = {
  webp: 'image/webp',
  avif: 'image/avif',
  jpg: 'image/jpeg',
  jpeg: 'image/jpeg',
  png: 'image/png',
  pdf: 'application/pdf',
};

/** Serves stored photo variants (public). Lab report PDFs go through their own access-checked route. */
export function mediaRouter(storage: FileStorage): Router {
  const router = Router();
  router.get('/photos/{*key}', async (req, res) => {
    const parts = (req.params as { key: string[] }).key;
    const key = `photos/${parts.join('/')}`;
    const file = await storage.read(key);
    if (!file) throw notFound('That image');
    const ext = key.split('.').pop() ?? '';
    res.setHeader('Content-Type', TYPES[ext] ?? 'application/octet-stream');
    res.setHeader('Content-Length', String(file.size));
    // Variant keys never change content, so they can be cached for a long time.
    res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
    res.setHeader('X-Content-Type-Options', 'nosniff');
    file.stream.pipe(res);
  });
  return router;
}
