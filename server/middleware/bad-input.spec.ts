import { startTestApi, type TestApi } from '../../tests/support/test-api';
import { LOT_STEP, signedInGrower } from '../../tests/support/grower-lot';

// Bad input gets a clear 4xx, never a 500: NUL bytes (PostgreSQL SQLSTATE 22021), ids past the 32-bit
// integer column (2^31 − 1 = 2147483647, SQLSTATE 22003), control and bidi characters in titles.
describe('bad input answers 4xx', () => {
  let t: TestApi;
  let grower: Awaited<ReturnType<typeof signedInGrower>>;
  beforeAll(async () => {
    t = await startTestApi();
    grower = await signedInGrower(t);
  });
  afterAll(() => t.close());

  it('refuses a NUL byte in search words and in a lot title', async () => {
    const search = await t.agent().get('/lots?q=hay%00bale');
    expect(search.status).toBe(400);
    const lot = await grower.agent.post('/selling/lots', { ...LOT_STEP, title: 'Hay\u0000bale' });
    expect(lot.status).toBe(400);
    expect(lot.body.error.details[0].path).toBe('title');
  });

  it('refuses line breaks and bidi controls in a title, so it cannot forge lines in e-mails', async () => {
    for (const title of ['Alfalfa\r\nBcc: everyone@example.com', 'Alfalfa\nListed: free hay', 'Timothy \u202Eyrrah']) {
      const res = await grower.agent.post('/selling/lots', { ...LOT_STEP, title });
      expect(res.status).toBe(400);
      expect(res.body.error.details[0].path).toBe('title');
    }
  });

  it('answers ids beyond the integer column with 4xx', async () => {
    for (const path of ['/lots/2147483648', '/lots/99999999999999999999', `/selling/lots/2147483648`]) {
      const res = await grower.agent.get(path);
      expect(res.status).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
    }
  });

  it('refuses a password of spaces only', async () => {
    const res = await t.agent().post('/auth/sign-up', { email: `spaces.${Date.now()}@test.baleproof.example`, password: ' '.repeat(12), displayName: 'Blank', role: 'buyer' });
    expect(res.status).toBe(400);
  });
});
