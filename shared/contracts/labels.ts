import type { CorePosition, StorageKind } from './enums';
import type { BaleType, ForageType } from './lots';

/** Display names for the trade's own terms. */
export const FORAGE_TYPE_LABELS: Record<ForageType, string> = {
  alfalfa: 'Alfalfa',
  clover: 'Clover',
  timothy: 'Timothy',
  orchardgrass: 'Orchardgrass',
  bermudagrass: 'Bermudagrass',
  teff: 'Teff',
  bromegrass: 'Bromegrass',
  fescue: 'Fescue',
  oat: 'Oat hay',
  sudangrass: 'Sudangrass',
  sorghum_sudangrass: 'Sorghum-sudangrass',
  forage_sorghum: 'Forage sorghum',
  alfalfa_grass_mix: 'Alfalfa–grass mix',
  grass_mix: 'Grass mix',
};

export const BALE_TYPE_LABELS: Record<BaleType, string> = {
  small_square_2_string: 'Small square, 2-string',
  small_square_3_string: 'Small square, 3-string',
  large_square_3x3x8: 'Large square 3×3×8 ft',
  large_square_3x4x8: 'Large square 3×4×8 ft',
  large_square_4x4x8: 'Large square 4×4×8 ft',
  round_4x4: 'Round 4×4 ft',
  round_4x5: 'Round 4×5 ft',
  round_5x5: 'Round 5×5 ft',
  round_5x6: 'Round 5×6 ft',
};

export const STORAGE_LABELS = { barn: 'In a barn', tarped: 'Stacked under tarps', outside: 'Outside, uncovered' } as const satisfies Record<StorageKind, string>;

export const CORE_POSITION_LABELS = {
  'butt-end-centre': 'Centre of the bale end',
  'round-side': 'Curved side of round bale',
  'round-flat-end': 'Flat end of round bale',
  'bale-side': 'Side of square bale',
  grab: 'Grab sample (by hand)',
} as const satisfies Record<CorePosition, string>;

/**
 * What each lot state is called, everywhere (grower, buyer, reviewer). Our own words for what the state means,
 * not shop words: a paused lot is hidden by its grower, not discounted.
 */
export const LOT_STATUS_LABELS = {
  draft: 'Draft',
  in_review: 'With the reviewer',
  returned: 'Needs changes',
  listed: 'Listed',
  withdrawn: 'Paused',
  sold_out: 'Sold out',
} as const satisfies Record<'draft' | 'in_review' | 'returned' | 'listed' | 'withdrawn' | 'sold_out', string>;

/** One line per state saying what it means for the grower. */
export const LOT_STATUS_MEANINGS: Record<keyof typeof LOT_STATUS_LABELS, string> = {
  draft: 'Only you can see it. Finish the steps and send it to the reviewer.',
  in_review: 'A reviewer is checking the lab report against your values.',
  returned: 'The reviewer sent it back with a reason. Change it and send it again.',
  listed: 'Buyers can find it and order from it.',
  withdrawn: 'Hidden from buyers until you list it again.',
  sold_out: 'No bales left to sell.',
};

export const ROLE_LABELS = { buyer: 'Buyer', grower: 'Grower', admin: 'Reviewer' } as const;
