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

export const STORAGE_LABELS = { barn: 'In a barn', tarped: 'Stacked under tarps', outside: 'Outside, uncovered' } as const;

export const CORE_POSITION_LABELS = {
  'butt-end-centre': 'Centre of the bale end',
  'round-side': 'Curved side of round bale',
  'round-flat-end': 'Flat end of round bale',
  'bale-side': 'Side of square bale',
  grab: 'Grab sample (by hand)',
} as const;
