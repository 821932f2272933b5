import { and, asc, desc, eq } from 'drizzle-orm';
import { type EditableLot, LOT_FORM_STEPS } from '@shared/contracts/selling';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { labAnalyses, photos, samplingRecords, storedFiles } from '../../db/schema';
import { photoView } from '../lots/lots.service';
import { samplingFactsOf } from '@shared/forage/sampling-verdict';
import { storedSamplingVerdict } from '../lots/sampling-report';
import { enteredValuesOf, evaluationOf } from './analysis-values';
import { findLotWithFarm } from './lot-access';
import { balesToTons } from '@shared/units';

/** URL of a lot's lab report PDF (access-checked, see uploads.router). */
export const reportUrl = (lotId: number) => `/api/uploads/lots/${lotId}/report`;

/** A lot as the form (and the review desk) sees it; steps after `draftStep` are returned as null. */
export async function editableLot(db: Db, lotId: number, clock: Clock): Promise<EditableLot> {
  const { lot } = await findLotWithFarm(db, lotId);
  const [analysis] = await db.select().from(labAnalyses).where(and(eq(labAnalyses.lotId, lotId), eq(labAnalyses.isCurrent, true)));
  const [sampling] = await db.select().from(samplingRecords).where(eq(samplingRecords.lotId, lotId));
  const [report] = analysis?.reportFileId ? await db.select().from(storedFiles).where(eq(storedFiles.id, analysis.reportFileId)) : [];
  const photoRows = await db.select().from(photos).where(eq(photos.lotId, lotId)).orderBy(asc(photos.position), desc(photos.isCover), asc(photos.id));
  const saved = (step: (typeof LOT_FORM_STEPS)[number]) => lot.draftStep >= LOT_FORM_STEPS.indexOf(step) + 1;
  const totalTons = balesToTons(lot.baleCount, lot.avgBaleWeightLb);

  const view: EditableLot = {
    id: lot.id,
    status: lot.status,
    draftStep: lot.draftStep,
    reviewNote: lot.reviewNote,
    title: lot.title,
    forageClass: lot.forageClass,
    lot: {
      title: lot.title,
      fieldName: lot.fieldName,
      cutting: lot.cutting,
      forageType: lot.forageType,
      mixDescription: lot.mixDescription,
      harvestStartedOn: lot.harvestStartedOn,
      harvestEndedOn: lot.harvestEndedOn,
      storage: lot.storage,
      moistureAtBalingPct: lot.moistureAtBalingPct,
      droughtStressed: lot.droughtStressed,
      heavyNitrogen: lot.heavyNitrogen,
      description: lot.description,
    },
    quantity: saved('quantity')
      ? { baleType: lot.baleType, baleCount: lot.baleCount, avgBaleWeightLb: lot.avgBaleWeightLb, totalTons, balesAvailable: lot.balesAvailable }
      : null,
    sampling: sampling ? samplingFactsOf(sampling) : null,
    analysis: analysis
      ? {
          labName: analysis.labName,
          labCertified: analysis.labCertified,
          reportNumber: analysis.reportNumber,
          reportDate: analysis.reportDate,
          method: analysis.method,
          values: enteredValuesOf(analysis),
          verification: analysis.verification,
          reportFile: report ? { id: report.id, originalName: report.originalName, sizeBytes: report.sizeBytes, url: reportUrl(lot.id), reading: report.reading ?? null } : null,
        }
      : null,
    price: saved('price')
      ? {
          pricingUnit: lot.pricingUnit,
          priceCentsPerTon: lot.priceCentsPerTon,
          priceCentsPerBale: lot.priceCentsPerBale,
          minOrderTons: lot.minOrderTons,
          deliveryTerms: lot.deliveryTerms,
          freightCentsPerLoadedMile: lot.freightCentsPerLoadedMile,
          pickupAllowed: lot.pickupAllowed,
        }
      : null,
    photos: photoRows.map(photoView),
    evaluation: analysis ? evaluationOf(analysis, lot.forageClass) : null,
    samplingReport:
      sampling && saved('quantity')
        ? storedSamplingVerdict(sampling)
        : null,
    missing: [],
  };
  view.missing = missingForSubmission(view);
  return view;
}

/** What still stands between this lot and the review queue, in the grower's words. */
export function missingForSubmission(view: EditableLot): string[] {
  const missing: string[] = [];
  if (!view.quantity) missing.push('the quantity (bale type, count and weight)');
  if (!view.sampling) missing.push('the sampling record');
  if (!view.analysis) missing.push('the lab analysis values');
  else if (!view.analysis.reportFile) missing.push('the lab report PDF');
  if (view.photos.length === 0) missing.push('at least one photo');
  if (!view.price) missing.push('the price and delivery terms');
  if (view.quantity && view.quantity.balesAvailable === 0) missing.push('bales available to sell');
  return missing;
}
