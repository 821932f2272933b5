import { and, inArray, isNull, sql } from 'drizzle-orm';
import type { SessionUser } from '@shared/contracts/auth';
import { AnalysisStepSchema, FORAGE_CLASS_OF, FarmProfileInputSchema, LotStepSchema, parseAnalysisValues, PriceStepSchema, QuantityStepSchema, SamplingStepSchema } from '@shared/contracts/selling';
import { labReportTableLines } from '../../server/adapters/pdf/lab-report-table';
import { textPdf } from '../../server/adapters/pdf/text-pdf';
import type { ApiDeps } from '../../server/api-deps';
import { fixedClock, systemClock } from '../../server/clock';
import type { Db } from '../../server/db/client';
import { users } from '../../server/db/schema';
import { AuthService } from '../../server/features/auth/auth.service';
import { saveFarmProfile } from '../../server/features/farms/farms.service';
import { analysisColumns } from '../../server/features/lots/analysis-record';
import { countLotView } from '../../server/features/lots/lot-views';
import { ReviewService } from '../../server/features/review/review.service';
import { ownedLot } from '../../server/features/selling/lot-access';
import { LotLifecycleService } from '../../server/features/selling/lot-lifecycle.service';
import { LotStepsService } from '../../server/features/selling/lot-steps.service';
import { addLotPhotos } from '../../server/features/uploads/photo-upload';
import { attachLabReport } from '../../server/features/uploads/report-upload';
import { drawDemoBalePhoto } from './demo-photos';
import { planDemoLot, type DemoLotFacts } from './demo-lot-plan';
import { DEMO_BUYERS, DEMO_FARMS, DEMO_LOTS, DEMO_PASSWORDS, FORAGE_PROFILES, type DemoLotPlan } from './demo-scenario';
import { pastJobs } from './past-jobs';

export interface SeedOptions {
  deps: Pick<ApiDeps, 'env' | 'db' | 'logger' | 'storage' | 'stripe'>;
  adminEmail: string;
  adminPassword: string;
  log?: (line: string) => void;
}

/**
 * Creates the admin account and the demo scenario through the app's own services, as its people would:
 * growers sign up, set up their farms and fill in the lot form step by step (uploading the lab report and
 * photos), submit, and the admin approves. Each lot runs on a clock stopped at its own dates, so its
 * created, listed and approved dates are the scenario's. All in one transaction: the demo is whole or absent.
 * Running it again changes nothing.
 */
export async function seedDemo({ deps, adminEmail, adminPassword, log = () => {} }: SeedOptions): Promise<{ created: boolean }> {
  const admin = await ensureAdmin(deps.db, adminEmail, adminPassword);
  if (await accountId(deps.db, DEMO_FARMS[0]!.ownerEmail)) {
    // Demo databases made before addresses were confirmed: the demo's alerts keep reaching its accounts.
    const demoEmails = [adminEmail, ...DEMO_FARMS.map((f) => f.ownerEmail), ...DEMO_BUYERS.map((b) => b.email)].map((e) => e.toLowerCase());
    await deps.db.update(users).set({ emailVerifiedAt: systemClock.now() }).where(and(inArray(sql`lower(${users.email})`, demoEmails), isNull(users.emailVerifiedAt)));
    log('demo scenario already present; nothing to do');
    return { created: false };
  }

  const jobs = pastJobs();
  await deps.db.transaction(async (tx) => {
    const base: ApiDeps = { ...deps, db: tx as unknown as Db, jobs, clock: systemClock };
    const auth = new AuthService(base.db);
    const growers = new Map<string, SessionUser>();
    for (const farm of DEMO_FARMS) {
      const owner = await auth.createAccount({ email: farm.ownerEmail, password: DEMO_PASSWORDS.grower, displayName: farm.ownerName, role: 'grower', zip: farm.zip, emailVerifiedAt: base.clock.now() });
      const { key: _key, ownerName: _name, ownerEmail: _email, ...profile } = farm;
      await saveFarmProfile(base.db, owner.id, FarmProfileInputSchema.parse(profile));
      growers.set(farm.key, owner);
    }
    for (const buyer of DEMO_BUYERS) {
      await auth.createAccount({ email: buyer.email, password: DEMO_PASSWORDS.buyer, displayName: buyer.name, role: 'buyer', zip: buyer.zip, emailVerifiedAt: base.clock.now() });
    }
    for (const [index, plan] of DEMO_LOTS.entries()) {
      await makeDemoLot(base, { grower: growers.get(plan.farm)!, admin, plan, index });
    }
  });
  log(`demo scenario created: ${DEMO_FARMS.length} farms, ${DEMO_LOTS.length} lots, ${DEMO_BUYERS.length} buyers (${jobs.dropped()} notices of its past not sent)`);
  return { created: true };
}

