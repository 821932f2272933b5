import { createHmac } from 'node:crypto';
import express from 'express';
import request from 'supertest';
import { createSessionMiddleware } from '../api';
import { createDb } from '../db/client';
import { createLogger } from '../logger';
import { startTestApi, type TestApi } from '../../tests/support/test-api';
import { pageErrorHandler } from './page-error';

// Pages are served as src/server.ts does: the session middleware (reading PostgreSQL) before the renderer,
// then the page error handler. With PostgreSQL unreachable a visitor gets a friendly 503 page
// (RFC 9110 §15.6.4: 503 with Retry-After), never a stack trace or a bare 500.
describe('pages with the database down', () => {
  let t: TestApi;
  let down: ReturnType<typeof createDb>;
  let pages: express.Express;

  beforeAll(async () => {
    t = await startTestApi();
    down = createDb('postgres://postgres@127.0.0.1:1/baleproof_none', 2);
    pages = express();
    pages.use(createSessionMiddleware({ env: t.deps.env, db: down }));
    pages.get('/hay', (_req, res) => void res.send('<p>catalogue</p>'));
    pages.get('/broken', () => {
      throw new Error('boom at /srv/baleproof/secret/path.ts:12');
    });
    pages.use(pageErrorHandler(createLogger('silent')));
  });
  afterAll(async () => {
    await down.$client.end();
    await t.close();
  });

  it('shows a friendly 503 page to a signed-in visitor whose session cannot be read', async () => {
    // A validly signed session cookie (express-session's format: s:<id>.<HMAC-SHA256, base64>), so the store is asked.
    const sid = 'visitor-session-id';
    const signature = createHmac('sha256', t.deps.env.SESSION_SECRET).update(sid).digest('base64').replace(/=+$/, '');
    const res = await request(pages).get('/hay').set('Cookie', `baleproof.sid=${encodeURIComponent(`s:${sid}.${signature}`)}`);
    expect(res.status).toBe(503);
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.headers['retry-after']).toBe('30');
    expect(res.text).toContain('cannot reach our database');
    expect(res.text).not.toMatch(/ECONNREFUSED|at .*\.(ts|js):\d+/);
  });

  it('answers any other fault with a friendly 500 page without internals', async () => {
    const res = await request(pages).get('/broken');
    expect(res.status).toBe(500);
    expect(res.text).toContain('Something went wrong');
    expect(res.text).not.toContain('/srv/baleproof');
  });
});
