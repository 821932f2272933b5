import sharp from 'sharp';
import type { TestApi } from './test-api';
import { createGrower } from './fixtures';
import { hashPassword } from '../../server/features/auth/password';
import { users } from '../../server/db/schema';
import { uniqueEmail } from './test-api';

type Agent = ReturnType<TestApi['agent']>;

/** A JPEG drawn in memory (a few coloured bands), so no binary fixtures are needed. */
export async function makeJpeg(width = 1200, height = 800, seed = 0): Promise<Buffer> {
  const band = Math.max(1, Math.floor(height / 4));
  const composites = [0, 1, 2, 3].map((i) => ({
    input: { create: { width, height: band, channels: 3 as const, background: { r: (90 + 40 * i + seed * 13) % 256, g: 140 - 10 * i, b: 60 + 5 * i } } },
    top: i * band,
    left: 0,
  }));
  return sharp({ create: { width, height, channels: 3, background: { r: 200, g: 170, b: 90 } } })
    .composite(composites)
    .jpeg({ quality: 80 })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/** The smallest PDF a reader accepts: one empty page, a cross-reference table and the end marker. */
export function makePdf(text = 'Lab report'): Buffer {
  const objects = [
    '<< /Type /Catalog /Pages 2 0 R >>',
    '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
    '<< /Type /Page /Parent 2 0 R /MediaBox [0 0 612 792] /Contents 4 0 R /Resources << /Font << /F1 5 0 R >> >> >>',
    null,
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica >>',
  ];
  const stream = `BT /F1 18 Tf 72 720 Td (${text.replace(/[()\\]/g, '')}) Tj ET`;
  objects[3] = `<< /Length ${stream.length} >>\nstream\n${stream}\nendstream`;
  let body = '%PDF-1.4\n';
  const offsets: number[] = [];
  objects.forEach((obj, i) => {
    offsets.push(body.length);
    body += `${i + 1} 0 obj\n${obj}\nendobj\n`;
  });
  const xref = body.length;
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n${offsets.map((o) => `${String(o).padStart(10, '0')} 00000 n \n`).join('')}`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return Buffer.from(body, 'latin1');
}

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
export async function completeLot(agent: Agent, overrides: { lot?: object } = {}): Promise<number> {
  const created = await agent.post('/selling/lots', { ...LOT_STEP, ...overrides.lot });
  if (created.status !== 201) throw new Error(`create failed: ${JSON.stringify(created.body)}`);
  const id = created.body.id as number;
  for (const [step, body] of [['quantity', QUANTITY_STEP], ['sampling', SAMPLING_STEP], ['analysis', ANALYSIS_STEP]] as const) {
    const res = await agent.put(`/selling/lots/${id}/${step}`, body);
    if (res.status !== 200) throw new Error(`${step} failed: ${JSON.stringify(res.body)}`);
  }
  const token = await agent.token();
  const report = await agent.raw.post(`/uploads/lots/${id}/report`).set('X-XSRF-TOKEN', token).attach('report', makePdf(), 'report.pdf');
  if (report.status !== 201) throw new Error(`report failed: ${JSON.stringify(report.body)}`);
  const photo = await agent.raw.post(`/uploads/lots/${id}/photos`).set('X-XSRF-TOKEN', token).attach('photos', await makeJpeg(900, 600), 'bales.jpg');
  if (photo.status !== 201) throw new Error(`photo failed: ${JSON.stringify(photo.body)}`);
  await agent.put(`/selling/lots/${id}/photos`, {});
  const price = await agent.put(`/selling/lots/${id}/price`, PRICE_STEP);
  if (price.status !== 200) throw new Error(`price failed: ${JSON.stringify(price.body)}`);
  return id;
}
