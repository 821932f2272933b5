import { and, eq, sql } from 'drizzle-orm';
import {
  type AnalysisStep,
  defaultLotTitle,
  deriveQuantity,
  FORAGE_CLASS_OF,
  type LotStep,
  parseAnalysisValues,
  type PriceStep,
  type QuantityStep,
  type SamplingStep,
  stepIndex,
  type LotFormStep,
} from '@shared/contracts/selling';
import { listedPricePerTonCents } from '@shared/pricing/price-per-ton';
import { afterReviewedChange, factsNeedingReview, statusAfterStockChange } from '@shared/lifecycle/lot-lifecycle';
import { samplingVerdictOf } from '@shared/forage/sampling-verdict';
import { assertLotDates, type LotDateField, type LotDates } from '@shared/contracts/lot-dates';
import { refreshSamplingVerdict } from '../lots/sampling-report';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { labAnalyses, lots, samplingRecords } from '../../db/schema';
import { HttpError } from '../../middleware/http-error';
import { analysisColumns } from '../lots/analysis-record';
import { dmRequestOf } from './analysis-values';
import { farmOf, ownedLot, type LotRow } from './lot-access';

const HARVEST: LotDateField[] = ['harvestStartedOn', 'harvestEndedOn'];

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/**
 * The lot form's writes, one per step. Rules:
 * - steps are saved in order (a step needs the one before it), so columns of unsaved steps never show;
 * - a draft row holds neutral placeholders for quantity and price until those steps are saved;
 * - on an approved lot, changing a fact the admin checked or buyers rely on sends it back to review;
 *   stock, price and photos do not (the table is `LOT_FACTS` in shared/lifecycle/lot-lifecycle).
 */
export class LotStepsService {
  constructor(
    private readonly db: Db,
    private readonly clock: Clock,
  ) {}

  /** Starts a draft from the first step. */
  async create(user: Express.User, input: LotStep): Promise<number> {
    assertLotDates(input, this.clock.now(), HARVEST);
    const farm = await farmOf(this.db, user.id);
    const [row] = await this.db
      .insert(lots)
      .values({
        farmId: farm.id,
        ...this.lotColumns(input),
        // Placeholders until the quantity and price steps are saved (draftStep says they are not).
        baleType: 'small_square_2_string',
        baleCount: 1,
        balesAvailable: 0,
        avgBaleWeightLb: 60,
        priceCentsPerTon: 1,
        status: 'draft',
        draftStep: stepIndex('lot'),
        createdAt: this.clock.now(),
        updatedAt: this.clock.now(),
      })
      .returning({ id: lots.id });
    return row!.id;
  }

  async saveLot(user: Express.User, lotId: number, input: LotStep): Promise<void> {
    const { lot } = await this.editable(user, lotId, 'lot');
    assertLotDates({ ...(await this.storedDates(lotId)), ...input }, this.clock.now(), HARVEST);
    const columns = this.lotColumns(input);
    const { forageClass: _derived, ...facts } = columns;
    await this.db.transaction(async (tx) => {
      const now = await this.nextRevision(tx, lot.id);
      const needsReview = factsNeedingReview(now, facts).length > 0;
      await tx.update(lots).set({ ...columns, ...this.progress(now, 'lot') }).where(eq(lots.id, lotId));
      if (columns.forageClass !== now.forageClass) await this.reevaluate(tx, lotId, columns.forageClass);
      // The sampling verdict depends on the harvest dates.
      await this.recheckSampling(tx, lotId);
      if (needsReview) await this.backToReview(tx, now);
    });
  }

  async saveQuantity(user: Express.User, lotId: number, input: QuantityStep): Promise<void> {
    await this.editable(user, lotId, 'quantity');
    const q = deriveQuantity(input)!;
    await this.db.transaction(async (tx) => {
      const lot = await this.nextRevision(tx, lotId);
      const firstTime = lot.draftStep < stepIndex('quantity');
      const sold = firstTime ? 0 : lot.baleCount - lot.balesAvailable;
      const balesAvailable = input.balesAvailable ?? Math.max(0, q.baleCount - sold);
      const perTon = listedPricePerTonCents(lot, q.avgBaleWeightLb);
      const shape = { baleType: input.baleType, baleCount: q.baleCount, avgBaleWeightLb: Math.round(q.avgBaleWeightLb * 10) / 10 };
      const needsReview = !firstTime && factsNeedingReview(lot, shape).length > 0;
      const status = statusAfterStockChange(lot.status, balesAvailable);
      await tx
        .update(lots)
        .set({
          ...shape,
          balesAvailable,
          priceCentsPerTon: perTon,
          status,
          ...this.progress(lot, 'quantity'),
        })
        .where(eq(lots.id, lotId));
      // The sampling verdict depends on the bale shape and lot size.
      await this.recheckSampling(tx, lotId);
      if (needsReview) await this.backToReview(tx, { ...lot, status });
    });
  }

