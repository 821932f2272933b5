import { FORAGE_TYPE_LABELS } from '@shared/contracts/labels';
import type { LotSummary } from '@shared/contracts/lots';
import { formatCents } from '@shared/units/money';

/** The lot's facts every e-mail about it carries: what hay, from where, its measured figures and its price. */
export function lotMailFacts(lot: LotSummary): [string, string][] {
  const facts: ([string, string] | null)[] = [
    ['Hay', `${FORAGE_TYPE_LABELS[lot.forageType]}, cutting ${lot.cutting}, ${lot.harvestYear}`],
    ['From', `${lot.farmName}, ${lot.city}, ${lot.state}`],
    ['USDA grade', lot.usdaGrade],
    ['RFV', String(Math.round(lot.rfv))],
    ['Crude protein', `${lot.crudeProteinPct.toFixed(1)} % of DM`],
    lot.nscPct === null ? null : ['NSC (sugar + starch)', `${lot.nscPct.toFixed(1)} % of DM`],
    ['Price', `${formatCents(lot.priceCentsPerTon, { showCents: false })}/ton as-fed`],
    ['Left', `${lot.tonsAvailable.toFixed(1)} tons`],
    lot.distanceMi === null ? null : ['Distance', lot.distanceMi < 1 ? 'under 1 mi' : `${Math.round(lot.distanceMi)} mi`],
  ];
  return facts.filter((f): f is [string, string] => f !== null);
}

/** Said under every lot e-mail: the figures are the sample's, and feeding is for the vet or nutritionist. */
export const LOT_MAIL_CAUTION =
  'Lab figures describe the sample, not every bale; look the hay over before feeding, and confirm rations with your veterinarian or an equine nutritionist.';
