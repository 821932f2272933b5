import { z } from 'zod';
import type { Finding, ForageEvaluation, SamplingEvaluation } from '../forage';
import { ForageEvaluationRequestSchema } from '../forage';
import type { ReadingComparison, ReportReading } from './report-reading';
import { FORAGE_TYPE_LABELS } from './labels';
import { BALE_TYPES, FORAGE_TYPES, type BaleType, type ForageType, type LotDetail, type LotStatus, type PhotoView } from './lots';
import { lbToShortTons, shortTonsToLb } from '../units/mass';
import { multiLineText, singleLineText } from './text';
import { ANALYSIS_METHODS, CORE_POSITIONS, STORAGE_KINDS, type ForageClass, type VerificationState } from './enums';
import { isTimeZone } from '../time/farm-time';

/*
 * Contracts of the grower's side: farm profile, the guided lot form (one schema per step), the
 * dashboard and the admin review desk. Money is integer cents; tons are US short tons (2,000 lb) as fed.
 */

/** One line of text (names, titles); `prose` may span lines. Both refuse control and bidi characters. */
const text = (label: string, max: number) => singleLineText(label, max);
const required = (label: string, max: number) => singleLineText(label, max, { min: 1 });
const prose = (label: string, max: number) => multiLineText(label, max);
const isoDate = (label: string) => z.iso.date({ error: `${label} must be a date (YYYY-MM-DD).` });
const number = (label: string, min: number, max: number, unit = '') =>
  z
    .number({ error: `${label} must be a number.` })
    .min(min, `${label} must be at least ${min}${unit}.`)
    .max(max, `${label} must be at most ${max}${unit}.`);
const whole = (label: string, min: number, max: number) => number(label, min, max).int(`${label} must be a whole number.`);
const cents = (label: string) => whole(label, 1, 100_000_000);

// ---------------------------------------------------------------- farm

export const FarmProfileInputSchema = z
  .object({
    name: required('Farm name', 120),
    addressLine: required('Address', 200),
    zip: z.string().regex(/^\d{5}$/, 'ZIP code must be 5 digits.'),
    deliveryRadiusMi: whole('Delivery radius', 0, 3000),
    loadingFacilities: prose('Loading facilities', 500).default(''),
    pickupHours: prose('Pickup hours', 300).default(''),
    description: prose('Description', 2000).default(''),
    /** IANA time zone; when left out, the farm keeps its zone (a new farm takes its state's main zone). */
    timeZone: z.string().refine(isTimeZone, 'Choose a time zone by its IANA name, e.g. America/Chicago.').optional(),
  })
  .strict();
export type FarmProfileInput = z.infer<typeof FarmProfileInputSchema>;

export interface FarmProfile extends FarmProfileInput {
  id: number;
  timeZone: string;
  city: string;
  state: string;
  latitude: number;
  longitude: number;
  payouts: PayoutStatus;
}

/** `none`: no payout account yet; `pending`: set-up started but not finished; `ready`: payouts can be sent. */
export interface PayoutStatus {
  state: 'none' | 'pending' | 'ready';
}

// ---------------------------------------------------------------- lot form steps

/** The steps of the lot form, in order; `lots.draftStep` holds the index of the last one saved. */
export const LOT_FORM_STEPS = ['lot', 'quantity', 'sampling', 'analysis', 'photos', 'price'] as const;
export type LotFormStep = (typeof LOT_FORM_STEPS)[number];
export const stepIndex = (step: LotFormStep) => LOT_FORM_STEPS.indexOf(step) + 1;

/** Botanical class follows the forage type (it picks the engine's equations and grade tables). */
export const FORAGE_CLASS_OF: Record<ForageType, ForageClass> = {
  alfalfa: 'legume',
  clover: 'legume',
  timothy: 'grass',
  orchardgrass: 'grass',
  bermudagrass: 'grass',
  teff: 'grass',
  bromegrass: 'grass',
  fescue: 'grass',
  oat: 'grass',
  sudangrass: 'grass',
  sorghum_sudangrass: 'grass',
  forage_sorghum: 'grass',
  alfalfa_grass_mix: 'mixed',
  grass_mix: 'grass',
};

