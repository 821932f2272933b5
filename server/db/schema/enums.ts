import { pgEnum } from 'drizzle-orm/pg-core';
import { CLAIM_STATUSES } from '@shared/lifecycle/claim-lifecycle';
import { PAYOUT_STATUSES } from '@shared/lifecycle/payout-lifecycle';
import { USER_ROLES } from '@shared/contracts/auth';
import { ANALYSIS_METHODS, CORE_POSITIONS, DELIVERY_METHODS, FORAGE_CLASSES, STORAGE_KINDS, VERIFICATION_STATES } from '@shared/contracts/enums';
import { BALE_TYPES, FORAGE_TYPES, LOT_STATUSES } from '@shared/contracts/lots';
import { DELIVERY_STATUSES } from '@shared/lifecycle/delivery-lifecycle';
import { ORDER_STATUSES } from '@shared/lifecycle/order-lifecycle';

export const userRole = pgEnum('user_role', USER_ROLES);

/** Where a lot is in its life (see shared/lifecycle/lot-lifecycle). */
export const lotStatus = pgEnum('lot_status', LOT_STATUSES);

export const forageClass = pgEnum('forage_class', FORAGE_CLASSES);

export const forageType = pgEnum('forage_type', FORAGE_TYPES);

/** Bale types as the trade names them; nominal sizes in feet. */
export const baleType = pgEnum('bale_type', BALE_TYPES);

export const storageKind = pgEnum('storage_kind', STORAGE_KINDS);

export const corePosition = pgEnum('core_position', CORE_POSITIONS);

export const analysisMethod = pgEnum('analysis_method', ANALYSIS_METHODS);

export const verificationState = pgEnum('verification_state', VERIFICATION_STATES);

export const orderStatus = pgEnum('order_status', ORDER_STATUSES);

export const deliveryMethod = pgEnum('delivery_method', DELIVERY_METHODS);
export const deliveryStatus = pgEnum('delivery_status', DELIVERY_STATUSES);
export const claimStatus = pgEnum('claim_status', CLAIM_STATUSES);
export const payoutStatus = pgEnum('payout_status', PAYOUT_STATUSES);