/**
 * One lot from its grower's first step to the admin's approval. A draft stops after the sampling step (and
 * its photos); a lot in review after submitting.
 */
async function makeDemoLot(base: ApiDeps, { grower, admin, plan, index }: { grower: SessionUser; admin: SessionUser; plan: DemoLotPlan; index: number }): Promise<void> {
  const facts = planDemoLot(plan, index);
  const clock = fixedClock(facts.startedAt);
  const deps: ApiDeps = { ...base, clock };
  const steps = new LotStepsService(deps.db, clock);
  const lotId = await steps.create(grower, LotStepSchema.parse(facts.lot));
  clock.set(facts.listedAt);
  await steps.saveQuantity(grower, lotId, QuantityStepSchema.parse(facts.quantity));
  await steps.saveSampling(grower, lotId, SamplingStepSchema.parse(facts.sampling));
  if (plan.status !== 'draft') {
    const analysis = AnalysisStepSchema.parse(facts.analysis);
    await steps.saveAnalysis(grower, lotId, analysis);
    const report = await demoReportPdf(facts, analysis.reportNumber);
    await attachLabReport(deps, (await ownedLot(deps.db, lotId, grower)).lot, grower.id, uploaded(`${analysis.reportNumber}.pdf`, report));
  }
  await addLotPhotos(deps, (await ownedLot(deps.db, lotId, grower)).lot, grower.id, await demoPhotos(plan, index));
  if (plan.status === 'draft') return;

  await steps.savePhotosStep(grower, lotId);
  await steps.savePrice(grower, lotId, PriceStepSchema.parse(facts.price));
  await new LotLifecycleService(deps.db, clock).submit(grower, lotId);
  if (plan.status !== 'listed') return;

  const review = new ReviewService(deps);
  await review.approve(admin, lotId, (await review.lot(lotId)).revision);
  // Visitors who looked at the lot on the day it was listed, each counted once.
  for (let visitor = 0; visitor < facts.viewCount; visitor++) await countLotView(deps.db, lotId, `v:demo-${visitor}`, clock.now());
}

/** The admin account from the environment: created once, through the account service. */
async function ensureAdmin(db: Db, email: string, password: string): Promise<SessionUser> {
  const auth = new AuthService(db);
  const id = await accountId(db, email);
  if (id) return (await auth.findSessionUser(id))!;
  return auth.createAccount({ email, password, displayName: 'Baleproof admin', role: 'admin', emailVerifiedAt: systemClock.now() });
}

async function accountId(db: Db, email: string): Promise<number | null> {
  const [found] = await db.select({ id: users.id }).from(users).where(sql`lower(${users.email}) = ${email.toLowerCase()}`);
  return found?.id ?? null;
}

async function demoPhotos(plan: DemoLotPlan, index: number): Promise<Express.Multer.File[]> {
  const profile = FORAGE_PROFILES[plan.profile]!;
  const count = index % 3 === 0 ? 2 : 1;
  const files = [];
  for (let p = 0; p < count; p++) {
    files.push(uploaded(`demo-${index}-${p}.jpg`, await drawDemoBalePhoto(profile.tint, index * 10 + p, plan.baleType.startsWith('round'))));
  }
  return files;
}

/** A file as an upload hands it to the services (their checks read the content, not this type). */
function uploaded(name: string, buffer: Buffer): Express.Multer.File {
  return { fieldname: 'file', originalname: name, encoding: '7bit', mimetype: 'application/octet-stream', size: buffer.length, buffer } as Express.Multer.File;
}

/** An invented lab report in the layout a forage lab might print: clearly marked as demo data. */
function demoReportPdf(facts: DemoLotFacts, reportNumber: string): Promise<Buffer> {
  const { analysis, sampling, lot } = facts;
  const { columns } = analysisColumns(parseAnalysisValues(analysis.values, FORAGE_CLASS_OF[lot.forageType]));
  return textPdf([
    `${analysis.labName} - FORAGE ANALYSIS REPORT`,
    'DEMO DATA - invented for the Baleproof demonstration, not a real analysis',
    `Report ${reportNumber}    Reported ${analysis.reportDate}    Sampled ${sampling.sampledOn}`,
    `Sample: hay, composite of cores, field "${lot.fieldName}"`,
    '',
    ...labReportTableLines(columns),
  ]);
}
