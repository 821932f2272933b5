import { createApi } from '../api';
import { createDb } from '../db/client';
import { csrfAgent, startTestApi, type TestApi } from '../../tests/support/test-api';

// With PostgreSQL unreachable (nothing listens on the port) the API says so: 503 and a clear message,
// not a bare 500 (common practice: 503 Service Unavailable with Retry-After, RFC 9110 §15.6.4).
describe('database down', () => {
  let t: TestApi;
  let down: ReturnType<typeof createDb>;
  let agent: ReturnType<typeof csrfAgent>;

  beforeAll(async () => {
    t = await startTestApi();
    down = createDb('postgres://postgres@127.0.0.1:1/baleproof_none', 2);
    agent = csrfAgent(createApi({ ...t.deps, db: down }));
  });
  afterAll(async () => {
    await down.$client.end();
    await t.close();
  });

  it('answers catalogue and lot requests with 503 and a message people can act on', async () => {
    for (const path of ['/lots', '/lots/1', '/lots/compare?ids=1,2']) {
      const res = await agent.get(path);
      expect({ path, status: res.status, code: res.body.error?.code }).toEqual({ path, status: 503, code: 'database_unavailable' });
      expect(res.body.error.message).toMatch(/cannot reach its database/);
      expect(res.headers['retry-after']).toBe('30');
    }
  });

  it('answers a sign-in with 503 too', async () => {
    const res = await agent.post('/auth/sign-in', { email: 'someone@test.baleproof.example', password: 'a-password' });
    expect(res.status).toBe(503);
  });
});
