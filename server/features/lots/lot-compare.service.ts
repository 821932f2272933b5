import { and, eq, inArray, sql } from 'drizzle-orm';
import { COMPARED_LAB_FIELDS, type ComparedLot, type ComparedPricing, type LotCompareQuery, type LotComparison } from '@shared/contracts/compare';
import { pickFields } from '@shared/forage/analysis-fields';
import { PUBLIC_LOT_STATUSES } from '@shared/lifecycle/lot-lifecycle';
import { costPerLbCrudeProteinCents, costPerMcalDeCents, costPerTonDryMatterCents, deliveredPrice, DEFAULT_TONS_PER_LOAD } from '@shared/pricing';
import type { Db } from '../../db/client';
import { farms, labAnalyses, lots } from '../../db/schema';
import { farmDistanceSql, locateZip } from '../geo/geo';
import { balesToTons } from '@shared/units';

/** Lots side by side: nutrients on a DM basis and cost per unit of what the horse gets, delivered to a ZIP. */
export async function compareLots(db: Db, query: LotCompareQuery): Promise<LotComparison> {
  const origin = query.zip ? locateZip(query.zip) : null;
  const distance = origin ? farmDistanceSql(origin) : sql<null>`null::float8`;
  const rows = await db
    .select({ lot: lots, farm: farms, analysis: labAnalyses, distanceMi: distance })
    .from(lots)
    .innerJoin(farms, eq(farms.id, lots.farmId))
    .innerJoin(labAnalyses, and(eq(labAnalyses.lotId, lots.id), eq(labAnalyses.isCurrent, true)))
    .where(and(inArray(lots.id, query.ids), inArray(lots.status, PUBLIC_LOT_STATUSES)));

  const byId = new Map(rows.map((r) => [r.lot.id, r]));
  const items: ComparedLot[] = [];
  for (const id of query.ids) {
    const row = byId.get(id);
    if (!row) continue;
    const { lot, farm, analysis } = row;
    const distanceMi = row.distanceMi === null ? null : Number(row.distanceMi);
    const tonsAvailable = balesToTons(lot.balesAvailable, lot.avgBaleWeightLb);
    items.push({
      id: lot.id,
      title: lot.title,
      status: lot.status as 'listed' | 'sold_out',
      farmName: farm.name,
      city: farm.city,
      state: farm.state,
      forageType: lot.forageType,
      cutting: lot.cutting,
      baleType: lot.baleType,
      avgBaleWeightLb: lot.avgBaleWeightLb,
      balesAvailable: lot.balesAvailable,
      tonsAvailable,
      minOrderTons: lot.minOrderTons,
      priceCentsPerTon: lot.priceCentsPerTon,
      freightCentsPerLoadedMile: lot.freightCentsPerLoadedMile,
      distanceMi,
      deliveryRadiusMi: farm.deliveryRadiusMi,
      labCertified: analysis.labCertified,
      analysisVerified: analysis.verification === 'verified',
      nutrients: {
        ...pickFields(analysis, COMPARED_LAB_FIELDS),
        nscPct: analysis.nscPct,
        rfv: analysis.rfv,
        rfq: analysis.rfq,
        tdnPct: analysis.tdnPct,
        deMcalPerKgDm: analysis.deMcalPerKgDm,
        deMethod: analysis.deMethod,
      },
      pricing: pricingFor({
        tons: query.tons ?? Math.min(DEFAULT_TONS_PER_LOAD, tonsAvailable),
        priceCentsPerTon: lot.priceCentsPerTon,
        freightCentsPerLoadedMile: lot.freightCentsPerLoadedMile,
        distanceMi,
        deliveryRadiusMi: farm.deliveryRadiusMi,
        dryMatterPct: analysis.dryMatterPct,
        crudeProteinPct: analysis.crudeProteinPct,
        deMcalPerKgDm: analysis.deMcalPerKgDm,
      }),
    });
  }
  return {
    items,
    missingIds: query.ids.filter((id) => !byId.has(id)),
    origin: origin ? { zip: origin.zip, city: origin.city, state: origin.state } : null,
  };
}

interface PricingInput {
  tons: number;
  priceCentsPerTon: number;
  freightCentsPerLoadedMile: number | null;
  distanceMi: number | null;
  deliveryRadiusMi: number;
  dryMatterPct: number;
  crudeProteinPct: number;
  deMcalPerKgDm: number;
}

/** Freight = rate per loaded mile × miles × whole loads; per-unit costs use the delivered price per ton. */
export function pricingFor(input: PricingInput): ComparedPricing {
  const note =
    input.distanceMi === null
      ? 'Give your ZIP code to include freight.'
      : input.freightCentsPerLoadedMile === null
        ? 'The grower has not quoted a freight rate; price at the farm.'
        : null;
  const delivered = note === null;
  const price = deliveredPrice({
    pricePerTonCents: input.priceCentsPerTon,
    tons: input.tons,
    freightCentsPerLoadedMile: delivered ? input.freightCentsPerLoadedMile! : 0,
    distanceMi: delivered ? input.distanceMi! : 0,
  });
  const perTonCents = input.tons > 0 ? price.deliveredPerTonCents : input.priceCentsPerTon;
  const outsideRadius = delivered && input.distanceMi! > input.deliveryRadiusMi;
  return {
    basis: delivered ? 'delivered' : 'at-farm',
    note: outsideRadius ? `Beyond the grower's ${input.deliveryRadiusMi}-mile delivery area: ask before ordering.` : note,
    tons: input.tons,
    loads: price.loads,
    hayCents: price.hayCents,
    freightCents: price.freightCents,
    totalCents: price.totalCents,
    perTonCents,
    perDmTonCents: costPerTonDryMatterCents(perTonCents, input.dryMatterPct),
    perLbCrudeProteinCents: input.crudeProteinPct > 0 ? costPerLbCrudeProteinCents(perTonCents, input.dryMatterPct, input.crudeProteinPct) : null,
    perMcalDeCents: costPerMcalDeCents(perTonCents, input.dryMatterPct, input.deMcalPerKgDm),
  };
}
