import { COMPARED_LAB_FIELDS, type ComparedLot } from '@shared/contracts/compare';
import { analysisField } from '@shared/forage/analysis-fields';
import { BALE_TYPE_LABELS, FORAGE_TYPE_LABELS } from '@shared/contracts/labels';
import { inLocale } from '../format';

/** One row of the comparison table: a label and a display value per lot; `best` marks the lowest cost. */
export interface CompareRow {
  label: string;
  hint?: string;
  values: string[];
  best?: number;
}

export interface CompareSection {
  title: string;
  rows: CompareRow[];
}


function lowest(values: (number | null)[]): number | undefined {
  let best: number | undefined;
  values.forEach((v, i) => {
    if (v !== null && Number.isFinite(v) && (best === undefined || v < values[best]!)) best = i;
  });
  return values.length > 1 ? best : undefined;
}

function costRow(dollars: (cents: number, digits: number) => string, label: string, lots: ComparedLot[], pick: (l: ComparedLot) => number | null, digits: number, hint?: string): CompareRow {
  const raw = lots.map(pick);
  return { label, hint, values: raw.map((v) => (v === null ? '—' : dollars(v, digits))), best: lowest(raw) };
}

/** The table's sections, built once per comparison. Nutrients are % of dry matter. */
export function compareSections(lots: ComparedLot[], locale = 'en-US'): CompareSection[] {
  const { fixed, dollars } = inLocale(locale);
  const pct = (v: number | null, digits = 1) => (v === null ? '—' : `${fixed(v, digits)}%`);
  const row = (label: string, pick: (l: ComparedLot) => string, hint?: string): CompareRow => ({ label, hint, values: lots.map(pick) });
  return [
    {
      title: 'The hay',
      rows: [
        row('Farm', (l) => `${l.farmName}, ${l.city}, ${l.state}`),
        row('Distance', (l) => (l.distanceMi === null ? '—' : `${fixed(l.distanceMi, 0)} mi`)),
        row('Forage', (l) => `${FORAGE_TYPE_LABELS[l.forageType]}, cutting ${l.cutting}`),
        row('Bales', (l) => `${BALE_TYPE_LABELS[l.baleType]}, ${fixed(l.avgBaleWeightLb, 0)} lb`),
        row('Available', (l) => `${fixed(l.tonsAvailable, 1)} t (${l.balesAvailable} bales)`),
        row('Lab report', (l) => (l.analysisVerified ? (l.labCertified ? 'Certified lab, checked' : 'Checked') : 'Not yet checked')),
      ],
    },
    {
      title: 'Nutrients (dry-matter basis)',
      rows: [
        ...COMPARED_LAB_FIELDS.map((key) => {
          const f = analysisField(key);
          return row(f.short, (l) => pct(l.nutrients[key], f.precision), key === 'dryMatterPct' ? 'as-fed weight that is not water' : undefined);
        }),
        row('NSC (sugar + starch)', (l) => pct(l.nutrients.nscPct)),
        row('RFV', (l) => fixed(l.nutrients.rfv, 0)),
        row('RFQ', (l) => (l.nutrients.rfq === null ? '—' : fixed(l.nutrients.rfq, 0))),
        row('TDN', (l) => pct(l.nutrients.tdnPct)),
        row('Horse DE', (l) => `${fixed(l.nutrients.deMcalPerKgDm, 2)} Mcal/kg DM`, 'digestible energy for horses'),
      ],
    },
    {
      title: 'Cost',
      rows: [
        costRow(dollars, 'Price per ton at the farm', lots, (l) => l.priceCentsPerTon, 0, 'as-fed'),
        row('Freight', (l) =>
          l.pricing.basis === 'delivered'
            ? `${dollars(l.pricing.freightCents)} (${l.pricing.loads} ${l.pricing.loads === 1 ? 'load' : 'loads'} × ${fixed(l.distanceMi, 0)} mi × ${dollars(l.freightCentsPerLoadedMile, 2)} per loaded mile)`
            : 'not included',
        ),
        costRow(dollars, 'Price per ton delivered', lots, (l) => (l.pricing.basis === 'delivered' ? l.pricing.perTonCents : null), 0, 'as-fed, freight spread over the tons priced'),
        costRow(dollars, 'Cost per ton of dry matter', lots, (l) => l.pricing.perDmTonCents, 0),
        costRow(dollars, 'Cost per lb of crude protein', lots, (l) => l.pricing.perLbCrudeProteinCents, 2),
        costRow(dollars, 'Cost per Mcal of horse DE', lots, (l) => l.pricing.perMcalDeCents, 3),
      ],
    },
  ];
}
