import { and, asc, desc, eq, gte, inArray, lte, sql, type SQL } from 'drizzle-orm';
import { SEARCH_TOTAL_CAP, type LotDetail, type LotSearch, type LotSearchResult, type LotSummary, type PhotoView } from '@shared/contracts/lots';
import { mayViewLot } from '@shared/lifecycle/lot-lifecycle';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { farms, labAnalyses, lots, lotSearch, photos, samplingRecords, type PhotoVariant } from '../../db/schema';
import { farmDistanceSql, farmWithinSql, locateZip } from '../geo/geo';
import { evaluationOf } from '../selling/analysis-values';
import { samplingFactsOf } from '@shared/forage/sampling-verdict';
import { storedSamplingVerdict } from './sampling-report';
import { costPerTonDryMatterCents } from '@shared/pricing/cost-per-nutrient';
import { balesToTons, roundCents } from '@shared/units';
import { pickFields, STORED_KEYS } from '@shared/forage/analysis-fields';

export function photoView(row: { id: number; altText: string; width: number; height: number; isCover: boolean; variants: PhotoVariant[] }): PhotoView {
  return {
    id: row.id,
    altText: row.altText,
    width: row.width,
    height: row.height,
    isCover: row.isCover,
    variants: row.variants.map((v) => ({ width: v.width, height: v.height, format: v.format, url: `/media/${v.key}` })),
  };
}

export class LotsService {
  constructor(private readonly db: Db) {}

