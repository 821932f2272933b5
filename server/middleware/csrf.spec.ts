import request from 'supertest';
import { startTestApi, type TestApi } from '../../tests/support/test-api';

// RFC 6265 §4.2: a Cookie header is `name=value` pairs separated by "; ". Browsers and proxies send
// broken ones too; a bad cookie is the client's mistake, so it must get a 4xx or be ignored, never a 500.
const MALFORMED = [
  'XSRF-TOKEN=%E0%A4%A', // a cut-off percent escape (decodeURIComponent throws on it)
  'XSRF-TOKEN=%', // a lone percent sign
  'XSRF-TOKEN', // a name without a value
  '=; ;;; XSRF-TOKEN==', // empty names and values
  'baleproof.sid=%ZZ; XSRF-TOKEN=%C0%AF', // a broken session cookie beside a broken token
];

describe('CSRF cookie reading', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  it.each(MALFORMED)('answers a read with a malformed cookie (%j) normally and hands out a fresh token', async (cookie) => {
    const res = await request(t.api).get('/auth/me').set('Cookie', cookie);
    expect(res.status).toBeLessThan(500);
    expect(res.status).toBe(200);
    expect(String(res.headers['set-cookie'] ?? '')).toMatch(/XSRF-TOKEN=/);
  });

  it.each(MALFORMED)('refuses a write with a malformed cookie (%j) with 403 csrf_failed, not 500', async (cookie) => {
    const res = await request(t.api).post('/auth/sign-out').set('Cookie', cookie).set('X-XSRF-TOKEN', '%E0%A4%A').send({});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_failed');
  });
});
