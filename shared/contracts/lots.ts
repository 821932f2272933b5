import { z } from 'zod';
import { singleLineText } from './text';
import type { ForageEvaluation, SamplingEvaluation } from '../forage';
import type { VisualMouldScore } from '../forage/mould-scores';
import type { AnalysisMethod, CorePosition, ForageClass, StorageKind, VerificationState } from './enums';

export const FORAGE_TYPES = [
  'alfalfa',
  'clover',
  'timothy',
  'orchardgrass',
  'bermudagrass',
  'teff',
  'bromegrass',
  'fescue',
  'oat',
  'sudangrass',
  'sorghum_sudangrass',
  'forage_sorghum',
  'alfalfa_grass_mix',
  'grass_mix',
] as const;
export type ForageType = (typeof FORAGE_TYPES)[number];

export const BALE_TYPES = [
  'small_square_2_string',
  'small_square_3_string',
  'large_square_3x3x8',
  'large_square_3x4x8',
  'large_square_4x4x8',
  'round_4x4',
  'round_4x5',
  'round_5x5',
  'round_5x6',
] as const;
export type BaleType = (typeof BALE_TYPES)[number];

/** Where a lot is in its life; the steps between them are in `shared/lifecycle/lot-lifecycle`. */
export const LOT_STATUSES = [
  'draft', // being written by the grower
  'in_review', // submitted, waiting for an admin to check the lab report
  'returned', // sent back to the grower with a reason
  'listed', // approved and public
  'withdrawn', // taken off sale by the grower
  'sold_out', // approved, no bales left
] as const;
export type LotStatus = (typeof LOT_STATUSES)[number];

export const LOT_SORTS = ['newest', 'price', 'price_dm', 'rfv', 'protein', 'distance'] as const;
export type LotSort = (typeof LOT_SORTS)[number];

const num = (label: string, min: number, max: number) =>
  z.coerce
    .number({ message: `${label} must be a number.` })
    .min(min, `${label} must be at least ${min}.`)
    .max(max, `${label} must be at most ${max}.`);

const flag = z.enum(['true', 'false']).transform((v) => v === 'true');

/**
 * Catalogue query, as it appears in the URL (`/hay?rfvMin=150&zip=66502&radiusMi=100`) and in GET /api/lots.
 * Quality limits are on a dry-matter basis; prices are dollars per short ton as-fed.
 */
export const LotSearchSchema = z
  .object({
    q: singleLineText('Search words', 100).optional(),
    rfvMin: num('Minimum RFV', 0, 400).optional(),
    rfvMax: num('Maximum RFV', 0, 400).optional(),
    rfqMin: num('Minimum RFQ', 0, 400).optional(),
    cpMin: num('Minimum crude protein', 0, 100).optional(),
    cpMax: num('Maximum crude protein', 0, 100).optional(),
    adfMax: num('Maximum ADF', 0, 100).optional(),
    ndfMax: num('Maximum NDF', 0, 100).optional(),
    nscMax: num('Maximum NSC', 0, 100).optional(),
    forageType: z.enum(FORAGE_TYPES, { message: 'Unknown forage type.' }).optional(),
    baleType: z.enum(BALE_TYPES, { message: 'Unknown bale type.' }).optional(),
    cutting: num('Cutting', 1, 8).int().optional(),
    harvestYear: num('Harvest year', 1990, 2100).int().optional(),
    priceMax: num('Maximum price per ton', 0, 100000).optional(),
    tonsMin: num('Minimum quantity', 0, 100000).optional(),
    zip: z.string().regex(/^\d{5}$/, 'ZIP code must be 5 digits.').optional(),
    radiusMi: num('Radius', 1, 3000).optional(),
    compliantOnly: flag.optional(),
    verifiedOnly: flag.optional(),
    /** Only lots whose current analysis includes a nitrate result. */
    nitrateTestedOnly: flag.optional(),
    sort: z.enum(LOT_SORTS, { message: `Sort must be one of: ${LOT_SORTS.join(', ')}.` }).default('newest'),
    page: num('Page', 1, 10000).int().default(1),
    pageSize: num('Page size', 1, 100).int().default(12),
  })
  .strict()
  .refine((q) => q.rfvMin === undefined || q.rfvMax === undefined || q.rfvMin <= q.rfvMax, {
    message: 'Minimum RFV must not exceed maximum RFV.',
    path: ['rfvMin'],
  })
  .refine((q) => q.cpMin === undefined || q.cpMax === undefined || q.cpMin <= q.cpMax, {
    message: 'Minimum crude protein must not exceed maximum.',
    path: ['cpMin'],
  })
  .refine((q) => q.radiusMi === undefined || q.zip !== undefined, {
    message: 'Give a ZIP code to search by distance.',
    path: ['zip'],
  })
  .refine((q) => q.sort !== 'distance' || q.zip !== undefined, {
    message: 'Give a ZIP code to sort by distance.',
    path: ['sort'],
  });
