import { randomUUID } from 'node:crypto';
import { completeLot, signedInGrower, signedInUser } from './support/grower-lot';
import { startTestApi, type TestApi } from './support/test-api';

// Spans selling, review and saved searches: approving a lot is what makes it public, and that is
// the moment buyers whose saved search matches it hear about it.
describe('approving a lot alerts matching saved searches', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  it('e-mails the buyer whose saved search matches the newly approved lot, and nobody else', async () => {
    const grower = await signedInGrower(t, '66502');
    const title = `Alert check ${randomUUID().slice(0, 8)}`;
    const lotId = await completeLot(grower.agent, { lot: { title } });
    expect((await grower.agent.post(`/selling/lots/${lotId}/submit`)).status).toBe(200);

    const matching = await signedInUser(t, 'buyer');
    const other = await signedInUser(t, 'buyer');
    // The lot is alfalfa at ADF 29 / NDF 38 (RFV ≈ 160) and CP 21% DM (tests/support/grower-lot.ts).
    expect((await matching.agent.post('/saved-searches', { name: 'Rich alfalfa', query: { q: title, forageType: 'alfalfa', rfvMin: '150' } })).status).toBe(201);
    expect((await other.agent.post('/saved-searches', { name: 'Grass only', query: { q: title, forageType: 'timothy' } })).status).toBe(201);

    const admin = await signedInUser(t, 'admin');
    t.mails.length = 0;
    const approved = await admin.agent.post(`/review/lots/${lotId}/approve`);
    expect(approved.status).toBe(200);

    const alerts = t.mails.filter((m) => m.to === matching.email || m.to === other.email);
    expect(alerts.map((m) => m.to)).toEqual([matching.email]);
    expect(alerts[0]!.text).toContain(title);
    // The grower hears about the approval too.
    expect(t.mails.some((m) => m.to === grower.email)).toBe(true);
  });
});
