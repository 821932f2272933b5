import { evaluateForage, type ForageEvaluation, type ForageEvaluationRequest } from '../../../shared/forage';

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

export interface AnalysisColumns {
  enteredBasis: 'dm' | 'asFed';
  dryMatterPct: number;
  crudeProteinPct: number;
  adfPct: number;
  ndfPct: number;
  ndfd48Pct: number | null;
  fatPct: number | null;
  ashPct: number | null;
  escPct: number | null;
  wscPct: number | null;
  starchPct: number | null;
  calciumPct: number | null;
  phosphorusPct: number | null;
  reportedRfv: number | null;
  rfv: number;
  rfq: number | null;
  tdnPct: number;
  tdnMethod: string;
  deMcalPerKgDm: number;
  deMethod: string;
  nscPct: number | null;
  usdaGrade: string;
  afgcGrade: string | null;
  findings: unknown[];
}
