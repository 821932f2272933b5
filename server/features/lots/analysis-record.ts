import { evaluateForage, type ForageEvaluation, type ForageEvaluationRequest } from '@shared/forage';
import { STORED_FIELDS, type StoredField } from '@shared/forage/analysis-fields';
import type { labAnalyses } from '../../db/schema';

/**
 * Lab-analysis columns as stored: nutrients converted to a dry-matter basis, plus the figures the
 * forage engine computes from them (so the catalogue can filter and sort on them in SQL).
 */
export function analysisColumns(request: ForageEvaluationRequest): { columns: AnalysisColumns; evaluation: ForageEvaluation } {
  const evaluation = evaluateForage(request);
  const dm = evaluation.dm;
  return {
    evaluation,
    columns: {
      enteredBasis: request.basis,
      ...storedValues(request, evaluation),
      // Seen by the grower, not measured by the lab: kept beside the table's fields.
      visualMouldScore: request.visualMouldScore ?? null,
      rfv: evaluation.rfv,
      rfq: evaluation.rfq,
      tdnPct: evaluation.tdnPct,
      tdnMethod: evaluation.tdnMethod,
      deMcalPerKgDm: evaluation.horseDe.mcalPerKgDm,
      deMethod: evaluation.horseDe.method,
      nscPct: evaluation.nscPct,
      usdaGrade: evaluation.grades.usda.name,
      afgcGrade: evaluation.grades.afgc?.name ?? null,
      findings: evaluation.findings,
    },
  };
}

/**
 * One column per stored field of the analysis-field table: shares of the sample on dry matter (converted by
 * the engine), dry matter as fed, and the rest (NDFD as a share of NDF, nitrate on DM, counts and toxins) as
 * the lab reported them.
 */
function storedValues(request: ForageEvaluationRequest, evaluation: ForageEvaluation): Pick<AnalysisColumns, StoredField> {
  const out: Record<string, number | null> = {};
  for (const field of STORED_FIELDS) {
    if (field.basis === 'entered') out[field.key] = evaluation.dm[field.key];
    else out[field.key] = request[field.key] ?? null;
  }
  return out as Pick<AnalysisColumns, StoredField>;
}

/** The lab_analyses columns this module fills, typed from the Drizzle schema (the single source of truth). */
export type AnalysisColumns = Required<
  Pick<
    typeof labAnalyses.$inferInsert,
    | 'enteredBasis'
    | 'dryMatterPct'
    | 'crudeProteinPct'
    | 'adfPct'
    | 'ndfPct'
    | 'ndfd48Pct'
    | 'fatPct'
    | 'ashPct'
    | 'escPct'
    | 'wscPct'
    | 'starchPct'
    | 'calciumPct'
    | 'phosphorusPct'
    | 'reportedRfv'
    | 'nitrateNo3PctDm'
    | 'mouldCfuPerG'
    | 'visualMouldScore'
    | 'aflatoxinPpb'
    | 'donPpm'
    | 'fumonisinPpm'
    | 'rfv'
    | 'rfq'
    | 'tdnPct'
    | 'tdnMethod'
    | 'deMcalPerKgDm'
    | 'deMethod'
    | 'nscPct'
    | 'usdaGrade'
    | 'afgcGrade'
    | 'findings'
  >
>;