export const LotStepSchema = z
  .object({
    title: text('Title', 140).default(''),
    fieldName: required('Field name', 120),
    cutting: whole('Cutting', 1, 8),
    forageType: z.enum(FORAGE_TYPES, { message: 'Choose a forage type.' }),
    mixDescription: text('Mix', 200).default(''),
    harvestStartedOn: isoDate('Harvest start'),
    harvestEndedOn: isoDate('Harvest end'),
    storage: z.enum(STORAGE_KINDS, { message: 'Choose how the hay is stored.' }),
    moistureAtBalingPct: number('Moisture at baling', 0, 60, '%').nullable().default(null),
    /** Growing conditions (optional): the crop was drought-stressed; prompts a nitrate test. */
    droughtStressed: z.boolean({ message: 'Drought-stressed is yes or no.' }).default(false),
    /** Growing conditions (optional): heavy nitrogen fertiliser or manure on the field; prompts a nitrate test. */
    heavyNitrogen: z.boolean({ message: 'Heavy nitrogen is yes or no.' }).default(false),
    description: prose('Description', 2000).default(''),
  })
  .strict()
  .refine((s) => s.harvestEndedOn >= s.harvestStartedOn, { message: 'Harvest end must not be before the harvest start.', path: ['harvestEndedOn'] });
export type LotStep = z.infer<typeof LotStepSchema>;

/** A title in the trade's usual form when the grower leaves it blank: "Alfalfa, 2nd cutting — North Pivot". */
export function defaultLotTitle(s: Pick<LotStep, 'forageType' | 'cutting' | 'fieldName'>): string {
  const n = s.cutting;
  const suffix = n === 1 ? 'st' : n === 2 ? 'nd' : n === 3 ? 'rd' : 'th';
  return `${FORAGE_TYPE_LABELS[s.forageType]}, ${n}${suffix} cutting — ${s.fieldName}`;
}

/** Any two of bale count, average bale weight and total tons; the third is derived. */
export const QuantityStepSchema = z
  .object({
    baleType: z.enum(BALE_TYPES, { message: 'Choose a bale type.' }),
    baleCount: whole('Bale count', 1, 100_000).nullable().default(null),
    avgBaleWeightLb: number('Average bale weight', 20, 2500, ' lb').nullable().default(null),
    totalTons: number('Total tons', 0.01, 100_000).nullable().default(null),
    /** Bales still for sale; defaults to the bale count (new lot) and may not exceed it. */
    balesAvailable: whole('Bales available', 0, 100_000).nullable().default(null),
  })
  .strict()
  .superRefine((q, ctx) => {
    const given = [q.baleCount, q.avgBaleWeightLb, q.totalTons].filter((v) => v !== null).length;
    if (given < 2) ctx.addIssue({ code: 'custom', path: ['baleCount'], message: 'Give two of bale count, average bale weight and total tons.' });
    const derived = deriveQuantity(q);
    if (!derived) return;
    if (derived.avgBaleWeightLb < 20 || derived.avgBaleWeightLb > 2500) {
      ctx.addIssue({ code: 'custom', path: ['avgBaleWeightLb'], message: `That works out at ${Math.round(derived.avgBaleWeightLb)} lb a bale; bales weigh between 20 and 2,500 lb.` });
    }
    if (derived.baleCount < 1 || derived.baleCount > 100_000) ctx.addIssue({ code: 'custom', path: ['baleCount'], message: 'That works out at fewer than 1 or more than 100,000 bales.' });
    if (q.baleCount !== null && q.avgBaleWeightLb !== null && q.totalTons !== null) {
      const tons = lbToShortTons(q.baleCount * q.avgBaleWeightLb);
      if (Math.abs(tons - q.totalTons) > Math.max(0.05, tons * 0.02)) {
        ctx.addIssue({ code: 'custom', path: ['totalTons'], message: `${q.baleCount} bales of ${q.avgBaleWeightLb} lb make ${tons.toFixed(2)} tons, not ${q.totalTons}; leave one of the three blank.` });
      }
    }
    if (q.balesAvailable !== null && q.balesAvailable > derived.baleCount) {
      ctx.addIssue({ code: 'custom', path: ['balesAvailable'], message: `Bales available cannot exceed the ${derived.baleCount} bales in the lot.` });
    }
  });
