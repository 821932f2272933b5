import { get } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Express } from 'express';

export interface RawAnswer {
  status: number;
  headers: Record<string, unknown>;
  body: Buffer;
}

/** GET with node:http on a free port, so the bytes are seen as sent (supertest would decode them). */
export async function rawGet(app: Express, path: string, headers: Record<string, string> = {}): Promise<RawAnswer> {
  const listening = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => listening.once('listening', resolve));
  const { port } = listening.address() as AddressInfo;
  try {
    return await new Promise((resolve, reject) => {
      get({ host: '127.0.0.1', port, path, headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
      }).on('error', reject);
    });
  } finally {
    await new Promise((resolve) => listening.close(resolve));
  }
}

/** Waits until `condition` holds (e.g. a database notice has arrived), failing after `timeoutMs`. */
export async function until(condition: () => boolean, timeoutMs = 5000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!condition()) {
    if (Date.now() > deadline) throw new Error('condition not met in time');
    await new Promise((r) => setTimeout(r, 20));
  }
}
