import { startTestApi, uniqueEmail, type TestApi } from '../../../tests/support/test-api';
import { startAdminApi, type SignedInUser } from '../../../tests/support/start-admin-api';

describe('admin routes', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  it('answers 401 to an anonymous visitor', async () => {
    const res = await t.agent().get('/admin/users');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('answers 403 to a signed-in buyer', async () => {
    const agent = t.agent();
    await agent.post('/auth/sign-up', { email: uniqueEmail(), password: 'a-long-password', displayName: 'B', role: 'buyer' });
    const res = await agent.get('/admin/users');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });
});

describe('admin users and overview', () => {
  let t: TestApi;
  let admin: SignedInUser;
  beforeAll(async () => {
    ({ t, admin } = await startAdminApi());
  });
  afterAll(() => t.close());

  it('lists users for an admin', async () => {
    const res = await admin.agent.get(`/admin/users?q=${encodeURIComponent(admin.email)}`);
    expect(res.status).toBe(200);
    expect(res.body.items).toEqual([expect.objectContaining({ email: admin.email, role: 'admin' })]);
  });

  it('gives twelve Monday-started weeks ending with the current one, and the counts that wait on an admin', async () => {
    const res = await admin.agent.get('/admin/overview');
    expect([res.status, res.body.error]).toEqual([200, undefined]);
    expect(res.body.weeks).toHaveLength(12);
    // TEST_NOW is Tuesday 15 September 2026: its ISO week starts on Monday the 14th (ISO 8601).
    expect(res.body.weeks.at(-1).weekStart).toBe('2026-09-14');
    expect(res.body.weeks[0].weekStart).toBe('2026-06-29');
    expect(res.body).toMatchObject({ lotsWaiting: expect.any(Number), openClaims: expect.any(Number), payoutsDue: { growers: expect.any(Number), totalCents: expect.any(Number) } });
  });
});
