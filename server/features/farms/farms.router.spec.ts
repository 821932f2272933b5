import Stripe from 'stripe';
import { createApi } from '../../api';
import { csrfAgent, startTestApi, type TestApi } from '../../../tests/support/test-api';
import { signedInUser } from '../../../tests/support/grower-lot';

const PROFILE = {
  name: 'Willow Draw Hay (invented)',
  addressLine: '12 County Road 4',
  zip: '66502',
  deliveryRadiusMi: 120,
  loadingFacilities: 'Squeeze and forklift; flatbeds welcome.',
  pickupHours: 'Mon–Sat 7–6',
};

describe('farms API', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  it('creates the farm profile, placing it by ZIP code, and updates it', async () => {
    const { agent } = await signedInUser(t, 'grower');
    expect((await agent.get('/farms/mine')).body.farm).toBeNull();
    const res = await agent.put('/farms/mine', PROFILE);
    expect(res.status).toBe(200);
    // 66502 is Manhattan, KS (zipcodes dataset); coordinates roughly 39.2 N, 96.6 W.
    expect(res.body.farm).toMatchObject({ city: 'Manhattan', state: 'KS', payouts: { state: 'none' } });
    expect(res.body.farm.latitude).toBeCloseTo(39.2, 0);
    const updated = await agent.put('/farms/mine', { ...PROFILE, deliveryRadiusMi: 80 });
    expect(updated.body.farm).toMatchObject({ id: res.body.farm.id, deliveryRadiusMi: 80 });
  });

  it('rejects an unknown ZIP and a bad radius with clear messages', async () => {
    const { agent } = await signedInUser(t, 'grower');
    const zip = await agent.put('/farms/mine', { ...PROFILE, zip: '00000' });
    expect(zip.status).toBe(400);
    expect(zip.body.error.code).toBe('unknown_zip');
    const radius = await agent.put('/farms/mine', { ...PROFILE, deliveryRadiusMi: -5 });
    expect(radius.body.error.details[0].path).toBe('deliveryRadiusMi');
  });

  it('sets up payouts through the provider: pending until onboarding is finished, then ready', async () => {
    const { agent } = await signedInUser(t, 'grower');
    expect((await agent.post('/farms/mine/payouts/link')).body.error.code).toBe('farm_required');
    await agent.put('/farms/mine', PROFILE);
    const link = await agent.post('/farms/mine/payouts/link');
    expect(link.status).toBe(200);
    expect(link.body.url).toMatch(/\/fake\/onboard\/acct_/);
    expect((await agent.post('/farms/mine/payouts/refresh')).body.farm.payouts.state).toBe('pending');
    // Following the link is what the grower's browser does; the fake then marks the account ready.
    const follow = await fetch(link.body.url, { redirect: 'manual' });
    expect(follow.status).toBe(302);
    expect(follow.headers.get('location')).toMatch(/\/selling\/farm\?payouts=returned$/);
    expect((await agent.post('/farms/mine/payouts/refresh')).body.farm.payouts.state).toBe('ready');
    // A second link reuses the same account.
    const account = link.body.url.match(/acct_[a-f0-9]+/)![0];
    expect((await agent.post('/farms/mine/payouts/link')).body.url).toContain(account);
  });

  it('answers 502 with a clear message when the payment provider is down, keeping the profile', async () => {
    const { agent: first, email } = await signedInUser(t, 'grower');
    await first.put('/farms/mine', PROFILE);
    // Port 9 (discard) on loopback: nothing listens, so every provider call fails fast.
    const offline = new Stripe('sk_test_local_fake', { host: '127.0.0.1', port: 9, protocol: 'http', maxNetworkRetries: 0, telemetry: false });
    const agent = csrfAgent(createApi({ ...t.deps, stripe: offline }));
    await agent.post('/auth/sign-in', { email, password: 'fixture-password' });
    const res = await agent.post('/farms/mine/payouts/link');
    expect(res.status).toBe(502);
    expect(res.body.error).toMatchObject({ code: 'payments_unavailable' });
    expect((await agent.get('/farms/mine')).body.farm).toMatchObject({ name: PROFILE.name, payouts: { state: 'none' } });
  });

  it('is for growers only', async () => {
    const { agent } = await signedInUser(t, 'buyer');
    expect((await agent.put('/farms/mine', PROFILE)).status).toBe(403);
  });
});
