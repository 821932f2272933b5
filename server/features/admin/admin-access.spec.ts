import type { Router } from 'express';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { signedInUser } from '../../../tests/support/grower-lot';
import { reviewRouter } from '../review/review.router';
import { adminRouter } from './admin.router';
import { adminPayoutsRouter } from '../payouts/payouts.router';
import { adminClaimsRouter } from '../claims/claims.router';

/** Every route a router declares, read from the router itself so a new admin endpoint is covered at once. */
function routesOf(router: Router, mount: string): { method: string; path: string }[] {
  const out: { method: string; path: string }[] = [];
  for (const layer of router.stack as { route?: { path: string; methods: Record<string, boolean> } }[]) {
    if (!layer.route) continue;
    for (const method of Object.keys(layer.route.methods)) out.push({ method, path: mount + layer.route.path.replace(/:[a-zA-Z]+/g, '1') });
  }
  return out;
}

describe('admin endpoints', () => {
  let t: TestApi;
  let routes: { method: string; path: string }[];
  beforeAll(async () => {
    t = await startTestApi();
    routes = [...routesOf(adminRouter(t.deps), '/admin'), ...routesOf(adminPayoutsRouter(t.deps), '/admin/payouts'), ...routesOf(adminClaimsRouter(t.deps), '/admin/claims'), ...routesOf(reviewRouter(t.deps), '/review')];
  });
  afterAll(() => t.close());

  it('are found (sanity: the list is not empty)', () => {
    expect(routes.length).toBeGreaterThanOrEqual(10);
  });

  it('answer 401 to visitors', async () => {
    const visitor = t.agent();
    for (const r of routes) {
      const res = await call(visitor, r);
      expect([r.method, r.path, res.status]).toEqual([r.method, r.path, 401]);
    }
  }, 60_000);

  it('answer 403 to buyers and growers', async () => {
    for (const role of ['buyer', 'grower'] as const) {
      const { agent } = await signedInUser(t, role);
      for (const r of routes) {
        const res = await call(agent, r);
        expect([role, r.method, r.path, res.status]).toEqual([role, r.method, r.path, 403]);
      }
    }
  }, 60_000);
});

function call(agent: ReturnType<TestApi['agent']>, r: { method: string; path: string }) {
  switch (r.method) {
    case 'get':
      return agent.get(r.path);
    case 'post':
      return agent.post(r.path, {});
    case 'put':
      return agent.put(r.path, {});
    case 'patch':
      return agent.patch(r.path, {});
    case 'delete':
      return agent.delete(r.path);
    default:
      throw new Error(`no call for ${r.method}`);
  }
}
