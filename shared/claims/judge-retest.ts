import { evaluateForage, type ForageEvaluationRequest } from '../forage';
import { CLAIM_NUTRIENTS, type ClaimNutrient } from '../contracts/platform-settings';
import { analysisField } from '../forage/analysis-fields';

export interface NutrientJudgement {
  field: ClaimNutrient;
  label: string;
  unit: string;
  listed: number | null;
  retest: number | null;
  /** retest − listed, percentage units on the dry-matter basis (dry matter itself as fed). */
  difference: number | null;
  tolerance: number;
  /** True when the retest sits further from the listing than the tolerance. */
  outside: boolean;
}

export interface RetestJudgement {
  nutrients: NutrientJudgement[];
  listed: { rfv: number; usdaGrade: string; afgcGrade: string | null };
  retest: { rfv: number; usdaGrade: string; afgcGrade: string | null };
  /** Nutrients outside tolerance, by label. */
  outside: string[];
  gradeChanged: boolean;
}

/**
 * The retest beside the listed analysis, both through the forage engine (so an as-fed retest is
 * compared on dry matter): the difference per nutrient against its tolerance, and the grade each gives.
 */
export function judgeRetest(listed: ForageEvaluationRequest, retest: ForageEvaluationRequest, tolerances: Record<ClaimNutrient, number>): RetestJudgement {
  const a = evaluateForage(listed);
  const b = evaluateForage({ ...retest, forageClass: listed.forageClass });
  const value = (req: ForageEvaluationRequest, ev: ReturnType<typeof evaluateForage>, field: ClaimNutrient): number | null => {
    if (field === 'dryMatterPct') return req.dryMatterPct;
    if (field === 'ndfd48Pct') return req.ndfd48Pct ?? null;
    const v = (ev.dm as Record<string, number | null | undefined>)[field];
    return v ?? null;
  };
  const nutrients = CLAIM_NUTRIENTS.map((field) => {
    const l = value(listed, a, field);
    const r = value(retest, b, field);
    const difference = l === null || r === null ? null : Math.round((r - l) * 100) / 100;
    const tolerance = tolerances[field];
    return { field, label: analysisField(field).label, unit: analysisField(field).unit, listed: l, retest: r, difference, tolerance, outside: difference !== null && Math.abs(difference) > tolerance + 1e-9 };
  }).filter((n) => n.listed !== null || n.retest !== null);
  const grades = (ev: ReturnType<typeof evaluateForage>) => ({ rfv: Math.round(ev.rfv), usdaGrade: ev.grades.usda.name, afgcGrade: ev.grades.afgc?.name ?? null });
  return {
    nutrients,
    listed: grades(a),
    retest: grades(b),
    outside: nutrients.filter((n) => n.outside).map((n) => n.label),
    gradeChanged: a.grades.usda.name !== b.grades.usda.name,
  };
}
