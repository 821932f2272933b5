import { and, eq } from 'drizzle-orm';
import { auditEvents, labAnalyses, lots } from '../../db/schema';
import type { TestApi } from '../../../tests/support/test-api';
import { startAdminApi, type SignedInUser } from '../../../tests/support/start-admin-api';
import { ANALYSIS_STEP, approveLot, completeLot, signedInGrower, signedInUser } from '../../../tests/support/grower-lot';
import { addLotApprovedListener } from './lot-approved';
import { simplePdf } from '../../../tests/support/simple-pdf';

describe('review API', () => {
  let t: TestApi;
  let grower: Awaited<ReturnType<typeof signedInGrower>>;
  let admin: SignedInUser;

  beforeAll(async () => {
    ({ t, admin } = await startAdminApi());
    grower = await signedInGrower(t);
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
  }, 60_000);

  it('approves: the lot is public and verified, the grower is e-mailed, the audit trail and listeners run', async () => {
    const id = await submitted();
    // The breaking listener comes before another one (after the built-in saved-search alerts), so a
    // failure that stopped the rest would show in `heard`.
    const heard: number[] = [];
    const failing = addLotApprovedListener(() => {
      throw new Error('a listener that breaks must not undo the approval');
    });
    const stop = addLotApprovedListener((_deps, lotId) => void heard.push(lotId));
    const res = await approveLot(admin.agent, id);
    failing();
    stop();
    expect(res.status).toBe(200);
    expect(res.body.lot).toMatchObject({ status: 'listed', analysis: { verification: 'verified' } });
    expect(heard).toEqual([id]);

    const pub = await t.agent().get(`/lots/${id}`);
    expect(pub.status).toBe(200);
    expect(pub.body.analysis.verification).toBe('verified');
    expect(pub.body.publishedAt).not.toBeNull();
    await t.drainJobs();
    expect(t.mails.find((m) => m.to === grower.email && m.subject.startsWith('Listed:'))).toBeDefined();
    const audit = await t.deps.db.select().from(auditEvents).where(and(eq(auditEvents.entityId, String(id)), eq(auditEvents.action, 'lot.approved')));
    expect(audit).toHaveLength(1);
    // The row keeps what the approval changed, from → to, at the API's clock.
    expect(audit[0]).toMatchObject({
      before: { status: 'in_review', analysisVerification: 'pending', publishedAt: null },
      after: { status: 'listed', analysisVerification: 'verified', publishedAt: t.clock.now().toISOString() },
      createdAt: t.clock.now(),
    });
    expect((await approveLot(admin.agent, id)).status).toBe(409);
  }, 60_000);

  it('approves only the revision the admin reviewed: a changed analysis or a swapped PDF answers 409 and nothing is approved', async () => {
    const id = await submitted();
    const seen = (await admin.agent.get(`/review/lots/${id}`)).body.revision as number;
    expect(seen).toEqual(expect.any(Number));
    // Meanwhile the grower changes the analysis.
    expect((await grower.agent.put(`/selling/lots/${id}/analysis`, { ...ANALYSIS_STEP, values: { ...ANALYSIS_STEP.values, crudeProteinPct: 24 } })).status).toBe(200);
    const stale = await admin.agent.post(`/review/lots/${id}/approve`, { revision: seen });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('lot_changed');
    expect(stale.body.error.message).toMatch(/changed this lot while you were reviewing it/);
    const [lot] = await t.deps.db.select().from(lots).where(eq(lots.id, id));
    expect(lot!.status).toBe('in_review');
    const [current] = await t.deps.db.select().from(labAnalyses).where(and(eq(labAnalyses.lotId, id), eq(labAnalyses.isCurrent, true)));
    expect(current!.verification).toBe('pending');
    // The same after a PDF swap.
    const fresh = (await admin.agent.get(`/review/lots/${id}`)).body.revision as number;
    expect(fresh).toBeGreaterThan(seen);
    const token = await grower.agent.token();
    const swap = await grower.agent.raw.post(`/uploads/lots/${id}/report`).set('X-XSRF-TOKEN', token).attach('report', await simplePdf(['Another report']), 'other.pdf');
    expect(swap.status).toBe(201);
    expect((await admin.agent.post(`/review/lots/${id}/approve`, { revision: fresh })).status).toBe(409);
    expect((await admin.agent.post(`/review/lots/${id}/approve`, {})).status).toBe(400);
    // Reviewing again and approving what was seen works.
    expect((await approveLot(admin.agent, id)).status).toBe(200);
  }, 60_000);

  it('a grower edit racing the approval never leaves unseen values listed (real concurrency against PostgreSQL)', async () => {
    const outcomes = new Set<string>();
    for (let round = 0; round < 6; round += 1) {
      const id = await submitted();
      const seen = (await admin.agent.get(`/review/lots/${id}`)).body.revision as number;
      const [approve, edit] = await Promise.all([
        admin.agent.post(`/review/lots/${id}/approve`, { revision: seen }),
        grower.agent.put(`/selling/lots/${id}/analysis`, { ...ANALYSIS_STEP, reportNumber: 'R-CHANGED', values: { ...ANALYSIS_STEP.values, crudeProteinPct: 24 } }),
      ]);
      expect(edit.status).toBe(200);
      expect([200, 409]).toContain(approve.status);
      outcomes.add(String(approve.status));
      if (round === 5) console.log(`approval outcomes over 6 races: ${[...outcomes].join(", ")}`);
      const [lot] = await t.deps.db.select().from(lots).where(eq(lots.id, id));
      const [current] = await t.deps.db.select().from(labAnalyses).where(and(eq(labAnalyses.lotId, id), eq(labAnalyses.isCurrent, true)));
      // Whichever came first, the changed analysis is pending and the lot waits for review; nothing unseen is verified.
      expect([lot!.status, current!.reportNumber, current!.verification]).toEqual(['in_review', 'R-CHANGED', 'pending']);
    }
  }, 120_000);

  it('returns a lot with a reason the grower receives, and takes it back after a fix', async () => {
    const id = await submitted();
    const empty = await admin.agent.post(`/review/lots/${id}/return`, { reason: '' });
    expect(empty.status).toBe(400);
    const reason = 'The report shows ADF 31.0, not 29.0. Please correct it.';
    const res = await admin.agent.post(`/review/lots/${id}/return`, { reason });
    expect(res.body.lot).toMatchObject({ status: 'returned', reviewNote: reason });
    await t.drainJobs();
    expect(t.mails.find((m) => m.to === grower.email && m.text.includes(reason))).toBeDefined();
    const audit = await t.deps.db.select().from(auditEvents).where(and(eq(auditEvents.entityId, String(id)), eq(auditEvents.action, 'lot.returned')));
    expect(audit[0]!.data).toEqual({ reason });
    expect((await t.agent().get(`/lots/${id}`)).status).toBe(404);

    expect(audit[0]).toMatchObject({ before: { status: 'in_review', reviewNote: null, analysisVerification: 'pending' }, after: { status: 'returned', reviewNote: reason, analysisVerification: 'rejected' } });

    const again = await grower.agent.post(`/selling/lots/${id}/submit`);
    expect(again.body).toMatchObject({ status: 'in_review', reviewNote: null, analysis: { verification: 'pending' } });
    const resubmitted = await t.deps.db.select().from(auditEvents).where(and(eq(auditEvents.entityId, String(id)), eq(auditEvents.action, 'lot.submitted')));
    expect(resubmitted.at(-1)).toMatchObject({ before: { status: 'returned', reviewNote: reason, analysisVerification: 'rejected' }, after: { status: 'in_review', reviewNote: null, analysisVerification: 'pending' } });

    // The review desk's history says it in words, newest first (status names from labels.ts).
    const history = (await admin.agent.get(`/review/lots/${id}`)).body.history as { action: string; changes: string }[];
    expect(history.slice(0, 2).map((h) => [h.action, h.changes])).toEqual([
      ['lot.submitted', `Status: Needs changes → With the reviewer; Note to the grower: ${reason} → —; Lab analysis: sent back → not yet checked`],
      ['lot.returned', `Status: With the reviewer → Needs changes; Note to the grower: — → ${reason}; Lab analysis: not yet checked → sent back`],
    ]);
  }, 60_000);

  it('shows each entered value beside the value read from the PDF and flags the mismatch', async () => {
    const id = await completeLot(grower.agent);
    // The grower typed ADF 29 (ANALYSIS_STEP); this report prints 31.0. Everything else agrees.
    const report = await simplePdf(['Invented Prairie Lab - results on a dry matter basis', 'Dry matter  89.0 %', 'Crude protein (CP)  21.0 %', 'ADF  31.0 %', 'NDF  38.0 %', 'Starch  2.0 %']);
    const token = await grower.agent.token();
    const up = await grower.agent.raw.post(`/uploads/lots/${id}/report`).set('X-XSRF-TOKEN', token).attach('report', report, 'report.pdf');
    expect(up.status).toBe(201);
    expect(up.body.reportFile.reading).toMatchObject({ status: 'read', values: { adfPct: { dm: 31 } } });
    await grower.agent.post(`/selling/lots/${id}/submit`);
    const view = await admin.agent.get(`/review/lots/${id}`);
    const by = Object.fromEntries((view.body.comparison as { field: string }[]).map((r) => [r.field, r]));
    expect(by['adfPct']).toMatchObject({ status: 'mismatch', entered: 29, read: 31, unit: '% of DM' });
    expect(by['crudeProteinPct']).toMatchObject({ status: 'match' });
    expect(by['ndfd48Pct']).toMatchObject({ status: 'not_on_report' });
    expect(view.body.history[0]).toMatchObject({ action: 'lot.submitted', label: 'Submitted for review', by: expect.stringContaining('grower') });
  }, 30_000);

  it('is for admins only', async () => {
    const buyer = await signedInUser(t, 'buyer');
    expect((await buyer.agent.post('/review/lots/1/approve')).status).toBe(403);
    expect((await t.agent().get('/review/queue')).status).toBe(401);
  });
});
