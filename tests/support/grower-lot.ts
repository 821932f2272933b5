import type { TestApi } from './test-api';
import { makeJpeg, makePdf } from './upload-fixtures';

export { makeJpeg, makePdf };
import { createGrower } from './fixtures';
import { hashPassword } from '../../server/features/auth/password';
import { users } from '../../server/db/schema';
import { uniqueEmail } from './test-api';

type Agent = ReturnType<TestApi['agent']>;

/** A grower with a farm, signed in. */
export async function signedInGrower(t: TestApi, zip = '66502') {
  const grower = await createGrower(t.deps.db, zip);
  const agent = t.agent();
  const res = await agent.post('/auth/sign-in', { email: grower.email, password: grower.password });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status}`);
  return { ...grower, agent };
}

/** A signed-in user of any role, without a farm. */
export async function signedInUser(t: TestApi, role: 'buyer' | 'grower' | 'admin') {
  const email = uniqueEmail(role);
  await t.deps.db.insert(users).values({ email, displayName: `Fixture ${role}`, role, passwordHash: await hashPassword('fixture-password') });
  const agent = t.agent();
  const res = await agent.post('/auth/sign-in', { email, password: 'fixture-password' });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status}`);
  return { email, agent };
}

export const LOT_STEP = {
  fieldName: 'River Bottom',
  cutting: 2,
  forageType: 'alfalfa',
  harvestStartedOn: '2026-06-10',
  harvestEndedOn: '2026-06-11',
  storage: 'barn',
  moistureAtBalingPct: 16,
};
export const QUANTITY_STEP = { baleType: 'small_square_3_string', baleCount: 600, avgBaleWeightLb: 110 };
export const SAMPLING_STEP = { sampledOn: '2026-07-08', coresTaken: 20, balesSampled: 20, probeDiameterIn: 0.5, probeLengthIn: 18, corePosition: 'butt-end-centre', sampledBy: 'Field Tester' };
export const ANALYSIS_STEP = {
  labName: 'Prairie Forage Lab (invented)',
  labCertified: true,
  reportNumber: 'R-1001',
  reportDate: '2026-07-12',
  method: 'nirs',
  values: { basis: 'dm', dryMatterPct: 89, crudeProteinPct: 21, adfPct: 29, ndfPct: 38, ndfd48Pct: 45, fatPct: 2.5, ashPct: 10, wscPct: 9, starchPct: 2 },
};
export const PRICE_STEP = { pricingUnit: 'ton', priceCentsPerTon: 28500, minOrderTons: 2, deliveryTerms: 'Flatbed, within 150 miles.', freightCentsPerLoadedMile: 375, pickupAllowed: true };

/** Walks a lot through every form step (with a report and one photo) and returns its id. */
export async function completeLot(agent: Agent, overrides: { lot?: object; sampling?: object } = {}): Promise<number> {
  const created = await agent.post('/selling/lots', { ...LOT_STEP, ...overrides.lot });
  if (created.status !== 201) throw new Error(`create failed: ${JSON.stringify(created.body)}`);
  const id = created.body.id as number;
  for (const [step, body] of [['quantity', QUANTITY_STEP], ['sampling', { ...SAMPLING_STEP, ...overrides.sampling }], ['analysis', ANALYSIS_STEP]] as const) {
    const res = await agent.put(`/selling/lots/${id}/${step}`, body);
    if (res.status !== 200) throw new Error(`${step} failed: ${JSON.stringify(res.body)}`);
  }
  const token = await agent.token();
  const report = await agent.raw.post(`/uploads/lots/${id}/report`).set('X-XSRF-TOKEN', token).attach('report', await makePdf(), 'report.pdf');
  if (report.status !== 201) throw new Error(`report failed: ${JSON.stringify(report.body)}`);
  const photo = await agent.raw.post(`/uploads/lots/${id}/photos`).set('X-XSRF-TOKEN', token).attach('photos', await makeJpeg(900, 600), 'bales.jpg');
  if (photo.status !== 201) throw new Error(`photo failed: ${JSON.stringify(photo.body)}`);
  await agent.put(`/selling/lots/${id}/photos`, {});
  const price = await agent.put(`/selling/lots/${id}/price`, PRICE_STEP);
  if (price.status !== 200) throw new Error(`price failed: ${JSON.stringify(price.body)}`);
  return id;
}

/** Approves a lot as the admin review desk does: reads the review view, then approves the revision it showed. */
export async function approveLot(admin: Agent, lotId: number) {
  const view = await admin.get(`/review/lots/${lotId}`);
  return admin.post(`/review/lots/${lotId}/approve`, { revision: view.body.revision });
}