export type QuantityStep = z.infer<typeof QuantityStepSchema>;

/** Completes bale count / average weight / total tons from any two of them (tons = bales × lb ÷ 2000). */
export function deriveQuantity(q: { baleCount: number | null; avgBaleWeightLb: number | null; totalTons: number | null }): { baleCount: number; avgBaleWeightLb: number; totalTons: number } | null {
  const { baleCount, avgBaleWeightLb, totalTons } = q;
  if (baleCount !== null && avgBaleWeightLb !== null) return { baleCount, avgBaleWeightLb, totalTons: lbToShortTons(baleCount * avgBaleWeightLb) };
  if (totalTons !== null && avgBaleWeightLb !== null && avgBaleWeightLb > 0) {
    return { baleCount: Math.max(1, Math.round(shortTonsToLb(totalTons) / avgBaleWeightLb)), avgBaleWeightLb, totalTons };
  }
  if (totalTons !== null && baleCount !== null && baleCount > 0) return { baleCount, avgBaleWeightLb: shortTonsToLb(totalTons) / baleCount, totalTons };
  return null;
}


/** The sampling record; bale shape, harvest dates and lot size come from the lot itself. */
export const SamplingStepSchema = z
  .object({
    sampledOn: isoDate('Sample date'),
    coresTaken: whole('Cores taken', 1, 500),
    balesSampled: whole('Bales sampled', 1, 500),
    probeDiameterIn: number('Probe diameter', 0.05, 3, ' in'),
    probeLengthIn: number('Probe length', 1, 60, ' in'),
    corePosition: z.enum(CORE_POSITIONS, { message: 'Choose where the cores were taken.' }),
    sampledBy: required('Who sampled', 120),
  })
  .strict();
export type SamplingStep = z.infer<typeof SamplingStepSchema>;


/** The lab's report details and the values typed from it (the forage class is taken from the lot). */
export const AnalysisStepSchema = z
  .object({
    labName: required('Lab name', 160),
    labCertified: z.boolean({ error: 'Say whether the lab is certified.' }),
    reportNumber: text('Report number', 80).default(''),
    reportDate: isoDate('Report date'),
    method: z.enum(ANALYSIS_METHODS, { message: 'Choose NIRS or wet chemistry.' }),
    values: z.record(z.string(), z.unknown(), { error: 'Enter the analysis values.' }),
  })
  .strict();
export type AnalysisStep = z.infer<typeof AnalysisStepSchema>;

/** The analysis values with the lot's forage class, parsed by the engine's own contract. */
export function parseAnalysisValues(values: Record<string, unknown>, forageClass: ForageClass) {
  const parsed = ForageEvaluationRequestSchema.safeParse({ ...values, forageClass });
  if (parsed.success) return parsed.data;
  // Report paths as the form sends them (`values.adfPct`), so messages land beside their fields.
  throw new z.ZodError(parsed.error.issues.map((issue) => ({ ...issue, path: ['values', ...issue.path] })));
}

export const PriceStepSchema = z
  .object({
    pricingUnit: z.enum(['ton', 'bale'], { message: 'Price per ton or per bale.' }),
    priceCentsPerTon: cents('Price per ton').nullable().default(null),
    priceCentsPerBale: cents('Price per bale').nullable().default(null),
    minOrderTons: number('Minimum order', 0, 10_000, ' tons').default(0),
    deliveryTerms: prose('Delivery terms', 1000).default(''),
    /** Null when the grower does not deliver. */
    freightCentsPerLoadedMile: whole('Freight per loaded mile', 0, 10_000_00).nullable().default(null),
    pickupAllowed: z.boolean().default(true),
  })
  .strict()
  .refine((p) => (p.pricingUnit === 'ton' ? p.priceCentsPerTon !== null : p.priceCentsPerBale !== null), {
    message: 'Enter the price.',
    path: ['priceCentsPerTon'],
  })
  .refine((p) => p.pickupAllowed || p.freightCentsPerLoadedMile !== null, {
    message: 'Offer pickup, delivery, or both.',
    path: ['pickupAllowed'],
  });
