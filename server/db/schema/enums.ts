import { pgEnum } from 'drizzle-orm/pg-core';
import { USER_ROLES } from '@shared/contracts/auth';
import { BALE_TYPES, FORAGE_TYPES } from '@shared/contracts/lots';
import { DELIVERY_STATUSES } from '@shared/lifecycle/delivery-lifecycle';
import { ORDER_STATUSES } from '@shared/lifecycle/order-lifecycle';

export const userRole = pgEnum('user_role', USER_ROLES);

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

export const forageType = pgEnum('forage_type', FORAGE_TYPES);

/** Bale types as the trade names them; nominal sizes in feet. */
export const baleType = pgEnum('bale_type', BALE_TYPES);

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

export const orderStatus = pgEnum('order_status', ORDER_STATUSES);

export const deliveryMethod = pgEnum('delivery_method', ['delivery', 'pickup']);
export const deliveryStatus = pgEnum('delivery_status', DELIVERY_STATUSES);
export const claimStatus = pgEnum('claim_status', ['open', 'upheld', 'declined', 'withdrawn']);
export const payoutStatus = pgEnum('payout_status', ['held', 'due', 'sent', 'failed']);
