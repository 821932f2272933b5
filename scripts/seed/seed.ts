import { createHash, randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { evaluateSampling } from '@shared/forage';
import type { FileStorage } from '../../server/adapters/storage/file-storage';
import { hashPassword } from '../../server/features/auth/password';
import { analysisColumns } from '../../server/features/lots/analysis-record';
import { renderPhotoVariants } from '../../server/features/photos/photo-variants';
import { readLabReportPdf } from '../../server/features/uploads/report-reading';
import { saveFarmProfile } from '../../server/features/farms/farms.service';
import { FarmProfileInputSchema } from '@shared/contracts/selling';
import type { Db } from '../../server/db/client';
import { labAnalyses, lots, photos, samplingRecords, storedFiles, users } from '../../server/db/schema';
import { drawDemoBalePhoto, mulberry32 } from './demo-photos';
import { textPdf } from '../../server/adapters/pdf/text-pdf';
import { labReportTableLines } from '../../server/adapters/pdf/lab-report-table';
import { DEMO_BUYERS, DEMO_FARMS, DEMO_LABS, DEMO_LOTS, DEMO_PASSWORDS, FORAGE_PROFILES, type DemoLotPlan } from './demo-scenario';
import { balesToTons } from '@shared/units';
import { plusCalendarDays } from '@shared/time/days';

export interface SeedOptions {
  db: Db;
  storage: FileStorage;
  adminEmail: string;
  adminPassword: string;
  log?: (line: string) => void;
}

/** Creates the admin account and the demo scenario. Running it again changes nothing. */
export async function seedDemo({ db, storage, adminEmail, adminPassword, log = () => {} }: SeedOptions): Promise<{ created: boolean }> {
  const adminId = await ensureUser(db, { email: adminEmail, displayName: 'Baleproof admin', role: 'admin', password: adminPassword });
  const firstGrower = DEMO_FARMS[0]!.ownerEmail;
  const [existing] = await db.select({ id: users.id }).from(users).where(sql`lower(${users.email}) = ${firstGrower}`);
  if (existing) {
    log('demo scenario already present; nothing to do');
    return { created: false };
  }

  const growerHash = await hashPassword(DEMO_PASSWORDS.grower);
  const buyerHash = await hashPassword(DEMO_PASSWORDS.buyer);
  const farmIds = new Map<string, number>();

  await db.transaction(async (tx) => {
    for (const farm of DEMO_FARMS) {
      const [owner] = await tx
        .insert(users)
        .values({ email: farm.ownerEmail, displayName: farm.ownerName, role: 'grower', passwordHash: growerHash, zip: farm.zip })
        .returning({ id: users.id });
      // Through the farm service and the form's own contract, as a grower's profile is saved.
      const profile = FarmProfileInputSchema.parse({
        name: farm.name,
        addressLine: farm.addressLine,
        zip: farm.zip,
        deliveryRadiusMi: farm.deliveryRadiusMi,
        loadingFacilities: farm.loadingFacilities,
        pickupHours: farm.pickupHours,
        description: farm.description,
      });
      const row = await saveFarmProfile(tx as unknown as Db, owner!.id, profile);
      farmIds.set(farm.key, row.id);
    }
    for (const buyer of DEMO_BUYERS) {
      await tx.insert(users).values({ email: buyer.email, displayName: buyer.name, role: 'buyer', passwordHash: buyerHash, zip: buyer.zip });
    }

    for (const [index, plan] of DEMO_LOTS.entries()) {
      const lotId = await insertDemoLot(tx as unknown as Db, storage, plan, index, farmIds.get(plan.farm)!, adminId);
      await addDemoPhotos(tx as unknown as Db, storage, lotId, plan, index);
    }
  });
  log(`demo scenario created: ${DEMO_FARMS.length} farms, ${DEMO_LOTS.length} lots, ${DEMO_BUYERS.length} buyers`);
  return { created: true };
}

async function ensureUser(db: Db, u: { email: string; displayName: string; role: 'admin' | 'buyer' | 'grower'; password: string }): Promise<number> {
  const [found] = await db.select({ id: users.id }).from(users).where(sql`lower(${users.email}) = ${u.email.toLowerCase()}`);
  if (found) return found.id;
  const [row] = await db
    .insert(users)
    .values({ email: u.email.toLowerCase(), displayName: u.displayName, role: u.role, passwordHash: await hashPassword(u.password) })
    .returning({ id: users.id });
  return row!.id;
}

const round1 = (x: number) => Math.round(x * 10) / 10;
const isoDay = plusCalendarDays;

async function insertDemoLot(db: Db, storage: FileStorage, plan: DemoLotPlan, index: number, farmId: number, adminId: number): Promise<number> {
  const rand = mulberry32(1000 + index);
  const between = ([lo, hi]: [number, number]) => round1(lo + (hi - lo) * rand());
  const profile = FORAGE_PROFILES[plan.profile]!;
  const cuttingStart = ['2026-05-18', '2026-06-24', '2026-07-30', '2026-09-04'][Math.min(plan.cutting, 4) - 1]!;
  const harvestStartedOn = isoDay(cuttingStart, Math.floor(rand() * 6));
  const harvestEndedOn = isoDay(harvestStartedOn, index % 9 === 4 ? 4 : 1); // a few lots took longer than 48 h
  const sampledOn = isoDay(harvestEndedOn, 24 + Math.floor(rand() * 10));
  const publishedAt = new Date(Date.parse(`${isoDay(sampledOn, 10 + (index % 5))}T15:00:00Z`));
  const listedOn = publishedAt.toISOString().slice(0, 10);

  // One maturity factor drives fibre up and protein down together, as in real hay (0 = early cut).
  const maturity = rand();
  const along = ([lo, hi]: [number, number], t: number) => round1(lo + (hi - lo) * Math.min(1, Math.max(0, t + (rand() - 0.5) * 0.2)));
  const adf = along(profile.adf, maturity);
  const ndf = Math.max(along(profile.ndf, maturity), adf + 8);
  const cp = along(profile.cp, 1 - maturity);
  const dryMatterPct = between([86.5, 91.5]);
  const { columns } = analysisColumns({
    forageClass: profile.forageClass,
    basis: 'dm',
    dryMatterPct,
    crudeProteinPct: cp,
    adfPct: adf,
    ndfPct: ndf,
    ndfd48Pct: between([42, 60]),
    fatPct: between([1.8, 3.0]),
    ashPct: between([7.5, 11]),
    escPct: between([profile.wsc[0] * 0.55, profile.wsc[1] * 0.65]),
    wscPct: between(profile.wsc),
    starchPct: between([0.8, 3.2]),
    calciumPct: profile.forageClass === 'legume' ? between([1.2, 1.7]) : between([0.35, 0.7]),
    phosphorusPct: between([0.2, 0.35]),
  });

  const round = plan.baleType.startsWith('round');
  const square = plan.baleType.startsWith('small') ? 'small-square' : round ? 'round' : 'large-square';
  const coresTaken = index % 7 === 3 ? 12 : 20 + Math.floor(rand() * 6);
  const sampling = {
    sampledOn,
    coresTaken,
    balesSampled: coresTaken,
    probeDiameterIn: 0.5,
    probeLengthIn: 18,
    corePosition: (round ? 'round-side' : 'butt-end-centre') as 'round-side' | 'butt-end-centre',
    baleShape: square as 'small-square' | 'large-square' | 'round',
    harvestStartedOn,
    harvestEndedOn,
    lotTons: balesToTons(plan.bales, plan.baleWeightLb),
    sampledBy: index % 3 === 0 ? 'Grower' : 'County extension agent (demo)',
  };
  const samplingResult = evaluateSampling(sampling, { listedOn });

  const listed = plan.status === 'listed';
  const sold = listed ? Math.floor(plan.bales * (index % 4) * 0.08) : 0;
  const [lot] = await db
    .insert(lots)
    .values({
      farmId,
      title: `${profile.forageType === 'alfalfa_grass_mix' ? 'Alfalfa–grass' : capitalise(profile.forageType.replace('_', ' '))}, ${ordinal(plan.cutting)} cutting — ${plan.field}`,
      fieldName: plan.field,
      cutting: plan.cutting,
      forageType: profile.forageType,
      forageClass: profile.forageClass,
      mixDescription: profile.forageClass === 'mixed' ? 'about 60% alfalfa, 40% orchardgrass' : '',
      harvestStartedOn,
      harvestEndedOn,
      storage: index % 6 === 5 ? 'tarped' : 'barn',
      moistureAtBalingPct: round1(round ? 14 + rand() * 3 : 13 + rand() * 5),
      baleType: plan.baleType,
      baleCount: plan.bales,
      balesAvailable: plan.bales - sold,
      avgBaleWeightLb: plan.baleWeightLb,
      pricingUnit: plan.baleWeightLb < 150 ? 'bale' : 'ton',
      priceCentsPerTon: plan.priceDollarsPerTon * 100,
      priceCentsPerBale: plan.baleWeightLb < 150 ? Math.round((plan.priceDollarsPerTon * plan.baleWeightLb) / 20) * 1 : null,
      minOrderTons: plan.baleWeightLb < 150 ? 1 : 5,
      freightCentsPerLoadedMile: 325 + (index % 4) * 25,
      deliveryTerms: plan.baleWeightLb < 150 ? 'Delivered and stacked within the delivery radius; 1-ton minimum.' : 'Delivered by semi, 22–24 t a load; buyer unloads.',
      pickupAllowed: index % 5 !== 2,
      description: 'Baled at the right moisture, stored off the ground. No rain damage.',
      status: plan.status,
      draftStep: plan.status === 'draft' ? 2 : 6,
      reviewedBy: listed ? adminId : null,
      reviewedAt: listed ? publishedAt : null,
      publishedAt: listed ? publishedAt : null,
      viewCount: listed ? 20 + Math.floor(rand() * 200) : 0,
      createdAt: new Date(Date.parse(`${sampledOn}T12:00:00Z`)),
    })
    .returning({ id: lots.id });
  const lotId = lot!.id;

  await db.insert(samplingRecords).values({
    lotId,
    sampledOn,
    coresTaken,
    balesSampled: coresTaken,
    probeDiameterIn: sampling.probeDiameterIn,
    probeLengthIn: sampling.probeLengthIn,
    corePosition: sampling.corePosition,
    sampledBy: sampling.sampledBy,
    compliant: samplingResult.compliant,
    findings: samplingResult.findings,
  });
  if (plan.status !== 'draft') {
    const labName = DEMO_LABS[index % DEMO_LABS.length]!;
    const reportNumber = `D-${26000 + index * 17}`;
    const reportDate = isoDay(sampledOn, 6);
    const pdf = await demoReportPdf({ labName, reportNumber, reportDate, sampledOn, field: plan.field, columns });
    const reportKey = `reports/${lotId}/demo-${reportNumber}.pdf`;
    await storage.put(reportKey, pdf);
    const [report] = await db
      .insert(storedFiles)
      .values({ storageKey: reportKey, originalName: `${reportNumber}.pdf`, mimeType: 'application/pdf', sizeBytes: pdf.length, sha256: createHash('sha256').update(pdf).digest('hex'), reading: await readLabReportPdf(pdf) })
      .returning({ id: storedFiles.id });
    await db.insert(labAnalyses).values({
      lotId,
      labName,
      labCertified: index % 8 !== 6,
      reportNumber,
      reportDate,
      reportFileId: report!.id,
      method: index % 3 === 1 ? 'wet_chemistry' : 'nirs',
      ...columns,
      verification: listed ? 'verified' : 'pending',
      verifiedBy: listed ? adminId : null,
      verifiedAt: listed ? publishedAt : null,
    });
  }
  return lotId;
}

async function addDemoPhotos(db: Db, storage: FileStorage, lotId: number, plan: DemoLotPlan, index: number): Promise<void> {
  const profile = FORAGE_PROFILES[plan.profile]!;
  const count = index % 3 === 0 ? 2 : 1;
  for (let p = 0; p < count; p++) {
    const jpeg = await drawDemoBalePhoto(profile.tint, index * 10 + p, plan.baleType.startsWith('round'));
    const id = randomUUID();
    const originalKey = `private/originals/${id}.jpg`;
    await storage.put(originalKey, jpeg);
    const [file] = await db
      .insert(storedFiles)
      .values({ storageKey: originalKey, originalName: `demo-${index}-${p}.jpg`, mimeType: 'image/jpeg', sizeBytes: jpeg.length, sha256: createHash('sha256').update(jpeg).digest('hex') })
      .returning({ id: storedFiles.id });
    const rendered = await renderPhotoVariants(jpeg);
    const variants = [];
    for (const v of rendered.variants) {
      const key = `photos/${id}/${v.width}.webp`;
      await storage.put(key, v.data);
      variants.push({ width: v.width, height: v.height, format: v.format, key });
    }
    await db.insert(photos).values({
      lotId,
      originalFileId: file!.id,
      position: p,
      isCover: p === 0,
      width: rendered.width,
      height: rendered.height,
      altText: `Stack of ${plan.baleType.startsWith('round') ? 'round' : 'square'} bales from ${plan.field}`,
      variants,
    });
  }
}

/** An invented lab report in the layout a forage lab might print: clearly marked as demo data. */
export function demoReportPdf(r: { labName: string; reportNumber: string; reportDate: string; sampledOn: string; field: string; columns: ReturnType<typeof analysisColumns>['columns'] }): Promise<Buffer> {
  return textPdf([
    `${r.labName} - FORAGE ANALYSIS REPORT`,
    'DEMO DATA - invented for the Baleproof demonstration, not a real analysis',
    `Report ${r.reportNumber}    Reported ${r.reportDate}    Sampled ${r.sampledOn}`,
    `Sample: hay, composite of cores, field "${r.field}"`,
    '',
    ...labReportTableLines(r.columns),
  ]);
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

function ordinal(n: number): string {
  return ['1st', '2nd', '3rd', '4th', '5th', '6th', '7th', '8th'][n - 1] ?? `${n}th`;
}
