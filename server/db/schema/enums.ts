import { pgEnum } from 'drizzle-orm/pg-core';

export const userRole = pgEnum('user_role', ['buyer', 'grower', 'admin']);

/** Where a lot is in its life: only `listed` lots are public. */
export const lotStatus = pgEnum('lot_status', [
  'draft', // being written by the grower
  'in_review', // submitted, waiting for an admin to check the lab report
  'returned', // sent back to the grower with a reason
  'listed', // approved and public
  'withdrawn', // taken off sale by the grower
  'sold_out',
]);

export const forageClass = pgEnum('forage_class', ['legume', 'grass', 'mixed']);

export const forageType = pgEnum('forage_type', [
  'alfalfa',
  'clover',
  'timothy',
  'orchardgrass',
  'bermudagrass',
  'teff',
  'bromegrass',
  'fescue',
  'oat',
  'alfalfa_grass_mix',
  'grass_mix',
]);

/** Bale types as the trade names them; nominal sizes in feet or inches. */
export const baleType = pgEnum('bale_type', [
  'small_square_2_string',
  'small_square_3_string',
  'large_square_3x3x8',
  'large_square_3x4x8',
  'large_square_4x4x8',
  'round_4x4',
  'round_4x5',
  'round_5x5',
  'round_5x6',
]);

export const storageKind = pgEnum('storage_kind', ['barn', 'tarped', 'outside']);

export const corePosition = pgEnum('core_position', [
  'butt-end-centre',
  'round-side',
  'round-flat-end',
  'bale-side',
  'grab',
]);

export const analysisMethod = pgEnum('analysis_method', ['nirs', 'wet_chemistry']);

export const verificationState = pgEnum('verification_state', ['pending', 'verified', 'rejected']);

export const orderStatus = pgEnum('order_status', [
  'awaiting_payment',
  'paid',
  'scheduled',
  'delivered',
  'claimed',
  'refunded',
  'cancelled',
  'completed',
]);

export const deliveryMethod = pgEnum('delivery_method', ['delivery', 'pickup']);
export const deliveryStatus = pgEnum('delivery_status', ['proposed', 'confirmed', 'in_transit', 'done', 'missed']);
export const claimStatus = pgEnum('claim_status', ['open', 'upheld', 'declined', 'withdrawn']);
export const payoutStatus = pgEnum('payout_status', ['held', 'due', 'sent', 'failed']);
