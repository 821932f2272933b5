import type { Request, Response } from 'express';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';

/**
 * An answer as sent to a visitor, kept as ready bytes: a server-rendered page or a catalogue search's JSON.
 * Sending it again costs no rendering, no serialising, no hashing and (after the first request asking for
 * each encoding) no compression.
 */
export interface KeptAnswer {
  status: number;
  headers: [string, string][];
  body: Buffer;
  /** The body's validator, when the answer has one (RFC 9110 §8.8.3); If-None-Match with it gets 304. */
  etag?: string;
  /** The body compressed, made on the first request that asks for each encoding. */
  encoded?: Partial<Record<'br' | 'gzip', Buffer>>;
}

/** Below this a body is sent as it is: the compression middleware's own threshold (1 kB), so small answers look the same either way. */
const COMPRESS_FROM_BYTES = 1024;

/**
 * A JSON answer kept as the bytes Express's `res.json` would send: the same serialisation (the app's `json
 * replacer` and `json spaces` are unset, so plain JSON.stringify) and the app's own ETag function, so a
 * kept answer and a freshly sent one cannot differ.
 */
export function keepJson(req: Request, value: unknown, headers: [string, string][] = []): KeptAnswer {
  const body = Buffer.from(JSON.stringify(value), 'utf8');
  const etagOf = req.app.get('etag fn') as ((body: Buffer, encoding: BufferEncoding) => string) | undefined;
  return { status: 200, headers: [['content-type', 'application/json; charset=utf-8'], ...headers], body, etag: etagOf?.(body, 'utf8') };
}

/**
 * Sends a kept answer: 304 when the browser already holds it (If-None-Match), else the body in the encoding
 * the browser asked for (RFC 9110 §12.5.3 Accept-Encoding), compressed once and kept beside it.
 */
export function sendKept(kept: KeptAnswer, req: Request, res: Response): void {
  res.status(kept.status);
  for (const [name, value] of kept.headers) if (name !== 'content-length') res.setHeader(name, value);
  res.vary('Accept-Encoding');
  if (kept.etag) {
    res.setHeader('ETag', kept.etag);
    // Express's own freshness check (If-None-Match against the ETag; a no-cache request is never fresh).
    if (req.fresh) {
      res.removeHeader('Content-Type');
      return void res.status(304).end();
    }
  }
  const encoding = kept.body.length >= COMPRESS_FROM_BYTES ? preferredEncoding(req) : undefined;
  if (!encoding) {
    res.setHeader('Content-Length', kept.body.length);
    return void res.end(kept.body);
  }
  const body = (kept.encoded ??= {})[encoding] ?? (kept.encoded[encoding] = compress(kept.body, encoding));
  // Already encoded: the compression middleware leaves the response alone.
  res.setHeader('Content-Encoding', encoding);
  res.setHeader('Content-Length', body.length);
  res.end(body);
}

/** The encoding chosen for each Accept-Encoding header seen (browsers send a handful of distinct ones). */
const chosenEncodings = new Map<string, 'br' | 'gzip' | undefined>();

/** Brotli when the browser takes it (browsers list gzip first at equal weight, brotli is smaller), else gzip, else none. */
function preferredEncoding(req: Request): 'br' | 'gzip' | undefined {
  const header = req.headers['accept-encoding'];
  if (!header) return undefined;
  if (chosenEncodings.has(header)) return chosenEncodings.get(header);
  const chosen = (['br', 'gzip'] as const).find((encoding) => req.acceptsEncodings(encoding) === encoding);
  if (chosenEncodings.size >= 100) chosenEncodings.clear();
  chosenEncodings.set(header, chosen);
  return chosen;
}

/** Brotli at quality 5 and gzip at level 6: near the best size for HTML and JSON at a few milliseconds, once per kept answer. */
function compress(body: Buffer, encoding: 'br' | 'gzip'): Buffer {
  return encoding === 'br'
    ? brotliCompressSync(body, { params: { [constants.BROTLI_PARAM_QUALITY]: 5, [constants.BROTLI_PARAM_SIZE_HINT]: body.length } })
    : gzipSync(body, { level: 6 });
}
