import { eq } from 'drizzle-orm';
import { labAnalyses } from '../../db/schema';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { ANALYSIS_STEP, LOT_STEP, QUANTITY_STEP, SAMPLING_STEP, signedInGrower } from '../../../tests/support/grower-lot';

/** Nitrate, mould and mycotoxin results through the lot form, on a sorghum-type lot. */
describe('selling API — nitrate, mould and mycotoxin results', () => {
  let t: TestApi;
  let grower: Awaited<ReturnType<typeof signedInGrower>>;

  beforeAll(async () => {
    t = await startTestApi();
    grower = await signedInGrower(t);
  });
  afterAll(() => t.close());

  async function lotUpToSampling(forageType: string): Promise<number> {
    const created = await grower.agent.post('/selling/lots', { ...LOT_STEP, forageType });
    expect(created.status).toBe(201);
    const id = created.body.id as number;
    expect((await grower.agent.put(`/selling/lots/${id}/quantity`, QUANTITY_STEP)).status).toBe(200);
    expect((await grower.agent.put(`/selling/lots/${id}/sampling`, SAMPLING_STEP)).status).toBe(200);
    return id;
  }

  it('takes a sorghum-sudangrass lot as a grass hay', async () => {
    const created = await grower.agent.post('/selling/lots', { ...LOT_STEP, forageType: 'sorghum_sudangrass' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ forageClass: 'grass', title: 'Sorghum-sudangrass, 2nd cutting — River Bottom' });
  });

  // Levels: AgSource mould bands (100,000–10,000,000 CFU/g caution advised); FDA fumonisin guidance for equids
  // (5 ppm at ≤ 20 % of the diet = 1 ppm in the whole diet); FDA aflatoxin action level 20 ppb.
  it('stores the results as the lab reported them, reads them back into the form, and records their findings', async () => {
    const id = await lotUpToSampling('sorghum_sudangrass');
    const values = { ...ANALYSIS_STEP.values, nitrateNo3PctDm: 0.9, mouldCfuPerG: 450_000, visualMouldScore: 'slight', aflatoxinPpb: 4, donPpm: 0.6, fumonisinPpm: 2.5 };
    const saved = await grower.agent.put(`/selling/lots/${id}/analysis`, { ...ANALYSIS_STEP, values });
    expect(saved.status).toBe(200);

    const [row] = await t.deps.db.select().from(labAnalyses).where(eq(labAnalyses.lotId, id));
    expect(row).toMatchObject({ mouldCfuPerG: 450_000, visualMouldScore: 'slight', aflatoxinPpb: 4, donPpm: 0.6, fumonisinPpm: 2.5, nitrateNo3PctDm: 0.9 });

    const resumed = (await grower.agent.get(`/selling/lots/${id}`)).body;
    expect(resumed.analysis.values).toMatchObject({ mouldCfuPerG: 450_000, visualMouldScore: 'slight', aflatoxinPpb: 4, donPpm: 0.6, fumonisinPpm: 2.5 });
    const codes = (resumed.evaluation.findings as { code: string }[]).map((f) => f.code);
    expect(codes).toEqual(expect.arrayContaining(['mould-count-caution', 'mould-seen-slight', 'aflatoxin-within-guidance', 'don-within-guidance', 'fumonisin-above-guidance']));
  });

  it('refuses impossible results with a 400 naming the field, and keeps nothing of them', async () => {
    const id = await lotUpToSampling('timothy');
    for (const [field, value] of [['mouldCfuPerG', -5], ['visualMouldScore', 'a lot'], ['fumonisinPpm', 5000], ['aflatoxinPpb', 'high']] as const) {
      const res = await grower.agent.put(`/selling/lots/${id}/analysis`, { ...ANALYSIS_STEP, values: { ...ANALYSIS_STEP.values, [field]: value } });
      expect(res.status).toBe(400);
      expect(JSON.stringify(res.body.error.details)).toContain(field);
    }
    expect(await t.deps.db.select().from(labAnalyses).where(eq(labAnalyses.lotId, id))).toEqual([]);
  });
});
