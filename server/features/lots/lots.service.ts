import { and, asc, desc, eq, gte, inArray, lte, sql, type SQL } from 'drizzle-orm';
import type { LotDetail, LotSearch, LotSearchResult, LotSummary, PhotoView } from '@shared/contracts/lots';
import { mayViewLot } from '@shared/lifecycle/lot-lifecycle';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { farms, labAnalyses, lots, photos, samplingRecords, type PhotoVariant } from '../../db/schema';
import { farmDistanceSql, farmWithinSql, locateZip } from '../geo/geo';
import { evaluationOf } from '../selling/analysis-values';
import { samplingFactsOf, samplingReportOf } from './sampling-report';

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
   * Public catalogue: listed lots with a current analysis, filtered and sorted in SQL.
   * `scope.lotIds` narrows the search to those lots (saved-search alerts ask "does this new lot match?").
   */
  async search(query: LotSearch, scope: { lotIds?: readonly number[] } = {}): Promise<LotSearchResult> {
    const origin = query.zip ? locateZip(query.zip) : null;
    const distance = origin ? farmDistanceSql(origin) : null;
    const tonsAvailable = sql<number>`(${lots.balesAvailable} * ${lots.avgBaleWeightLb} / 2000.0)`;
    const pricePerDmTon = sql<number>`(${lots.priceCentsPerTon} / (${labAnalyses.dryMatterPct} / 100.0))`;

    const where: SQL[] = [eq(lots.status, 'listed'), sql`${lots.balesAvailable} > 0`];
    const add = (cond: SQL | undefined) => cond && where.push(cond);
    if (scope.lotIds) add(inArray(lots.id, [...scope.lotIds]));
    if (query.q) add(sql`(${lots.title} ilike ${'%' + query.q + '%'} or ${farms.name} ilike ${'%' + query.q + '%'})`);
    if (query.rfvMin !== undefined) add(gte(labAnalyses.rfv, query.rfvMin));
    if (query.rfvMax !== undefined) add(lte(labAnalyses.rfv, query.rfvMax));
    if (query.rfqMin !== undefined) add(gte(labAnalyses.rfq, query.rfqMin));
    if (query.cpMin !== undefined) add(gte(labAnalyses.crudeProteinPct, query.cpMin));
    if (query.cpMax !== undefined) add(lte(labAnalyses.crudeProteinPct, query.cpMax));
    if (query.adfMax !== undefined) add(lte(labAnalyses.adfPct, query.adfMax));
    if (query.ndfMax !== undefined) add(lte(labAnalyses.ndfPct, query.ndfMax));
    if (query.nscMax !== undefined) add(lte(labAnalyses.nscPct, query.nscMax));
    if (query.forageType) add(eq(lots.forageType, query.forageType));
    if (query.baleType) add(eq(lots.baleType, query.baleType));
    if (query.cutting !== undefined) add(eq(lots.cutting, query.cutting));
    if (query.harvestYear !== undefined) add(sql`extract(year from ${lots.harvestStartedOn}) = ${query.harvestYear}`);
    if (query.priceMax !== undefined) add(lte(lots.priceCentsPerTon, Math.round(query.priceMax * 100)));
    if (query.tonsMin !== undefined) add(sql`${tonsAvailable} >= ${query.tonsMin}::float8`);
    if (query.compliantOnly) add(eq(samplingRecords.compliant, true));
    if (query.verifiedOnly) add(and(eq(labAnalyses.verification, 'verified'), eq(labAnalyses.labCertified, true)));
    if (origin && query.radiusMi !== undefined) add(farmWithinSql(origin, query.radiusMi));

    const order: SQL[] = {
      newest: [desc(lots.publishedAt)],
      price: [asc(lots.priceCentsPerTon)],
      price_dm: [asc(pricePerDmTon)],
      rfv: [desc(labAnalyses.rfv)],
      protein: [desc(labAnalyses.crudeProteinPct)],
      distance: distance ? [asc(distance)] : [],
    }[query.sort];

    const base = this.db
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
        tonsAvailable,
        priceCentsPerTon: lots.priceCentsPerTon,
        priceCentsPerDmTon: pricePerDmTon,
        harvestYear: sql<number>`extract(year from ${lots.harvestStartedOn})::int`,
        dryMatterPct: labAnalyses.dryMatterPct,
        rfv: labAnalyses.rfv,
        rfq: labAnalyses.rfq,
        crudeProteinPct: labAnalyses.crudeProteinPct,
        adfPct: labAnalyses.adfPct,
        ndfPct: labAnalyses.ndfPct,
        nscPct: labAnalyses.nscPct,
        usdaGrade: labAnalyses.usdaGrade,
        samplingCompliant: sql<boolean>`coalesce(${samplingRecords.compliant}, false)`,
        labCertified: labAnalyses.labCertified,
        analysisVerified: sql<boolean>`${labAnalyses.verification} = 'verified'`,
        distanceMi: distance ? sql<number>`${distance}` : sql<null>`null::float8`,
        publishedAt: lots.publishedAt,
        total: sql<number>`count(*) over ()`.mapWith(Number),
      })
      .from(lots)
      .innerJoin(farms, eq(farms.id, lots.farmId))
      .innerJoin(labAnalyses, and(eq(labAnalyses.lotId, lots.id), eq(labAnalyses.isCurrent, true)))
      .leftJoin(samplingRecords, eq(samplingRecords.lotId, lots.id))
      .where(and(...where))
      .orderBy(...order, desc(lots.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize);

    const rows = await base;
    const total = rows[0]?.total ?? (query.page > 1 ? await this.countOnly(where) : 0);
    const covers = await this.coversFor(rows.map((r) => r.id));
    const items: LotSummary[] = rows.map(({ total: _total, publishedAt, ...r }) => ({
      ...r,
      tonsAvailable: Number(r.tonsAvailable),
      priceCentsPerDmTon: Math.round(Number(r.priceCentsPerDmTon)),
      distanceMi: r.distanceMi === null ? null : Number(r.distanceMi),
      cover: covers.get(r.id) ?? null,
      publishedAt: publishedAt ? publishedAt.toISOString() : null,
    }));
    return {
      items,
      total,
      page: query.page,
      pageSize: query.pageSize,
      origin: origin ? { zip: origin.zip, city: origin.city, state: origin.state } : null,
    };
  }

  private async countOnly(where: SQL[]): Promise<number> {
    const [row] = await this.db
      .select({ n: sql<number>`count(*)`.mapWith(Number) })
      .from(lots)
      .innerJoin(farms, eq(farms.id, lots.farmId))
      .innerJoin(labAnalyses, and(eq(labAnalyses.lotId, lots.id), eq(labAnalyses.isCurrent, true)))
      .leftJoin(samplingRecords, eq(samplingRecords.lotId, lots.id))
      .where(and(...where));
    return row?.n ?? 0;
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
    baleType: lot.baleType,
    baleCount: lot.baleCount,
    balesAvailable: lot.balesAvailable,
    avgBaleWeightLb: lot.avgBaleWeightLb,
    tonsAvailable: (lot.balesAvailable * lot.avgBaleWeightLb) / 2000,
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
          dryMatterPct: analysis.dryMatterPct,
          crudeProteinPct: analysis.crudeProteinPct,
          adfPct: analysis.adfPct,
          ndfPct: analysis.ndfPct,
          ndfd48Pct: analysis.ndfd48Pct,
          fatPct: analysis.fatPct,
          ashPct: analysis.ashPct,
          escPct: analysis.escPct,
          wscPct: analysis.wscPct,
          starchPct: analysis.starchPct,
          calciumPct: analysis.calciumPct,
          phosphorusPct: analysis.phosphorusPct,
          reportedRfv: analysis.reportedRfv,
        }
      : null,
    evaluation: analysis ? evaluationOf(analysis, lot.forageClass) : null,
    samplingReport: sampling ? samplingReportOf(lot, sampling, lot.publishedAt ?? clock.now()) : null,
    sampling: sampling ? { ...samplingFactsOf(sampling), compliant: sampling.compliant } : null,
    photos: photoRows.map(photoView),
  };
}