export type LotSearch = z.infer<typeof LotSearchSchema>;

export interface PhotoVariantView {
  width: number;
  height: number;
  format: string;
  url: string;
}

export interface PhotoView {
  id: number;
  altText: string;
  width: number;
  height: number;
  isCover: boolean;
  variants: PhotoVariantView[];
}

/** One lot in the catalogue. Nutrients are % of dry matter; money in integer cents. */
export interface LotSummary {
  id: number;
  title: string;
  farmName: string;
  city: string;
  state: string;
  forageType: ForageType;
  forageClass: ForageClass;
  cutting: number;
  baleType: BaleType;
  avgBaleWeightLb: number;
  balesAvailable: number;
  tonsAvailable: number;
  priceCentsPerTon: number;
  /** Price per short ton of dry matter: as-fed price ÷ DM fraction. */
  priceCentsPerDmTon: number;
  harvestYear: number;
  dryMatterPct: number;
  rfv: number;
  rfq: number | null;
  crudeProteinPct: number;
  adfPct: number;
  ndfPct: number;
  nscPct: number | null;
  usdaGrade: string;
  samplingCompliant: boolean;
  labCertified: boolean;
  analysisVerified: boolean;
  distanceMi: number | null;
  /** Where to draw the lot on a map: the farm's place rounded to 0.1° (about 7 mi), never the barn itself. */
  mapPoint: { lat: number; lon: number };
  cover: PhotoView | null;
  publishedAt: string | null;
}

/** A catalogue search counts matching lots exactly up to this many; beyond, it says "more than". */
export const SEARCH_TOTAL_CAP = 1000;

export interface LotSearchResult {
  items: LotSummary[];
  /** Matching lots, exact when `totalCapped` is false; otherwise SEARCH_TOTAL_CAP and more match. */
  total: number;
  totalCapped: boolean;
  page: number;
  pageSize: number;
  /** Set when a ZIP was given: where distances are measured from. */
  origin: { zip: string; city: string; state: string; lat: number; lon: number } | null;
}

/** Everything the lot page shows. Nutrients are stored and returned on a dry-matter basis. */
export interface LotDetail {
  id: number;
  status: LotStatus;
  title: string;
  description: string;
  fieldName: string;
  cutting: number;
  forageType: ForageType;
  forageClass: ForageClass;
  mixDescription: string;
  harvestStartedOn: string;
  harvestEndedOn: string;
  storage: StorageKind;
  moistureAtBalingPct: number | null;
  /** Growing conditions the grower reported: a drought-stressed crop; heavy nitrogen fertiliser or manure. */
  droughtStressed: boolean;
  heavyNitrogen: boolean;
  baleType: BaleType;
  baleCount: number;
  balesAvailable: number;
  avgBaleWeightLb: number;
  tonsAvailable: number;
  pricingUnit: 'ton' | 'bale';
  priceCentsPerTon: number;
  priceCentsPerBale: number | null;
  minOrderTons: number;
  freightCentsPerLoadedMile: number | null;
  deliveryTerms: string;
  pickupAllowed: boolean;
  publishedAt: string | null;
  farm: {
    id: number;
    name: string;
    city: string;
    state: string;
    zip: string;
    deliveryRadiusMi: number;
    loadingFacilities: string;
    pickupHours: string;
  };
  analysis: LotAnalysisView | null;
  /** The forage engine's figures for the current analysis (unrounded). */
  evaluation: ForageEvaluation | null;
  sampling: LotSamplingView | null;
  /** The sampling record checked against the protocol, as of the listing date. */
  samplingReport: SamplingEvaluation | null;
  photos: PhotoView[];
}

/** The bale shape the sampling protocol cares about (where to core). */
export function baleShapeOf(baleType: BaleType): 'small-square' | 'large-square' | 'round' {
  if (baleType.startsWith('small')) return 'small-square';
  return baleType.startsWith('round') ? 'round' : 'large-square';
}

export interface LotAnalysisView {
  labName: string;
  labCertified: boolean;
  reportNumber: string;
  reportDate: string;
  method: AnalysisMethod;
  enteredBasis: 'dm' | 'asFed';
  verification: VerificationState;
  hasReportFile: boolean;
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
  /** Nitrate, % nitrate ion of dry matter; null when not tested. */
  nitrateNo3PctDm: number | null;
  /** Mould count, CFU per gram, as the lab reported it. */
  mouldCfuPerG: number | null;
  /** Mould the grower saw when bales were opened. */
  visualMouldScore: VisualMouldScore | null;
  aflatoxinPpb: number | null;
  donPpm: number | null;
  fumonisinPpm: number | null;
}

export interface LotSamplingView {
  sampledOn: string;
  coresTaken: number;
  balesSampled: number;
  probeDiameterIn: number;
  probeLengthIn: number;
  corePosition: CorePosition;
  sampledBy: string;
  compliant: boolean;
}
