import { evaluateForage, type ForageEvaluation, type ForageEvaluationRequest } from '@shared/forage';
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
      dryMatterPct: request.dryMatterPct,
      crudeProteinPct: dm.crudeProteinPct,
      adfPct: dm.adfPct,
      ndfPct: dm.ndfPct,
      // NDFD is a share of NDF, the same on any basis.
      ndfd48Pct: request.ndfd48Pct ?? null,
      fatPct: dm.fatPct,
      ashPct: dm.ashPct,
      escPct: dm.escPct,
      wscPct: dm.wscPct,
      starchPct: dm.starchPct,
      calciumPct: dm.calciumPct,
      phosphorusPct: dm.phosphorusPct,
      reportedRfv: request.reportedRfv ?? null,
      // Labs report nitrate on dry matter whatever basis the rest was typed in.
      nitrateNo3PctDm: request.nitrateNo3PctDm ?? null,
      // Mould counts and mycotoxins are kept as the lab reported them.
      mouldCfuPerG: request.mouldCfuPerG ?? null,
      visualMouldScore: request.visualMouldScore ?? null,
      aflatoxinPpb: request.aflatoxinPpb ?? null,
      donPpm: request.donPpm ?? null,
      fumonisinPpm: request.fumonisinPpm ?? null,
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