  /**
   * Public catalogue: listed lots in stock with a current analysis, filtered and sorted in SQL on their
   * search rows (`lot_search`, kept in step by triggers), then joined to the lot, farm and analysis for the
   * page. The total is exact up to {@link SEARCH_TOTAL_CAP}; beyond it the result says "more than".
   * `scope.lotIds` narrows the search to those lots (saved-search alerts ask "does this new lot match?").
   */
  async search(query: LotSearch, scope: { lotIds?: readonly number[] } = {}): Promise<LotSearchResult> {
    const s = lotSearch;
    const origin = query.zip ? locateZip(query.zip) : null;
    const distance = origin ? farmDistanceSql(origin, s) : null;

    const where: SQL[] = [];
    const add = (cond: SQL | undefined) => cond && where.push(cond);
    if (scope.lotIds) add(inArray(s.lotId, [...scope.lotIds]));
    if (query.q) add(sql`(${s.title} ilike ${'%' + query.q + '%'} or ${s.farmName} ilike ${'%' + query.q + '%'})`);
    if (query.rfvMin !== undefined) add(gte(s.rfv, query.rfvMin));
    if (query.rfvMax !== undefined) add(lte(s.rfv, query.rfvMax));
    if (query.rfqMin !== undefined) add(gte(s.rfq, query.rfqMin));
    if (query.cpMin !== undefined) add(gte(s.crudeProteinPct, query.cpMin));
    if (query.cpMax !== undefined) add(lte(s.crudeProteinPct, query.cpMax));
    if (query.adfMax !== undefined) add(lte(s.adfPct, query.adfMax));
    if (query.ndfMax !== undefined) add(lte(s.ndfPct, query.ndfMax));
    if (query.nscMax !== undefined) add(lte(s.nscPct, query.nscMax));
    if (query.forageType) add(eq(s.forageType, query.forageType));
    if (query.baleType) add(eq(s.baleType, query.baleType));
    if (query.cutting !== undefined) add(eq(s.cutting, query.cutting));
    if (query.harvestYear !== undefined) add(eq(s.harvestYear, query.harvestYear));
    if (query.priceMax !== undefined) add(lte(s.priceCentsPerTon, Math.round(query.priceMax * 100)));
    if (query.tonsMin !== undefined) add(sql`${s.tonsAvailable} >= ${query.tonsMin}::float8`);
    if (query.compliantOnly) add(eq(s.samplingCompliant, true));
    if (query.verifiedOnly) add(eq(s.labVerified, true));
    if (query.nitrateTestedOnly) {
      add(sql`exists (select 1 from ${labAnalyses} la where la.lot_id = ${s.lotId} and la.is_current and la.nitrate_no3_pct_dm is not null)`);
    }
    if (origin && query.radiusMi !== undefined) add(farmWithinSql(origin, query.radiusMi, undefined, s));

    // Each order matches an index on lot_search, newest ties broken by the higher lot id.
    const order: SQL[] = {
      newest: [sql`${s.publishedAt} desc nulls first`],
      price: [asc(s.priceCentsPerTon)],
      price_dm: [asc(s.priceCentsPerDmTon)],
      rfv: [sql`${s.rfv} desc nulls last`],
      protein: [sql`${s.crudeProteinPct} desc nulls last`],
      distance: distance ? [asc(distance)] : [],
    }[query.sort];

    const offset = (query.page - 1) * query.pageSize;
    // First the page's lot ids from the search rows alone (an index walk, or the few rows near a place),
    // then their details: the joins touch only the lots on the page.
    const page = await this.db
      .select({ lotId: s.lotId, distanceMi: distance ? sql<number>`${distance}` : sql<null>`null::float8` })
      .from(s)
      .where(and(...where))
      .orderBy(...order, sql`${s.lotId} desc nulls last`)
      .limit(query.pageSize)
      .offset(offset);
    const details = page.length === 0 ? [] : await this.db
      .select({
        id: lots.id,
        title: lots.title,
        farmName: farms.name,
        city: farms.city,
        state: farms.state,
        forageType: lots.forageType,
        forageClass: lots.forageClass,
        cutting: lots.cutting,
        baleType: lots.baleType,
        avgBaleWeightLb: lots.avgBaleWeightLb,
        balesAvailable: lots.balesAvailable,
        tonsAvailable: s.tonsAvailable,
        priceCentsPerTon: lots.priceCentsPerTon,
        harvestYear: s.harvestYear,
        dryMatterPct: labAnalyses.dryMatterPct,
        rfv: labAnalyses.rfv,
        rfq: labAnalyses.rfq,
        crudeProteinPct: labAnalyses.crudeProteinPct,
        adfPct: labAnalyses.adfPct,
        ndfPct: labAnalyses.ndfPct,
        nscPct: labAnalyses.nscPct,
        usdaGrade: labAnalyses.usdaGrade,
        samplingCompliant: s.samplingCompliant,
        labCertified: labAnalyses.labCertified,
        analysisVerified: sql<boolean>`${labAnalyses.verification} = 'verified'`,
        mapLat: sql<number>`round(${s.latitude}::numeric, 1)::float8`,
        mapLon: sql<number>`round(${s.longitude}::numeric, 1)::float8`,
        publishedAt: lots.publishedAt,
      })
      .from(s)
      .innerJoin(lots, eq(lots.id, s.lotId))
      .innerJoin(farms, eq(farms.id, lots.farmId))
      .innerJoin(labAnalyses, and(eq(labAnalyses.lotId, lots.id), eq(labAnalyses.isCurrent, true)))
      .where(inArray(s.lotId, page.map((p) => p.lotId)));
    const byId = new Map(details.map((d) => [d.id, d]));
    const rows = page.flatMap((p) => {
      const d = byId.get(p.lotId);
      return d ? [{ ...d, distanceMi: p.distanceMi }] : [];
    });

    // A short last page tells the total without counting; otherwise count, but stop past the cap.
    const { total, totalCapped } =
      rows.length > 0 && rows.length < query.pageSize ? { total: offset + rows.length, totalCapped: false } : await this.cappedCount(where);
    const covers = await this.coversFor(rows.map((r) => r.id));
    const items: LotSummary[] = rows.map(({ publishedAt, mapLat, mapLon, ...r }) => ({
      ...r,
      mapPoint: { lat: Number(mapLat), lon: Number(mapLon) },
      priceCentsPerDmTon: roundCents(costPerTonDryMatterCents(r.priceCentsPerTon, r.dryMatterPct)),
      distanceMi: r.distanceMi === null ? null : Number(r.distanceMi),
      cover: covers.get(r.id) ?? null,
      publishedAt: publishedAt ? publishedAt.toISOString() : null,
    }));
    return {
      items,
      total,
      totalCapped,
      page: query.page,
      pageSize: query.pageSize,
      origin: origin ? { zip: origin.zip, city: origin.city, state: origin.state, lat: origin.latitude, lon: origin.longitude } : null,
    };
  }

  /** How many search rows match, exact up to SEARCH_TOTAL_CAP; reading stops one row past it. */
  private async cappedCount(where: SQL[]): Promise<{ total: number; totalCapped: boolean }> {
    const matching = this.db.select({ one: sql`1` }).from(lotSearch).where(and(...where)).limit(SEARCH_TOTAL_CAP + 1).as('matching');
    const [row] = await this.db.select({ n: sql<number>`count(*)`.mapWith(Number) }).from(matching);
    const n = row?.n ?? 0;
    return n > SEARCH_TOTAL_CAP ? { total: SEARCH_TOTAL_CAP, totalCapped: true } : { total: n, totalCapped: false };
  }