  async saveSampling(user: Express.User, lotId: number, input: SamplingStep): Promise<void> {
    const { lot } = await this.editable(user, lotId, 'sampling');
    assertLotDates({ ...(await this.storedDates(lotId)), harvestStartedOn: lot.harvestStartedOn, sampledOn: input.sampledOn }, this.clock.now(), ['sampledOn']);
    await this.db.transaction(async (tx) => {
      const now = await this.nextRevision(tx, lot.id);
      const verdict = samplingVerdictOf(now, input, this.clock.now());
      const values = { ...input, compliant: verdict.compliant, findings: verdict.findings, updatedAt: this.clock.now() };
      await tx.insert(samplingRecords).values({ lotId, ...values }).onConflictDoUpdate({ target: samplingRecords.lotId, set: values });
      await tx.update(lots).set(this.progress(now, 'sampling')).where(eq(lots.id, lotId));
      await this.backToReview(tx, now);
    });
  }

  async saveAnalysis(user: Express.User, lotId: number, input: AnalysisStep): Promise<void> {
    const { lot } = await this.editable(user, lotId, 'analysis');
    assertLotDates({ ...(await this.storedDates(lotId)), reportDate: input.reportDate }, this.clock.now(), ['reportDate']);
    const request = parseAnalysisValues(input.values, lot.forageClass);
    const { columns, evaluation } = analysisColumns(request);
    const errors = evaluation.findings.filter((f) => f.severity === 'error');
    if (errors.length > 0) {
      throw new HttpError(400, 'analysis_inconsistent', errors[0]!.message, errors.map((f) => ({ path: `values.${pathOfFinding(f.code)}`, message: f.message, code: f.code })));
    }
    const lab = { labName: input.labName, labCertified: input.labCertified, reportNumber: input.reportNumber, reportDate: input.reportDate, method: input.method };
    await this.db.transaction(async (tx) => {
      const now = await this.nextRevision(tx, lot.id);
      await this.writeAnalysis(tx, now, { ...lab, ...columns });
      await tx.update(lots).set(this.progress(now, 'analysis')).where(eq(lots.id, lotId));
    });
  }

  /** Links an uploaded lab report (already stored) to the lot's current analysis, inside the caller's transaction. */
  async attachReport(tx: Tx, stale: LotRow, fileId: number): Promise<void> {
    const lot = await this.nextRevision(tx, stale.id);
    const [current] = await tx.select({ id: labAnalyses.id }).from(labAnalyses).where(and(eq(labAnalyses.lotId, lot.id), eq(labAnalyses.isCurrent, true)));
    if (!current) throw new HttpError(409, 'analysis_required', 'Save the lab analysis values first, then attach the report PDF.');
    await this.writeAnalysis(tx, lot, { reportFileId: fileId });
    await tx.update(lots).set({ updatedAt: this.clock.now() }).where(eq(lots.id, lot.id));
  }

  async savePhotosStep(user: Express.User, lotId: number): Promise<void> {
    const { lot } = await this.editable(user, lotId, 'photos');
    await this.db.update(lots).set(this.progress(lot, 'photos')).where(eq(lots.id, lotId));
  }

  async savePrice(user: Express.User, lotId: number, input: PriceStep): Promise<void> {
    const { lot } = await this.editable(user, lotId, 'price');
    const perTon = listedPricePerTonCents(input, lot.avgBaleWeightLb);
    await this.db
      .update(lots)
      .set({
        pricingUnit: input.pricingUnit,
        priceCentsPerTon: perTon,
        priceCentsPerBale: input.pricingUnit === 'bale' ? input.priceCentsPerBale : null,
        minOrderTons: input.minOrderTons,
        deliveryTerms: input.deliveryTerms,
        freightCentsPerLoadedMile: input.freightCentsPerLoadedMile,
        pickupAllowed: input.pickupAllowed,
        ...this.progress(lot, 'price'),
      })
      .where(eq(lots.id, lotId));
  }

  /** The owner's lot, when the step before `step` has been saved. */
  /**
   * Takes the lot's row lock and bumps its revision, returning the row as it is now. An approval holds the
   * same lock: it either sees this change's revision (and refuses, 409) or commits first, and then this
   * change sees the listed lot and sends it back to review.
   */
  private async nextRevision(tx: Tx, lotId: number): Promise<LotRow> {
    const [row] = await tx.update(lots).set({ revision: sql`${lots.revision} + 1` }).where(eq(lots.id, lotId)).returning();
    return row!;
  }

