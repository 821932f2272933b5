import { randomUUID } from 'node:crypto';
import { eq, inArray, sql } from 'drizzle-orm';
import { samplingRecords } from '../../db/schema';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { refreshStoredSamplingVerdicts } from './sampling-report';
import { REFRESH_SAMPLING_VERDICTS, SAMPLING_REFRESH_CRON, startSamplingVerdictRefresh } from './sampling-verdict-refresh';

describe('stored sampling verdicts', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  // Source: Teutsch, Univ. Kentucky 2020: at least 20 cores, one per bale. A row stored under earlier rules
  // (here: 12 cores with the verdict "compliant, no findings") keeps that verdict until one of its inputs
  // changes; the refresh brings it, the lot page and the catalogue's filter to today's rules.
  it('fixes an old row whose stored verdict no longer follows the rules, and the lot page and catalogue filter agree', async () => {
    const own = `V${randomUUID().slice(0, 8)}`;
    const grower = await createGrower(t.deps.db);
    const lot = await createLot(t.deps.db, grower.farm.id, { title: `${own} old row` });
    await t.deps.db.update(samplingRecords).set({ coresTaken: 12, balesSampled: 12, compliant: true, findings: [] }).where(eq(samplingRecords.lotId, lot.id));
    const titles = async (query: string) => (await t.agent().get(`/lots?q=${own}${query}`)).body.items.map((i: { title: string }) => i.title);
    expect((await t.agent().get(`/lots/${lot.id}`)).body.samplingReport.compliant).toBe(true); // stale
    expect(await titles('&compliantOnly=true')).toEqual([`${own} old row`]);

    expect(await refreshStoredSamplingVerdicts(t.deps.db, t.clock.now(), [lot.id])).toBe(1);

    const page = (await t.agent().get(`/lots/${lot.id}`)).body;
    expect(page.samplingReport.compliant).toBe(false);
    expect(page.samplingReport.findings.map((f: { code: string }) => f.code)).toContain('too-few-cores');
    expect(page.sampling.compliant).toBe(false);
    expect(await titles('')).toEqual([`${own} old row`]);
    expect(await titles('&compliantOnly=true')).toEqual([]);
    // An up-to-date row is left alone.
    expect(await refreshStoredSamplingVerdicts(t.deps.db, t.clock.now(), [lot.id])).toBe(0);
  });

  // A refresh that fixes many rows must not empty the servers' catalogue caches once per row: at 100,000 lots a
  // row-by-row refresh sent tens of thousands of notices and kept every cache cold for minutes. One page is
  // written in one transaction, and PostgreSQL delivers a notice repeated in one transaction once (PostgreSQL manual, NOTIFY).
  it('writes a page of changed verdicts in one transaction, so the catalogue caches are emptied once, not once per row', async () => {
    const grower = await createGrower(t.deps.db);
    const made = await Promise.all([1, 2, 3].map((i) => createLot(t.deps.db, grower.farm.id, { title: `stale ${i}` })));
    const ids = made.map((l) => l.id);
    await t.deps.db.update(samplingRecords).set({ coresTaken: 12, balesSampled: 12, compliant: true, findings: [] }).where(inArray(samplingRecords.lotId, ids));
    expect(await refreshStoredSamplingVerdicts(t.deps.db, t.clock.now(), ids)).toBe(3);
    // Rows written by one transaction share its id (xmin); other suites' writes at the same time cannot blur this.
    const writers = await t.deps.db.execute<{ xmin: string }>(sql`select distinct xmin::text as xmin from sampling_records where lot_id in ${ids}`);
    expect(writers.rows).toHaveLength(1);
  });

  it('stores one daily refresh schedule however many workers start (common practice: a cron per job, not per process)', async () => {
    await Promise.all([startSamplingVerdictRefresh(t.deps), startSamplingVerdictRefresh(t.deps)]);
    const schedules = await t.deps.jobs.schedules();
    expect(schedules.filter((s) => s.name === REFRESH_SAMPLING_VERDICTS.name)).toEqual([{ name: REFRESH_SAMPLING_VERDICTS.name, cron: SAMPLING_REFRESH_CRON }]);
  });
});
