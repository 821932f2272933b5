import { and, asc, eq, inArray } from 'drizzle-orm';
import { auditEvents, labAnalyses, lots } from '../../db/schema';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { approveLot, ANALYSIS_STEP, completeLot, LOT_STEP, makeJpeg, PRICE_STEP, QUANTITY_STEP, SAMPLING_STEP, signedInGrower, signedInUser } from '../../../tests/support/grower-lot';

describe('selling API', () => {
  let t: TestApi;
  let grower: Awaited<ReturnType<typeof signedInGrower>>;

  beforeAll(async () => {
    t = await startTestApi();
    grower = await signedInGrower(t);
  });
  afterAll(() => t.close());

  it('saves each step as a draft that can be resumed, deriving the quantity figures', async () => {
    const created = await grower.agent.post('/selling/lots', LOT_STEP);
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ status: 'draft', draftStep: 1, title: 'Alfalfa, 2nd cutting — River Bottom', forageClass: 'legume', quantity: null });
    const id = created.body.id;

    // 40 tons in 1,000 lb bales → 80 bales (tons = bales × lb ÷ 2000, trade convention).
    const q = await grower.agent.put(`/selling/lots/${id}/quantity`, { baleType: 'round_4x5', totalTons: 40, avgBaleWeightLb: 1000 });
    expect(q.status).toBe(200);
    expect(q.body.quantity).toMatchObject({ baleCount: 80, avgBaleWeightLb: 1000, totalTons: 40, balesAvailable: 80 });

    const resumed = await grower.agent.get(`/selling/lots/${id}`);
    expect(resumed.body).toMatchObject({ draftStep: 2, sampling: null, analysis: null, price: null });
    expect(resumed.body.missing).toEqual(expect.arrayContaining(['the sampling record', 'the lab analysis values', 'at least one photo']));
  });

  it('refuses steps saved out of order, and inconsistent quantities', async () => {
    const { body } = await grower.agent.post('/selling/lots', LOT_STEP);
    const early = await grower.agent.put(`/selling/lots/${body.id}/analysis`, ANALYSIS_STEP);
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe('step_out_of_order');
    const clash = await grower.agent.put(`/selling/lots/${body.id}/quantity`, { baleType: 'round_4x5', baleCount: 80, avgBaleWeightLb: 1000, totalTons: 55 });
    expect(clash.status).toBe(400);
    expect(clash.body.error.details[0].path).toBe('totalTons');
    const one = await grower.agent.put(`/selling/lots/${body.id}/quantity`, { baleType: 'round_4x5', baleCount: 80 });
    expect(one.body.error.message).toMatch(/two of bale count/);
  });

  // The test clock stands at 2026-09-15 (tests/support/test-clock); a date may be at most one day ahead of it.
  it('refuses impossible lot dates with 400 beside the field: year 9999, before 1990, sample before harvest, report before sample', async () => {
    const detail = (res: { status: number; body: { error: { details: { path: string; message: string }[] } } }) => [res.status, res.body.error?.details?.[0]?.path];
    expect(detail(await grower.agent.post('/selling/lots', { ...LOT_STEP, harvestStartedOn: '9999-06-10', harvestEndedOn: '9999-06-11' }))).toEqual([400, 'harvestStartedOn']);
    expect(detail(await grower.agent.post('/selling/lots', { ...LOT_STEP, harvestEndedOn: '2026-09-17' }))).toEqual([400, 'harvestEndedOn']);
    const old = await grower.agent.post('/selling/lots', { ...LOT_STEP, harvestStartedOn: '1902-06-10' });
    expect(detail(old)).toEqual([400, 'harvestStartedOn']);
    expect(old.body.error.message).toMatch(/before 1990/);
    // Tomorrow by the clock is still accepted (a grower west of UTC is a day behind).
    const { body: lot } = await grower.agent.post('/selling/lots', { ...LOT_STEP, harvestStartedOn: '2026-09-15', harvestEndedOn: '2026-09-16' });
    expect(lot.id).toEqual(expect.any(Number));
    await grower.agent.put(`/selling/lots/${lot.id}/quantity`, QUANTITY_STEP);
    const early = await grower.agent.put(`/selling/lots/${lot.id}/sampling`, { ...SAMPLING_STEP, sampledOn: '2026-09-14' });
    expect(detail(early)).toEqual([400, 'sampledOn']);
    expect(early.body.error.message).toMatch(/on or after the first day of harvest/);
    expect((await grower.agent.put(`/selling/lots/${lot.id}/sampling`, { ...SAMPLING_STEP, sampledOn: '2026-09-15' })).status).toBe(200);
    const report = await grower.agent.put(`/selling/lots/${lot.id}/analysis`, { ...ANALYSIS_STEP, reportDate: '2026-09-14' });
    expect(detail(report)).toEqual([400, 'reportDate']);
    expect(report.body.error.message).toMatch(/cannot be dated before the sample/);
    expect((await grower.agent.put(`/selling/lots/${lot.id}/analysis`, { ...ANALYSIS_STEP, reportDate: '2026-09-16' })).status).toBe(200);
    // Moving the harvest after the stored sample date is refused on the harvest field.
    expect(detail(await grower.agent.put(`/selling/lots/${lot.id}/lot`, { ...LOT_STEP, harvestStartedOn: '2026-09-16', harvestEndedOn: '2026-09-16' }))).toEqual([400, 'harvestStartedOn']);
  });

  it('rejects an analysis with ADF above NDF, naming the field', async () => {
    const { body } = await grower.agent.post('/selling/lots', LOT_STEP);
    await grower.agent.put(`/selling/lots/${body.id}/quantity`, QUANTITY_STEP);
    await grower.agent.put(`/selling/lots/${body.id}/sampling`, SAMPLING_STEP);
    const bad = await grower.agent.put(`/selling/lots/${body.id}/analysis`, { ...ANALYSIS_STEP, values: { ...ANALYSIS_STEP.values, adfPct: 42, ndfPct: 38 } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('analysis_inconsistent');
    expect(bad.body.error.message).toMatch(/NDF .* must be higher than ADF/);
    expect(bad.body.error.details[0]).toMatchObject({ path: 'values.adfPct', code: 'ndf-below-adf' });
    const missing = await grower.agent.put(`/selling/lots/${body.id}/analysis`, { ...ANALYSIS_STEP, values: { basis: 'dm', dryMatterPct: 88 } });
    expect(missing.status).toBe(400);
    expect(missing.body.error.details.map((d: { path: string }) => d.path)).toEqual(expect.arrayContaining(['values.crudeProteinPct', 'values.adfPct', 'values.ndfPct']));
  });

  it('stores as-fed values on a dry-matter basis and gives them back as typed', async () => {
    const { body } = await grower.agent.post('/selling/lots', LOT_STEP);
    await grower.agent.put(`/selling/lots/${body.id}/quantity`, QUANTITY_STEP);
    await grower.agent.put(`/selling/lots/${body.id}/sampling`, { sampledOn: '2026-07-08', coresTaken: 12, balesSampled: 12, probeDiameterIn: 0.5, probeLengthIn: 18, corePosition: 'butt-end-centre', sampledBy: 'Me' });
    const res = await grower.agent.put(`/selling/lots/${body.id}/analysis`, { ...ANALYSIS_STEP, values: { basis: 'asFed', dryMatterPct: 88, crudeProteinPct: 17.6, adfPct: 26.4, ndfPct: 35.2 } });
    expect(res.status).toBe(200);
    expect(res.body.analysis.values).toMatchObject({ basis: 'asFed', crudeProteinPct: 17.6, adfPct: 26.4 });
    // 17.6 as fed at 88% DM = 20% of dry matter (domain brief §1).
    expect(res.body.evaluation.dm.crudeProteinPct).toBeCloseTo(20, 6);
    // 12 cores is below the 20-core protocol minimum (Teutsch 2020): saved, but marked not compliant.
    expect(res.body.samplingReport.compliant).toBe(false);
  });

  it('submits a complete lot for review and refuses an incomplete one', async () => {
    const { body } = await grower.agent.post('/selling/lots', LOT_STEP);
    const early = await grower.agent.post(`/selling/lots/${body.id}/submit`);
    expect(early.status).toBe(400);
    expect(early.body.error.code).toBe('lot_incomplete');
    const id = await completeLot(grower.agent);
    const res = await grower.agent.post(`/selling/lots/${id}/submit`);
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('in_review');
    expect((await grower.agent.post(`/selling/lots/${id}/submit`)).status).toBe(409);
  }, 20_000);

  it('forbids a second grower from editing the lot (403) and a buyer from creating one (403)', async () => {
    const id = await completeLot(grower.agent);
    const other = await signedInGrower(t);
    const edit = await other.agent.put(`/selling/lots/${id}/price`, PRICE_STEP);
    expect(edit.status).toBe(403);
    expect(edit.body.error.code).toBe('forbidden');
    expect((await other.agent.get(`/selling/lots/${id}`)).status).toBe(403);
    expect((await other.agent.post(`/selling/lots/${id}/withdraw`)).status).toBe(403);

    const buyer = await signedInUser(t, 'buyer');
    const create = await buyer.agent.post('/selling/lots', LOT_STEP);
    expect(create.status).toBe(403);
    expect((await t.agent().post('/selling/lots', LOT_STEP)).status).toBe(401);
  }, 20_000);

  it('asks a grower without a farm to set one up first', async () => {
    const newcomer = await signedInUser(t, 'grower');
    const res = await newcomer.agent.post('/selling/lots', LOT_STEP);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('farm_required');
  });

  it('after approval: price and stock changes keep the lot listed, an analysis change sends it back to review', async () => {
    const id = await completeLot(grower.agent);
    await grower.agent.post(`/selling/lots/${id}/submit`);
    const admin = await signedInUser(t, 'admin');
    await approveLot(admin.agent, id);

    const price = await grower.agent.put(`/selling/lots/${id}/price`, { ...PRICE_STEP, priceCentsPerTon: 30000 });
    expect(price.body.status).toBe('listed');
    const stock = await grower.agent.put(`/selling/lots/${id}/quantity`, { ...QUANTITY_STEP, balesAvailable: 450 });
    expect(stock.body).toMatchObject({ status: 'listed', quantity: { balesAvailable: 450 } });

    const changed = await grower.agent.put(`/selling/lots/${id}/analysis`, { ...ANALYSIS_STEP, values: { ...ANALYSIS_STEP.values, crudeProteinPct: 23 } });
    expect(changed.body.status).toBe('in_review');
    expect(changed.body.analysis.verification).toBe('pending');
    // The verified version is kept, no longer current.
    const versions = await t.deps.db.select().from(labAnalyses).where(eq(labAnalyses.lotId, id));
    expect(versions.map((v) => [v.isCurrent, v.verification, v.crudeProteinPct]).sort()).toEqual([[false, 'verified', 21], [true, 'pending', 23]].sort());
    expect((await t.agent().get(`/lots/${id}`)).status).toBe(404);
  }, 30_000);

  it('records optional growing conditions, shows them to buyers on the listed lot, and sends a listed lot back to review when they change', async () => {
    const unset = await grower.agent.post('/selling/lots', LOT_STEP);
    expect(unset.body.lot).toMatchObject({ droughtStressed: false, heavyNitrogen: false });
    const bad = await grower.agent.put(`/selling/lots/${unset.body.id}/lot`, { ...LOT_STEP, droughtStressed: 'very' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.map((d: { path: string }) => d.path)).toContain('droughtStressed');

    const id = await completeLot(grower.agent, { lot: { droughtStressed: true } });
    await grower.agent.post(`/selling/lots/${id}/submit`);
    const admin = await signedInUser(t, 'admin');
    await approveLot(admin.agent, id);
    const listed = await t.agent().get(`/lots/${id}`);
    expect(listed.body).toMatchObject({ droughtStressed: true, heavyNitrogen: false });

    // Buyers rely on them (they prompt a nitrate test), so a change is a fact the admin looks at again.
    const changed = await grower.agent.put(`/selling/lots/${id}/lot`, { ...LOT_STEP, droughtStressed: true, heavyNitrogen: true });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ status: 'in_review', lot: { droughtStressed: true, heavyNitrogen: true } });
  }, 30_000);

  it('after approval: a change of the description, storage or bale type sends the lot back to review (lot life-cycle, README)', async () => {
    const approve = async () => {
      const id = await completeLot(grower.agent);
      await grower.agent.post(`/selling/lots/${id}/submit`);
      const admin = await signedInUser(t, 'admin');
      expect((await approveLot(admin.agent, id)).status).toBe(200);
      return id;
    };
    const a = await approve();
    const described = await grower.agent.put(`/selling/lots/${a}/lot`, { ...LOT_STEP, description: 'Now said to be leafier than the report shows.' });
    expect(described.body).toMatchObject({ status: 'in_review', analysis: { verification: 'pending' } });
    expect((await t.agent().get(`/lots/${a}`)).status).toBe(404);

    const b = await approve();
    expect((await grower.agent.put(`/selling/lots/${b}/lot`, { ...LOT_STEP, storage: 'outside' })).body.status).toBe('in_review');

    const c = await approve();
    const reshaped = await grower.agent.put(`/selling/lots/${c}/quantity`, { ...QUANTITY_STEP, baleType: 'round_5x5' });
    expect(reshaped.body.status).toBe('in_review');
  }, 60_000);

  it('orders the photos with a chosen cover, and moves the cover on when the cover photo is removed', async () => {
    const id = await completeLot(grower.agent);
    const token = await grower.agent.token();
    const added = await grower.agent.raw.post(`/uploads/lots/${id}/photos`).set('X-XSRF-TOKEN', token).attach('photos', await makeJpeg(800, 600, 3), 'second.jpg');
    expect(added.status).toBe(201);
    const before = (await grower.agent.get(`/selling/lots/${id}`)).body.photos as Array<{ id: number; isCover: boolean }>;
    expect(before).toHaveLength(2);
    const [first, second] = before.map((p) => p.id) as [number, number];

    const mismatch = await grower.agent.put(`/selling/lots/${id}/photo-order`, { order: [second], coverId: second });
    expect(mismatch.status).toBe(400);
    expect(mismatch.body.error.code).toBe('photo_order_mismatch');

    const ordered = await grower.agent.put(`/selling/lots/${id}/photo-order`, { order: [second, first], coverId: second });
    expect(ordered.status).toBe(200);
    expect(ordered.body.photos.map((p: { id: number; isCover: boolean }) => [p.id, p.isCover])).toEqual([[second, true], [first, false]]);

    const removed = await grower.agent.delete(`/selling/lots/${id}/photos/${second}`);
    expect(removed.status).toBe(200);
    expect(removed.body.photos.map((p: { id: number; isCover: boolean }) => [p.id, p.isCover])).toEqual([[first, true]]);
    expect((await grower.agent.delete(`/selling/lots/${id}/photos/${second}`)).status).toBe(404);
    expect((await grower.agent.delete(`/selling/lots/${id}/photos/2147483648`)).status).toBe(404);
  }, 60_000);

  it('withdraws and relists, and copies a lot as the start of the next cutting', async () => {
    const id = await completeLot(grower.agent);
    await grower.agent.post(`/selling/lots/${id}/submit`);
    const admin = await signedInUser(t, 'admin');
    await approveLot(admin.agent, id);

    expect((await grower.agent.post(`/selling/lots/${id}/withdraw`)).body.status).toBe('withdrawn');
    expect((await t.agent().get(`/lots/${id}`)).status).toBe(404);
    expect((await grower.agent.post(`/selling/lots/${id}/relist`)).body.status).toBe('listed');
    // A browser's view is counted (once a day per visitor; lot-views.spec); a request without a browser is not.
    expect((await t.agent().raw.get(`/lots/${id}`).set('User-Agent', 'Mozilla/5.0 (X11; Linux x86_64; rv:128.0) Gecko/20100101 Firefox/128.0')).status).toBe(200);
    // Each step is in the audit trail with the state it left and the state it reached.
    const trail = await t.deps.db.select().from(auditEvents).where(and(eq(auditEvents.entityType, 'lot'), eq(auditEvents.entityId, String(id)), inArray(auditEvents.action, ['lot.withdrawn', 'lot.relisted']))).orderBy(asc(auditEvents.id));
    expect(trail.map((r) => [r.action, r.before, r.after])).toEqual([
      ['lot.withdrawn', { status: 'listed' }, { status: 'withdrawn' }],
      ['lot.relisted', { status: 'withdrawn' }, { status: 'listed' }],
    ]);
    // The audit page reads them in words: the states as labels.ts names them.
    const page = (await admin.agent.get(`/admin/audit?entityType=lot&entityId=${id}`)).body.items as { action: string; changes: { label: string; from: string; to: string }[] }[];
    expect(page.find((r) => r.action === 'lot.withdrawn')!.changes).toEqual([{ field: 'status', label: 'Status', from: 'Listed', to: 'Paused' }]);

    const copy = await grower.agent.post(`/selling/lots/${id}/copy`);
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ status: 'draft', draftStep: 2, title: 'Alfalfa, 3rd cutting — River Bottom', sampling: null, analysis: null, photos: [] });
    expect(copy.body.lot.cutting).toBe(3);
    const [row] = await t.deps.db.select().from(lots).where(and(eq(lots.id, copy.body.id)));
    expect(row!.copiedFromId).toBe(id);

    const mine = await grower.agent.get('/selling/lots');
    const listed = mine.body.items.find((r: { id: number }) => r.id === id);
    expect(listed).toMatchObject({ status: 'listed', balesAvailable: 600, viewCount: 1, orderCount: 0 });
    expect(listed.tonsAvailable).toBeCloseTo(33, 6); // 600 × 110 lb ÷ 2000
  }, 30_000);

  it('serves the lab-values CSV template', async () => {
    const res = await grower.agent.get('/selling/analysis-template.csv');
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.text).toContain('crudeProteinPct');
  });
});
