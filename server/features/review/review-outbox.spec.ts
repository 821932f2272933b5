import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { approveLot, completeLot, signedInGrower, signedInUser } from '../../../tests/support/grower-lot';

// The review desk's e-mails go through the outbox: an SMTP outage neither fails nor slows the admin's
// request, and the grower still gets the e-mail once SMTP is back.
describe('review e-mails through the outbox', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  it('approves while SMTP is down and delivers the grower’s e-mail when it is back', async () => {
    const grower = await signedInGrower(t);
    const id = await completeLot(grower.agent);
    expect((await grower.agent.post(`/selling/lots/${id}/submit`)).status).toBe(200);
    const admin = await signedInUser(t, 'admin');

    t.smtp.down = true;
    const approved = await approveLot(admin.agent, id);
    expect(approved.status).toBe(200);
    expect(approved.body.lot.status).toBe('listed');
    const outage = await t.drainJobs();
    expect(outage.failed).toBeGreaterThanOrEqual(1);
    expect(t.mails.filter((m) => m.to === grower.email)).toEqual([]);

    t.smtp.down = false;
    await t.drainJobs({ includeDelayed: true });
    const delivered = t.mails.filter((m) => m.to === grower.email);
    expect(delivered).toHaveLength(1);
    expect(delivered[0]!.subject).toMatch(/^Listed:/);
  }, 30_000);
});
