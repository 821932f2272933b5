import { z } from 'zod';
import type { PayoutStatus } from '../lifecycle/payout-lifecycle';

/*
 * Payout settlement: what each grower is owed, the batch an admin reviews and settles, and the
 * grower's payout history. All money in integer cents.
 */

export interface DueOrderLine {
  orderId: number;
  lotTitle: string;
  deliveredAt: string | null;
  goodsCents: number;
  freightCents: number;
  /** Kept by the platform; the buyer paid it on top of the hay. */
  platformFeeCents: number;
  /** Refunded to the buyer before payout: borne by the grower's share. */
  refundedCents: number;
  /** goods + freight − refunded. */
  amountCents: number;
}

export interface GrowerPayoutDue {
  farmId: number;
  farmName: string;
  growerEmail: string;
  /** False while the grower has not finished payout set-up; the payout is then held. */
  ready: boolean;
  heldReason: string | null;
  orders: DueOrderLine[];
  totalCents: number;
}

export const CreateBatchSchema = z
  .object({
    /** Made once by the admin's page per review, so a second submission finds the first batch. */
    requestKey: z.string({ error: 'requestKey is required.' }).trim().min(8, 'requestKey: at least 8 characters.').max(100),
    farmIds: z.array(z.number().int().positive()).min(1, 'Choose at least one grower.').max(500),
  })
  .strict();
export type CreateBatch = z.infer<typeof CreateBatchSchema>;

export interface PayoutView {
  id: number;
  batchId: number;
  farmId: number;
  farmName: string;
  amountCents: number;
  status: PayoutStatus;
  statusLabel: string;
  heldReason: string | null;
  failureReason: string | null;
  transferId: string | null;
  createdAt: string;
  sentAt: string | null;
  lines: { orderId: number; goodsCents: number; freightCents: number; refundedCents: number; amountCents: number }[];
}

export interface BatchView {
  id: number;
  createdAt: string;
  settledAt: string | null;
  createdBy: string | null;
  payouts: PayoutView[];
  totalCents: number;
}
