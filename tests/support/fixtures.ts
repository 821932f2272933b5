import { randomUUID } from 'node:crypto';
import { timeZoneForState } from '@shared/time/farm-time';
import type { ForageEvaluationRequest } from '@shared/forage';
import type { Db } from '../../server/db/client';
import { farms, labAnalyses, lots, orderLines, orders, samplingRecords, users } from '../../server/db/schema';
import { hashPassword } from '../../server/features/auth/password';
import { analysisColumns } from '../../server/features/lots/analysis-record';
import { locateZip } from '../../server/features/geo/geo';
import { uniqueEmail } from './test-api';
import { TEST_NOW } from './test-clock';

let passwordHash: Promise<string> | undefined;

/** A grower account with a farm at the given ZIP. Password: `grower-password`. */
export async function createGrower(db: Db, zip = '66502') {
  passwordHash ??= hashPassword('grower-password');
  const email = uniqueEmail('grower');
  const [user] = await db.insert(users).values({ email, displayName: 'Fixture Grower', role: 'grower', passwordHash: await passwordHash }).returning();
  const place = locateZip(zip);
  const [farm] = await db
    .insert(farms)
    .values({ ownerId: user!.id, name: `Fixture Farm ${randomUUID().slice(0, 6)}`, addressLine: '1 Test Rd', city: place.city, state: place.state, zip, latitude: place.latitude, longitude: place.longitude, timeZone: timeZoneForState(place.state) })
    .returning();
  return { user: user!, farm: farm!, email, password: 'grower-password' };
}

/** A lot with a current analysis (computed by the forage engine) and a compliant sampling record. */
export async function createLot(
  db: Db,
  farmId: number,
  opts: { title: string; status?: 'listed' | 'in_review' | 'draft'; priceDollarsPerTon?: number; analysis?: Partial<ForageEvaluationRequest> } = { title: 'Lot' },
) {
  const [lot] = await db
    .insert(lots)
    .values({
      farmId,
      title: opts.title,
      fieldName: 'Test Field',
      cutting: 1,
      forageType: 'alfalfa',
      forageClass: 'legume',
      harvestStartedOn: '2026-06-01',
      harvestEndedOn: '2026-06-02',
      storage: 'barn',
      baleType: 'small_square_2_string',
      baleCount: 400,
      balesAvailable: 400,
      avgBaleWeightLb: 60,
      priceCentsPerTon: (opts.priceDollarsPerTon ?? 300) * 100,
      status: opts.status ?? 'listed',
      publishedAt: opts.status && opts.status !== 'listed' ? null : new Date(TEST_NOW),
    })
    .returning();
  const { columns } = analysisColumns({ forageClass: 'legume', basis: 'dm', dryMatterPct: 88, crudeProteinPct: 20, adfPct: 30, ndfPct: 40, ...opts.analysis });
  await db.insert(labAnalyses).values({ lotId: lot!.id, labName: 'Fixture Lab', labCertified: true, reportDate: '2026-07-01', verification: 'verified', ...columns });
  await db.insert(samplingRecords).values({
    lotId: lot!.id,
    sampledOn: '2026-06-28',
    coresTaken: 20,
    balesSampled: 20,
    probeDiameterIn: 0.5,
    probeLengthIn: 18,
    corePosition: 'butt-end-centre',
    sampledBy: 'Tester',
    compliant: true,
  });
  return lot!;
}

/** A pickup order of 20 bales from a lot: paid at the test date (`paid`, the default) or still awaiting payment. */
export async function createOrder(db: Db, opts: { buyerId: number; farmId: number; lotId: number; paid?: boolean }) {
  const paid = opts.paid ?? true;
  const [order] = await db
    .insert(orders)
    .values({
      buyerId: opts.buyerId,
      farmId: opts.farmId,
      status: paid ? 'paid' : 'awaiting_payment',
      platformFeeBps: 300,
      platformFeeCents: 540,
      totalCents: 18540,
      method: 'pickup',
      paidAt: paid ? new Date(TEST_NOW) : null,
    })
    .returning();
  await db.insert(orderLines).values({ orderId: order!.id, lotId: opts.lotId, bales: 20, tons: 0.6, priceCentsPerTon: 30000, goodsCents: 18000 });
  return order!;
}
