import { CLAIM_NUTRIENTS, type ClaimNutrient } from '@shared/contracts/platform-settings';
import type { OpenClaim } from '@shared/contracts/claims';
import { analysisField, entryUnit } from '@shared/forage/analysis-fields';
import type { NutrientBasis } from '@shared/forage/forage-contract';

/** The four figures the forage engine needs to grade a retest; the others are optional. */
export const REQUIRED_RETEST_FIELDS: readonly ClaimNutrient[] = CLAIM_NUTRIENTS.filter((f) => analysisField(f).required);

/** One input per nutrient an admin compares against its tolerance, labelled and in the units the review desk uses. */
export const RETEST_FIELDS = CLAIM_NUTRIENTS.map((field) => ({
  field,
  label: analysisField(field).label,
  // Dry matter is always as fed and NDFD a share of NDF; the others follow the basis the buyer picks.
  unit: entryUnit(analysisField(field)),
  required: analysisField(field).required,
}));

/** What the buyer typed, as typed. */
export interface ClaimDraft {
  /** The order line (lot) the problem is about, as the select's value; '' for the whole order. */
  lineId: string;
  reason: string;
  withRetest: boolean;
  labName: string;
  labCertified: boolean;
  reportDate: string;
  basis: NutrientBasis;
  values: Partial<Record<ClaimNutrient, string>>;
}

export const emptyClaimDraft = (): ClaimDraft => ({ lineId: '', reason: '', withRetest: false, labName: '', labCertified: true, reportDate: '', basis: 'dm', values: {} });

/**
 * The request body for `POST /api/claims`. Blank optional values are left out; a typed value that is not a
 * number is sent as typed, so the API's own check names the field (one home for the rules).
 */
export function claimRequest(orderId: number, draft: ClaimDraft): OpenClaim {
  const body: OpenClaim = { orderId, ...(draft.lineId ? { lineId: Number(draft.lineId) } : {}), reason: draft.reason.trim() };
  if (!draft.withRetest) return body;
  const values: Record<string, number | string> = { basis: draft.basis };
  for (const { field } of RETEST_FIELDS) {
    const typed = (draft.values[field] ?? '').trim().replace(',', '.');
    if (typed === '') continue;
    const n = Number(typed);
    values[field] = Number.isFinite(n) ? n : typed;
  }
  return { ...body, retest: { labName: draft.labName.trim(), labCertified: draft.labCertified, reportDate: draft.reportDate, values } };
}

/** The first thing still missing before the claim can be sent, or null (`lotsOnOrder`: lines on the order). */
export function missingInDraft(draft: ClaimDraft, lotsOnOrder = 1): string | null {
  if (draft.reason.trim().length < 10) return 'Say what is wrong with the hay (at least 10 characters).';
  if (!draft.withRetest) return null;
  // A retest is of one lot's hay.
  if (lotsOnOrder > 1 && !draft.lineId) return 'Choose the lot the retest is of.';
  if (!draft.labName.trim()) return 'Name the lab that retested the hay.';
  if (!draft.reportDate) return 'Enter the date of the retest report.';
  const blank = RETEST_FIELDS.find((f) => f.required && !(draft.values[f.field] ?? '').trim());
  return blank ? `Enter ${blank.label} from the retest.` : null;
}
