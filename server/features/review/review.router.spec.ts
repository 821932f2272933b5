import { and, eq } from 'drizzle-orm';
import { auditEvents } from '../../db/schema';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { completeLot, signedInGrower, signedInUser } from '../../../tests/support/grower-lot';
import { addLotApprovedListener } from './lot-approved';

describe('review API', () => {
  let t: TestApi;
  let grower: Awaited<ReturnType<typeof signedInGrower>>;
  let admin: Awaited<ReturnType<typeof signedInUser>>;

  beforeAll(async () => {
    t = await startTestApi();
    grower = await signedInGrower(t);
    admin = await signedInUser(t, 'admin');
  });
  afterAll(() => t.close());

  const submitted = async () => {
    const id = await completeLot(grower.agent);
    await grower.agent.post(`/selling/lots/${id}/submit`);
    return id;
  };

  it('queues submitted lots and shows the admin the values, findings and report', async () => {
    const id = await submitted();
    const queue = await admin.agent.get('/review/queue');
    expect(queue.status).toBe(200);
    expect(queue.body.items.find((r: { id: number }) => r.id === id)).toMatchObject({ labCertified: true, errorFindings: 0 });
    const view = await admin.agent.get(`/review/lots/${id}`);
    expect(view.body.lot.analysis.reportFile.url).toBe(`/api/uploads/lots/${id}/report`);
    expect(view.body.lot.evaluation.rfv).toBeGreaterThan(100);
    expect(view.body.farm.growerEmail).toBe(grower.email);
    expect((await grower.agent.get('/review/queue')).status).toBe(403);
  }, 20_000);

  it('approves: the lot is public and verified, the grower is e-mailed, the audit trail and listeners run', async () => {
    const id = await submitted();
    const heard: number[] = [];
    const stop = addLotApprovedListener((_deps, lotId) => void heard.push(lotId));
    const failing = addLotApprovedListener(() => {
      throw new Error('a listener that breaks must not undo the approval');
    });
    const res = await admin.agent.post(`/review/lots/${id}/approve`);
    stop();
    failing();
    expect(res.status).toBe(200);
    expect(res.body.lot).toMatchObject({ status: 'listed', analysis: { verification: 'verified' } });
    expect(heard).toEqual([id]);

    const pub = await t.agent().get(`/lots/${id}`);
    expect(pub.status).toBe(200);
    expect(pub.body.analysis.verification).toBe('verified');
    expect(pub.body.publishedAt).not.toBeNull();
    expect(t.mails.find((m) => m.to === grower.email && m.subject.startsWith('Listed:'))).toBeDefined();
    const audit = await t.deps.db.select().from(auditEvents).where(and(eq(auditEvents.entityId, String(id)), eq(auditEvents.action, 'lot.approved')));
    expect(audit).toHaveLength(1);
    expect((await admin.agent.post(`/review/lots/${id}/approve`)).status).toBe(409);
  }, 20_000);

  it('returns a lot with a reason the grower receives, and takes it back after a fix', async () => {
    const id = await submitted();
    const empty = await admin.agent.post(`/review/lots/${id}/return`, { reason: '' });
    expect(empty.status).toBe(400);
    const reason = 'The report shows ADF 31.0, not 29.0. Please correct it.';
    const res = await admin.agent.post(`/review/lots/${id}/return`, { reason });
    expect(res.body.lot).toMatchObject({ status: 'returned', reviewNote: reason });
    expect(t.mails.find((m) => m.to === grower.email && m.text.includes(reason))).toBeDefined();
    const audit = await t.deps.db.select().from(auditEvents).where(and(eq(auditEvents.entityId, String(id)), eq(auditEvents.action, 'lot.returned')));
    expect(audit[0]!.data).toEqual({ reason });
    expect((await t.agent().get(`/lots/${id}`)).status).toBe(404);

    const again = await grower.agent.post(`/selling/lots/${id}/submit`);
    expect(again.body).toMatchObject({ status: 'in_review', reviewNote: null, analysis: { verification: 'pending' } });
  }, 20_000);

  it('is for admins only', async () => {
    const buyer = await signedInUser(t, 'buyer');
    expect((await buyer.agent.post('/review/lots/1/approve')).status).toBe(403);
    expect((await t.agent().get('/review/queue')).status).toBe(401);
  });
});
