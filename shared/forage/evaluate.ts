import type { ForageEvaluation, ForageEvaluationRequest, Nutrients } from './forage-contract';
import { convertNutrients, toAsFed, toDryMatter } from './dry-matter';
import { digestibleDryMatter, relativeFeedValue, rfvDryMatterIntake } from './rfv';
import { computeRfq } from './rfq';
import { nonFiberCarbohydrate, tdnFromAdf, totalDigestibleNutrients } from './tdn';
import { horseDigestibleEnergy } from './horse-de';
import { nonStructuralCarbohydrate, nscFlag } from './nsc';
import { gradeForage } from './grades';
import { consistencyFindings, methodFindings } from './analysis-findings';
import { mouldFindings } from './mould';
import { nitrateFindings } from './nitrate';

/**
 * Evaluates a lab analysis of a hay lot: both bases, RFV, RFQ, TDN, horse DE, NSC, grades and
 * findings. Expects a request already parsed by `ForageEvaluationRequestSchema`; never throws for
 * one. Every quality index is computed on the DM basis.
 */
export function evaluateForage(req: ForageEvaluationRequest): ForageEvaluation {
  const entered: Nutrients = {
    crudeProteinPct: req.crudeProteinPct,
    adfPct: req.adfPct,
    ndfPct: req.ndfPct,
    fatPct: req.fatPct ?? null,
    ashPct: req.ashPct ?? null,
    escPct: req.escPct ?? null,
    wscPct: req.wscPct ?? null,
    starchPct: req.starchPct ?? null,
    calciumPct: req.calciumPct ?? null,
    phosphorusPct: req.phosphorusPct ?? null,
    nscPct: null,
  };
  const dmWithoutNsc = req.basis === 'dm' ? entered : convertNutrients(entered, req.dryMatterPct, toDryMatter);
  const nsc = nonStructuralCarbohydrate(dmWithoutNsc);
  const dm: Nutrients = { ...dmWithoutNsc, nscPct: nsc?.nscPct ?? null };
  const asFed = convertNutrients(dm, req.dryMatterPct, toAsFed);
  const ndfd48Pct = req.ndfd48Pct ?? null;

  const rfv = relativeFeedValue(dm.adfPct, dm.ndfPct);
  const tdn = totalDigestibleNutrients({ forageClass: req.forageClass, ...dm, ndfd48Pct });
  const nfcPct =
    dm.fatPct !== null && dm.ashPct !== null ? nonFiberCarbohydrate({ ...dm, fatPct: dm.fatPct, ashPct: dm.ashPct }) : null;
  const rfq =
    dm.fatPct !== null && dm.ashPct !== null && ndfd48Pct !== null
      ? computeRfq({ forageClass: req.forageClass, ...dm, fatPct: dm.fatPct, ashPct: dm.ashPct, ndfd48Pct })
      : null;
  const horseDe = horseDigestibleEnergy({ ...dm, tdnPct: tdn.tdnPct, dryMatterPct: req.dryMatterPct });
  const flag = nsc === null ? null : nscFlag(nsc.nscPct);

  const grades = gradeForage(req.forageClass, {
    adfPct: dm.adfPct,
    ndfPct: dm.ndfPct,
    rfv,
    tdnWesternPct: tdnFromAdf(dm.adfPct, 'western'),
    crudeProteinPct: dm.crudeProteinPct,
  });

  const findings = [
    ...consistencyFindings({
      dryMatterPct: req.dryMatterPct,
      moisturePct: req.moisturePct ?? null,
      dm,
      ndfd48Pct,
      reportedRfv: req.reportedRfv ?? null,
      computedRfv: rfv,
      nfcPct,
    }),
    ...methodFindings({
      forageClass: req.forageClass,
      dm,
      ndfd48Pct,
      rfqComputed: rfq !== null,
      nfcNegative: nfcPct !== null && nfcPct < 0,
      horseDeMethod: horseDe.method,
      nscMethod: nsc?.method ?? null,
      nscFlag: flag,
    }),
    ...nitrateFindings(req.nitrateNo3PctDm ?? null),
    ...mouldFindings(req),
  ];

  return {
    dm,
    asFed,
    ddmPct: digestibleDryMatter(dm.adfPct),
    dmiPctBw: rfvDryMatterIntake(dm.ndfPct),
    rfv,
    rfq: rfq?.rfq ?? null,
    tdnPct: tdn.tdnPct,
    tdnMethod: tdn.method,
    horseDe,
    nscPct: dm.nscPct,
    nscMethod: nsc?.method ?? null,
    nscFlag: flag,
    grades,
    findings,
  };
}
