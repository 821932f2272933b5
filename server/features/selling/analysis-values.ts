import { evaluateForage, type ForageEvaluation, type ForageEvaluationRequest } from '@shared/forage';
import { analysisField, OPTIONAL_STORED_KEYS, STORED_KEYS } from '@shared/forage/analysis-fields';
import type { labAnalyses } from '../../db/schema';

type AnalysisRow = typeof labAnalyses.$inferSelect;

/** The stored (dry-matter) analysis as an engine request on the DM basis. */
export function dmRequestOf(row: AnalysisRow, forageClass: ForageEvaluationRequest['forageClass']): ForageEvaluationRequest {
  const request: ForageEvaluationRequest = {
    forageClass,
    basis: 'dm',
    dryMatterPct: row.dryMatterPct,
    crudeProteinPct: row.crudeProteinPct,
    adfPct: row.adfPct,
    ndfPct: row.ndfPct,
  };
  for (const field of OPTIONAL_STORED_KEYS) {
    const value = row[field];
    if (value !== null) request[field] = value;
  }
  if (row.visualMouldScore !== null) request.visualMouldScore = row.visualMouldScore;
  return request;
}

/** The values as the grower typed them: DM figures turned back to as-fed when that was the basis. */
export function enteredValuesOf(row: AnalysisRow): Record<string, number | string> {
  const out: Record<string, number | string> = { basis: row.enteredBasis, dryMatterPct: row.dryMatterPct };
  for (const field of STORED_KEYS) {
    const value = row[field];
    if (value === null || field === 'dryMatterPct') continue;
    const asEntered = row.enteredBasis === 'asFed' && analysisField(field).basis === 'entered' ? (value * row.dryMatterPct) / 100 : value;
    out[field] = Math.round(asEntered * 1000) / 1000;
  }
  if (row.visualMouldScore !== null) out['visualMouldScore'] = row.visualMouldScore;
  return out;
}

/** The engine's figures for a stored analysis, with the findings saved when it was entered. */
export function evaluationOf(row: AnalysisRow, forageClass: ForageEvaluationRequest['forageClass']): ForageEvaluation {
  const evaluation = evaluateForage(dmRequestOf(row, forageClass));
  return { ...evaluation, findings: row.findings as ForageEvaluation['findings'] };
}