  /** The sample and current lab report dates already saved, to check a step's dates against. */
  private async storedDates(lotId: number): Promise<LotDates> {
    const [sampling] = await this.db.select({ sampledOn: samplingRecords.sampledOn }).from(samplingRecords).where(eq(samplingRecords.lotId, lotId));
    const [analysis] = await this.db.select({ reportDate: labAnalyses.reportDate }).from(labAnalyses).where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true)));
    return { sampledOn: sampling?.sampledOn ?? null, reportDate: analysis?.reportDate ?? null };
  }

  async editable(user: Express.User, lotId: number, step: LotFormStep) {
    const found = await ownedLot(this.db, lotId, user);
    const need = stepIndex(step) - 1;
    if (found.lot.draftStep < need) {
      throw new HttpError(409, 'step_out_of_order', 'Save the earlier steps of the lot form first.', { draftStep: found.lot.draftStep });
    }
    return found;
  }

  private lotColumns(input: LotStep) {
    return {
      title: input.title || defaultLotTitle(input),
      fieldName: input.fieldName,
      cutting: input.cutting,
      forageType: input.forageType,
      forageClass: FORAGE_CLASS_OF[input.forageType],
      mixDescription: input.mixDescription,
      harvestStartedOn: input.harvestStartedOn,
      harvestEndedOn: input.harvestEndedOn,
      storage: input.storage,
      moistureAtBalingPct: input.moistureAtBalingPct,
      droughtStressed: input.droughtStressed,
      heavyNitrogen: input.heavyNitrogen,
      description: input.description,
    };
  }

  private progress(lot: LotRow, step: LotFormStep) {
    return { draftStep: Math.max(lot.draftStep, stepIndex(step)), updatedAt: this.clock.now() };
  }

  /**
   * Writes analysis columns. An analysis an admin has verified is never changed in place: a new current
   * version is written (the verified one is kept), and the lot goes back to review.
   */
  private async writeAnalysis(tx: Tx, lot: LotRow, values: Partial<typeof labAnalyses.$inferInsert>): Promise<void> {
    const [current] = await tx.select().from(labAnalyses).where(and(eq(labAnalyses.lotId, lot.id), eq(labAnalyses.isCurrent, true)));
    if (!current) {
      await tx.insert(labAnalyses).values({ ...(values as typeof labAnalyses.$inferInsert), lotId: lot.id });
      return;
    }
    if (current.verification !== 'verified') {
      await tx.update(labAnalyses).set({ ...values, verification: 'pending', verifiedBy: null, verifiedAt: null }).where(eq(labAnalyses.id, current.id));
      return;
    }
    const { id: _id, createdAt: _c, lotId: _l, ...previous } = current;
    await tx.update(labAnalyses).set({ isCurrent: false }).where(eq(labAnalyses.id, current.id));
    await tx.insert(labAnalyses).values({ ...previous, ...values, lotId: lot.id, isCurrent: true, verification: 'pending', verifiedBy: null, verifiedAt: null });
    await this.backToReview(tx, lot);
  }

  /** A lot that buyers can see (or could relist) goes back to the review queue; its analysis needs checking again. */
  private async backToReview(tx: Tx, lot: LotRow): Promise<void> {
    const { status, approvalLapses } = afterReviewedChange(lot.status);
    if (status !== lot.status) {
      await tx.update(lots).set({ status, updatedAt: this.clock.now() }).where(eq(lots.id, lot.id));
    }
    if (approvalLapses) {
      await tx
        .update(labAnalyses)
        .set({ verification: 'pending', verifiedBy: null, verifiedAt: null })
        .where(and(eq(labAnalyses.lotId, lot.id), eq(labAnalyses.isCurrent, true), eq(labAnalyses.verification, 'verified')));
    }
  }

  private async reevaluate(tx: Tx, lotId: number, forageClass: LotRow['forageClass']): Promise<void> {
    const [current] = await tx.select().from(labAnalyses).where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true)));
    if (!current) return;
    const { columns } = analysisColumns(dmRequestOf(current, forageClass));
    await tx.update(labAnalyses).set({ ...columns, enteredBasis: current.enteredBasis }).where(eq(labAnalyses.id, current.id));
  }

  private async recheckSampling(tx: Tx, lotId: number): Promise<void> {
    await refreshSamplingVerdict(tx, lotId, this.clock.now());
  }
}

/** The form field an engine finding is about, so the UI can show it in place. */
function pathOfFinding(code: string): string {
  if (code === 'ndf-below-adf') return 'adfPct';
  if (code === 'dm-moisture-mismatch') return 'moisturePct';
  if (code === 'cp-ndf-fat-ash-over-100' || code === 'nfc-negative') return 'crudeProteinPct';
  return 'dryMatterPct';
}
