import { randomUUID } from 'node:crypto';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { approveLot, completeLot, signedInGrower, signedInUser } from '../../../tests/support/grower-lot';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { TEST_NOW } from '../../../tests/support/test-clock';
import { plusDays } from '@shared/time/days';

describe('lots API', () => {
  let t: TestApi;
  // A tag in every title keeps this file's lots apart from other tests sharing the database.
  const tag = `T${randomUUID().slice(0, 8)}`;
  let ids: Record<string, number>;

  beforeAll(async () => {
    t = await startTestApi();
    const near = await createGrower(t.deps.db, '66502'); // Manhattan, KS
    const far = await createGrower(t.deps.db, '68901'); // Hastings, NE
    ids = {
      rich: (await createLot(t.deps.db, near.farm.id, { title: `${tag} rich`, priceDollarsPerTon: 320, analysis: { adfPct: 28, ndfPct: 36, crudeProteinPct: 22 } })).id,
      plain: (await createLot(t.deps.db, near.farm.id, { title: `${tag} plain`, priceDollarsPerTon: 200, analysis: { adfPct: 36, ndfPct: 50, crudeProteinPct: 15, nitrateNo3PctDm: 0.73 } })).id,
      far: (await createLot(t.deps.db, far.farm.id, { title: `${tag} far`, priceDollarsPerTon: 250, analysis: { adfPct: 30, ndfPct: 40, crudeProteinPct: 19 } })).id,
      hidden: (await createLot(t.deps.db, near.farm.id, { title: `${tag} hidden`, status: 'in_review' })).id,
    };
  });
  afterAll(() => t.close());

  const search = (query: string) => t.agent().get(`/lots?q=${tag}&${query}`);

  it('filters to lots whose current analysis has a nitrate result', async () => {
    const res = await search('nitrateTestedOnly=true');
    expect(res.status).toBe(200);
    expect(res.body.items.map((l: { id: number }) => l.id)).toEqual([ids['plain']]);
  });

  // 0.73 % nitrate ≈ 1,649 ppm nitrate-N: above Clemson's 1,000 ppm "safe under all conditions", below the ~1.5 % horse limit.
  it('stores the nitrate result and its finding with the analysis', async () => {
    const res = await t.agent().get(`/lots/${ids['plain']}`);
    expect(res.status).toBe(200);
    expect(JSON.stringify(res.body)).toContain('nitrate-above-livestock-safe');
  });
  const titles = (body: { items: { title: string }[] }) => body.items.map((i) => i.title.replace(`${tag} `, ''));

  it('lists only listed lots, with total and computed RFV and protein', async () => {
    const res = await search('sort=price');
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(3);
    expect(titles(res.body)).toEqual(['plain', 'far', 'rich']);
    const rich = res.body.items.find((i: { id: number }) => i.id === ids['rich']);
    // RFV of ADF 28 / NDF 36 by Rohweder et al. (1978): (88.9 − 0.779·28)·(120/36)/1.29 = 173.35
    expect(rich.rfv).toBeCloseTo(173.35, 1);
    expect(rich.crudeProteinPct).toBe(22);
    expect(rich.priceCentsPerDmTon).toBe(Math.round(32000 / 0.88));
  });

  it('sets no cookie on a catalogue read, so server-rendered pages can hand the response to the browser', async () => {
    const res = await t.agent().get(`/lots?q=${tag}`);
    expect(res.status).toBe(200);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('filters by RFV and protein ranges', async () => {
    expect(titles((await search('rfvMin=140')).body).sort()).toEqual(['far', 'rich']);
    expect(titles((await search('cpMin=16&cpMax=20')).body)).toEqual(['far']);
  });

  it('filters by distance from a ZIP and reports miles', async () => {
    const res = await search('zip=66502&radiusMi=50&sort=distance');
    expect(titles(res.body).sort()).toEqual(['plain', 'rich']);
    expect(res.body.items[0].distanceMi).toBeLessThan(1);
    expect(res.body.origin).toMatchObject({ zip: '66502', state: 'KS' });
    const all = await search('zip=66502&sort=distance');
    expect(titles(all.body)[2]).toBe('far');
    // Manhattan KS to Hastings NE is roughly 150 miles in a straight line (from memory; checked only loosely).
    expect(all.body.items[2].distanceMi).toBeGreaterThan(120);
    expect(all.body.items[2].distanceMi).toBeLessThan(180);
  });

  it('pages with a stable total', async () => {
    const first = await search('sort=price&pageSize=2');
    const second = await search('sort=price&pageSize=2&page=2');
    expect(first.body.total).toBe(3);
    expect(second.body.total).toBe(3);
    expect([...titles(first.body), ...titles(second.body)]).toEqual(['plain', 'far', 'rich']);
  });

  it('rejects bad filters with 400 naming the field', async () => {
    const res = await t.agent().get('/lots?rfvMin=abc&sort=cheapest&zip=123');
    expect(res.status).toBe(400);
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['rfvMin', 'sort', 'zip']));
    expect((await t.agent().get('/lots?radiusMi=10')).status).toBe(400);
    expect((await t.agent().get('/lots?zip=00000')).body.error.code).toBe('unknown_zip');
  });

  // Source: Teutsch, Univ. Kentucky 2020: at least 20 cores, one per bale. The verdict comes from the forage
  // engine when the grower saves the sampling step, never from a flag the test sets.
  it('shows the sampling verdict the protocol gives a listed lot: 20 cores compliant, 19 cores not', async () => {
    const own = `S${randomUUID().slice(0, 8)}`; // apart from the lots the other tests count
    const grower = await signedInGrower(t);
    const admin = await signedInUser(t, 'admin');
    const listed = async (cores: number) => {
      const id = await completeLot(grower.agent, { lot: { title: `${own} cores ${cores}` }, sampling: { coresTaken: cores, balesSampled: cores } });
      expect((await grower.agent.post(`/selling/lots/${id}/submit`)).status).toBe(200);
      expect((await approveLot(admin.agent, id)).status).toBe(200);
      return (await t.agent().get(`/lots/${id}`)).body;
    };
    const twenty = await listed(20);
    expect(twenty.sampling).toMatchObject({ coresTaken: 20, compliant: true });
    expect(twenty.samplingReport).toMatchObject({ compliant: true });
    const nineteen = await listed(19);
    expect(nineteen.sampling).toMatchObject({ coresTaken: 19, compliant: false });
    expect(nineteen.samplingReport.compliant).toBe(false);
    expect(nineteen.samplingReport.findings.map((f: { code: string }) => f.code)).toContain('too-few-cores');
    // The catalogue's "sampled to protocol" filter agrees.
    const compliantOnly = await t.agent().get(`/lots?q=${own}&compliantOnly=true`);
    expect(compliantOnly.body.items.map((i: { title: string }) => i.title)).toEqual([`${own} cores 20`]);
  }, 120_000);

  // The protocol judges a sample's age on the day the lot is listed (at most 180 days, the engine's default,
  // `common practice`). A lot saved with a 69-day-old sample and approved 120 days later (189 days) is not
  // sampled to protocol: the lot page and the catalogue's filter must both say so.
  it('gives the lot page and the "sampled to protocol" filter one verdict when time passes before listing', async () => {
    const own = `A${randomUUID().slice(0, 8)}`;
    const grower = await signedInGrower(t);
    const admin = await signedInUser(t, 'admin');
    const id = await completeLot(grower.agent, { lot: { title: `${own} aged` } }); // sampled 2026-07-08, saved on TEST_NOW
    expect((await grower.agent.post(`/selling/lots/${id}/submit`)).status).toBe(200);
    try {
      t.clock.set(plusDays(new Date(TEST_NOW), 120));
      expect((await approveLot(admin.agent, id)).status).toBe(200);
    } finally {
      t.clock.set(TEST_NOW);
    }
    const page = (await t.agent().get(`/lots/${id}`)).body;
    expect(page.samplingReport.findings.map((f: { code: string }) => f.code)).toContain('sample-too-old');
    expect(page.samplingReport.compliant).toBe(false);
    expect(page.sampling.compliant).toBe(false);
    const titles = async (query: string) => (await t.agent().get(`/lots?q=${own}${query}`)).body.items.map((i: { title: string }) => i.title);
    expect(await titles('')).toEqual([`${own} aged`]);
    expect(await titles('&compliantOnly=true')).toEqual([]);
  }, 120_000);

  it('shows a listed lot and hides one under review from the public', async () => {
    const shown = await t.agent().get(`/lots/${ids['rich']}`);
    expect(shown.status).toBe(200);
    expect(shown.body.analysis).toMatchObject({ crudeProteinPct: 22, adfPct: 28, ndfPct: 36, verification: 'verified' });
    expect(shown.body.sampling).toMatchObject({ coresTaken: 20 });
    expect((await t.agent().get(`/lots/${ids['hidden']}`)).status).toBe(404);
  });

  it('answers 404, never 500, to a lot id that cannot exist: not a whole number, or beyond PostgreSQL integer range (2147483647, PostgreSQL manual "Numeric Types")', async () => {
    for (const id of ['not-a-number', '0', '-3', '1.5', '2147483648', '99999999999999999999']) {
      const res = await t.agent().get(`/lots/${id}`);
      expect({ id, status: res.status, code: res.body.error?.code }).toEqual({ id, status: 404, code: 'not_found' });
    }
    expect((await t.agent().get('/uploads/lots/2147483648/report')).status).toBe(404);
  });
});