export type PriceStep = z.infer<typeof PriceStepSchema>;

export const PhotoOrderSchema = z
  .object({
    order: z.array(z.number().int().positive()).min(1, 'Give the photo order.').max(50),
    coverId: z.number().int().positive(),
  })
  .strict()
  .refine((o) => o.order.includes(o.coverId), { message: 'The cover must be one of the photos.', path: ['coverId'] });
export type PhotoOrder = z.infer<typeof PhotoOrderSchema>;

export const ReturnLotSchema = z.object({ reason: multiLineText('Reason', 2000, { min: 5, minMessage: 'Give the grower a reason they can act on.' }) }).strict();
export type ReturnLot = z.infer<typeof ReturnLotSchema>;

/** An approval names the lot revision the admin reviewed (`ReviewLotView.revision`); a later change makes it 409. */
export const ApproveLotSchema = z
  .object({ revision: z.number({ error: 'Say which revision of the lot you reviewed (reload the lot).' }).int().positive().max(2 ** 31 - 1) })
  .strict();
export type ApproveLot = z.infer<typeof ApproveLotSchema>;

// ---------------------------------------------------------------- views

export type { LotStatus };

/** A lot as its grower edits it: everything the form needs to resume, plus what the engine says. */
export interface EditableLot {
  id: number;
  status: LotStatus;
  /** Index of the last saved form step (0 = none); later steps hold no entered data yet. */
  draftStep: number;
  reviewNote: string | null;
  title: string;
  lot: LotStep | null;
  quantity: (QuantityStep & { baleCount: number; avgBaleWeightLb: number; totalTons: number; balesAvailable: number }) | null;
  sampling: SamplingStep | null;
  analysis: (Omit<AnalysisStep, 'values'> & { values: Record<string, number | string>; verification: VerificationState; reportFile: ReportFileView | null }) | null;
  price: PriceStep | null;
  photos: PhotoView[];
  forageClass: ForageClass;
  evaluation: ForageEvaluation | null;
  samplingReport: SamplingEvaluation | null;
  /** What still blocks submission, in words; empty when the lot can be submitted. */
  missing: string[];
}

export interface ReportFileView {
  id: number;
  originalName: string;
  sizeBytes: number;
  url: string;
  /** The values read from the PDF's text when it was uploaded (null for files stored before reading existed). */
  reading: ReportReading | null;
}

/** `POST /api/uploads/report-reading`: a report read without being kept, to fill in the lot form. */
export interface ReportReadingResponse {
  reading: ReportReading;
  /** Form values (with `basis`) to confirm; null when nothing was read. */
  values: Record<string, number | string> | null;
  /** The outcome in plain words. */
  summary: string;
}

/** One row of the grower's dashboard. */
export interface SellerLotRow {
  id: number;
  title: string;
  status: LotStatus;
  draftStep: number;
  reviewNote: string | null;
  baleType: BaleType;
  baleCount: number;
  balesAvailable: number;
  tonsAvailable: number;
  priceCentsPerTon: number;
  viewCount: number;
  orderCount: number;
  cover: PhotoView | null;
  updatedAt: string;
}

/** One lot waiting in the admin review queue. */
export interface ReviewQueueRow {
  id: number;
  title: string;
  farmName: string;
  growerEmail: string;
  submittedAt: string;
  labName: string | null;
  labCertified: boolean | null;
  errorFindings: number;
  warningFindings: number;
}

export interface ReviewLotView {
  lot: EditableLot;
  /** The lot's revision when this view was read: facts, sampling, analysis and report as shown belong to it (or a later one). */
  revision: number;
  farm: { name: string; city: string; state: string; growerEmail: string; payoutsReady: boolean };
  /** Each entered value beside the value read from the PDF, mismatches flagged. */
  comparison: ReadingComparison[];
  /** What reading the PDF gave, in plain words (e.g. that a scan has no text). */
  readingSummary: string;
  /** What happened to the lot, newest first, in words, with who acted. */
  /** `changes`: what the action changed, from → to, in words (empty for rows written before it was kept). */
  history: { action: string; label: string; at: string; by: string | null; note: string | null; changes: string }[];
}

export type { Finding };