  /** The cover photo of each lot (the marked cover, else the first by position). */
  async coversFor(lotIds: number[]): Promise<Map<number, PhotoView>> {
    if (lotIds.length === 0) return new Map();
    const rows = await this.db
      .selectDistinctOn([photos.lotId])
      .from(photos)
      .where(inArray(photos.lotId, lotIds))
      .orderBy(photos.lotId, desc(photos.isCover), asc(photos.position), asc(photos.id));
    return new Map(rows.map((p) => [p.lotId, photoView(p)]));
  }
}

export type Viewer = Express.User | undefined;

/** A lot for its page: public when listed; the owning grower and admins may see it in any state. */
export async function findLotDetail(db: Db, id: number, viewer: Viewer, clock: Clock): Promise<LotDetail | null> {
  const [row] = await db
    .select({ lot: lots, farm: farms })
    .from(lots)
    .innerJoin(farms, eq(farms.id, lots.farmId))
    .where(eq(lots.id, id));
  if (!row) return null;
  const { lot, farm } = row;
  if (!mayViewLot(lot.status, { isOwner: viewer?.id === farm.ownerId, isAdmin: viewer?.role === 'admin' })) return null;

  const [analysis] = await db.select().from(labAnalyses).where(and(eq(labAnalyses.lotId, id), eq(labAnalyses.isCurrent, true)));
  const [sampling] = await db.select().from(samplingRecords).where(eq(samplingRecords.lotId, id));
  const photoRows = await db.select().from(photos).where(eq(photos.lotId, id)).orderBy(desc(photos.isCover), asc(photos.position), asc(photos.id));

  return {
    id: lot.id,
    status: lot.status,
    title: lot.title,
    description: lot.description,
    fieldName: lot.fieldName,
    cutting: lot.cutting,
    forageType: lot.forageType,
    forageClass: lot.forageClass,
    mixDescription: lot.mixDescription,
    harvestStartedOn: lot.harvestStartedOn,
    harvestEndedOn: lot.harvestEndedOn,
    storage: lot.storage,
    moistureAtBalingPct: lot.moistureAtBalingPct,
    droughtStressed: lot.droughtStressed,
    heavyNitrogen: lot.heavyNitrogen,
    baleType: lot.baleType,
    baleCount: lot.baleCount,
    balesAvailable: lot.balesAvailable,
    avgBaleWeightLb: lot.avgBaleWeightLb,
    tonsAvailable: balesToTons(lot.balesAvailable, lot.avgBaleWeightLb),
    pricingUnit: lot.pricingUnit,
    priceCentsPerTon: lot.priceCentsPerTon,
    priceCentsPerBale: lot.priceCentsPerBale,
    minOrderTons: lot.minOrderTons,
    freightCentsPerLoadedMile: lot.freightCentsPerLoadedMile,
    deliveryTerms: lot.deliveryTerms,
    pickupAllowed: lot.pickupAllowed,
    publishedAt: lot.publishedAt?.toISOString() ?? null,
    farm: {
      id: farm.id,
      name: farm.name,
      city: farm.city,
      state: farm.state,
      zip: farm.zip,
      deliveryRadiusMi: farm.deliveryRadiusMi,
      loadingFacilities: farm.loadingFacilities,
      pickupHours: farm.pickupHours,
    },
    analysis: analysis
      ? {
          labName: analysis.labName,
          labCertified: analysis.labCertified,
          reportNumber: analysis.reportNumber,
          reportDate: analysis.reportDate,
          method: analysis.method,
          enteredBasis: analysis.enteredBasis,
          verification: analysis.verification,
          hasReportFile: analysis.reportFileId !== null,
          ...pickFields(analysis, STORED_KEYS),
          visualMouldScore: analysis.visualMouldScore,
        }
      : null,
    evaluation: analysis ? evaluationOf(analysis, lot.forageClass) : null,
    samplingReport: sampling ? storedSamplingVerdict(sampling) : null,
    sampling: sampling ? { ...samplingFactsOf(sampling), compliant: sampling.compliant } : null,
    photos: photoRows.map(photoView),
  };
}

