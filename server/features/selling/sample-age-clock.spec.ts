import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { LOT_STEP, QUANTITY_STEP, SAMPLING_STEP, signedInGrower } from '../../../tests/support/grower-lot';
import { TEST_NOW } from '../../../tests/support/test-clock';

/*
 * The sample-age check compares the sample date with the API's clock, never the machine's: fixtures dated
 * a few weeks before TEST_NOW stay compliant in any year the suite runs, and moving the clock ages them.
 * Policy: samples older than 180 days at listing are refused (shared/forage/sampling-findings.ts).
 */
describe('sample age against the injected clock', () => {
  let t: TestApi;
  let grower: Awaited<ReturnType<typeof signedInGrower>>;

  beforeAll(async () => {
    t = await startTestApi();
    grower = await signedInGrower(t);
  });
  afterEach(() => t.clock.set(TEST_NOW));
  afterAll(() => t.close());

  async function draftWithQuantity(): Promise<number> {
    const { body } = await grower.agent.post('/selling/lots', LOT_STEP);
    await grower.agent.put(`/selling/lots/${body.id}/quantity`, QUANTITY_STEP);
    return body.id;
  }

  it('finds the fixture sample compliant on the test date, whatever the real date is', async () => {
    const id = await draftWithQuantity();
    const res = await grower.agent.put(`/selling/lots/${id}/sampling`, SAMPLING_STEP);
    expect(res.status).toBe(200);
    expect(res.body.samplingReport.compliant).toBe(true);
  });

  it('finds the same sample too old once the clock is a year later', async () => {
    const id = await draftWithQuantity();
    t.clock.set('2027-09-15T12:00:00Z');
    const res = await grower.agent.put(`/selling/lots/${id}/sampling`, SAMPLING_STEP);
    expect(res.status).toBe(200);
    expect(res.body.samplingReport.compliant).toBe(false);
    expect(res.body.samplingReport.findings.map((f: { code: string }) => f.code)).toContain('sample-too-old');
  });
});
