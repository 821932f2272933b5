import { z } from 'zod';

/**
 * How hay is fed, and the share of hay offered that horses waste (trample, soil, bed on) rather
 * than eat. Waste is a fraction of hay *offered*: eaten = offered × (1 − waste).
 */
export const FEEDING_METHODS = [
  'small-square-feeder',
  'small-square-ground',
  'round-bale-feeder',
  'round-bale-no-feeder',
  'stall-feeder',
  'stall-no-feeder',
] as const;

export type FeedingMethod = (typeof FEEDING_METHODS)[number];

export const FeedingMethodSchema = z.enum(FEEDING_METHODS, {
  error: `feedingMethod must be one of: ${FEEDING_METHODS.join(', ')}`,
});

export interface WasteAllowance {
  /** Planning waste, fraction of hay offered (0–1). */
  readonly wasteFraction: number;
  /** Published range for the method, fractions, where one exists. */
  readonly range: { readonly min: number; readonly max: number };
  /** Plain-English name for the UI. */
  readonly label: string;
  /** Where the figure comes from. */
  readonly source: string;
}

const MARTINSON_2012 =
  'Martinson et al. 2012, J Anim Sci 90(3):1047–55 (UMN), round-bale feeder design and hay waste';
const GREV_2014 = 'Grev et al. 2014, UMN, small square-bale feeder design, outdoor paddocks';
const UMN_STALL = 'UMN (Martinson), small squares fed in box stalls: 7.3 % off the floor vs 1.3 % in a feeder';

export const WASTE_ALLOWANCES: Readonly<Record<FeedingMethod, WasteAllowance>> = {
  'small-square-feeder': {
    // Feeders wasted 1–5 % (brief §11, S33); plan on the top of the range.
    wasteFraction: 0.05,
    range: { min: 0.01, max: 0.05 },
    label: 'Small squares in a feeder, outdoors',
    source: GREV_2014,
  },
  'small-square-ground': {
    wasteFraction: 0.13,
    range: { min: 0.13, max: 0.13 },
    label: 'Small squares on the ground, outdoors',
    source: GREV_2014,
  },
  'round-bale-feeder': {
    // Nine feeder designs wasted 5–33 %; 10 % is a typical mid-design planning figure.
    wasteFraction: 0.1,
    range: { min: 0.05, max: 0.33 },
    label: 'Round bale in a feeder',
    source: MARTINSON_2012,
  },
  'round-bale-no-feeder': {
    wasteFraction: 0.57,
    range: { min: 0.57, max: 0.57 },
    label: 'Round bale with no feeder',
    source: MARTINSON_2012,
  },
  'stall-feeder': {
    // As published: 1.3 % (Martinson, UMN webcast "Reducing hay waste", 2011), not rounded.
    wasteFraction: 0.013,
    range: { min: 0.013, max: 0.013 },
    label: 'In a stall, from a feeder',
    source: UMN_STALL,
  },
  'stall-no-feeder': {
    // As published: 7.3 % (same source), not rounded.
    wasteFraction: 0.073,
    range: { min: 0.073, max: 0.073 },
    label: 'In a stall, off the floor',
    source: UMN_STALL,
  },
};
