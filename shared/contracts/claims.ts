import { z } from 'zod';
import type { RetestJudgement } from '../claims/judge-retest';
import type { ClaimStatus } from '../lifecycle/claim-lifecycle';

export const OpenClaimSchema = z
  .object({
    orderId: z.number({ error: 'Choose the order.' }).int().positive(),
    /** The order line (lot) the problem is about; may be left out for an order of one lot or a problem with the whole load. */
    lineId: z.number({ error: 'Choose the lot the problem is about.' }).int().positive().optional(),
    reason: z.string({ error: 'Say what is wrong.' }).trim().min(10, 'Say what is wrong with the hay (at least 10 characters).').max(4000),
    retest: z
      .object({
        labName: z.string().trim().min(1, 'Name the lab that retested the hay.').max(160),
        labCertified: z.boolean({ error: 'Say whether the lab is certified.' }),
        reportDate: z.iso.date({ error: 'Report date must be a date (YYYY-MM-DD).' }),
        /** As in the lot form: basis, dry matter, CP, ADF, NDF and any others. */
        values: z.record(z.string(), z.union([z.number(), z.string()])),
      })
      .strict()
      .optional(),
  })
  .strict();
export type OpenClaim = z.infer<typeof OpenClaimSchema>;

export const ResolveClaimSchema = z
  .discriminatedUnion('outcome', [
    z.object({ outcome: z.literal('reject'), note: z.string().trim().min(5, 'Explain the decision to both sides.').max(4000) }).strict(),
    z.object({ outcome: z.literal('full'), note: z.string().trim().min(5, 'Explain the decision to both sides.').max(4000) }).strict(),
    z
      .object({
        outcome: z.literal('partial'),
        refundCents: z.number({ error: 'Enter the refund.' }).int('Refund in whole cents.').positive('The refund must be more than $0.'),
        note: z.string().trim().min(5, 'Explain the decision to both sides.').max(4000),
      })
      .strict(),
  ], { error: 'Choose reject, partial or full refund.' });
export type ResolveClaim = z.infer<typeof ResolveClaimSchema>;

export interface ClaimView {
  id: number;
  orderId: number;
  /** The order line the claim names; null when it is about the whole order of several lots. */
  lineId: number | null;
  /** The named line's lot (or the order's first lot when none is named). */
  lotId: number;
  /** The named line's lot, or every lot of the order ("A + B"). */
  lotTitle: string;
  farmName: string;
  buyerName: string;
  status: ClaimStatus;
  statusLabel: string;
  reason: string;
  openedAt: string;
  resolvedAt: string | null;
  resolution: string | null;
  refundCents: number;
  orderTotalCents: number;
  /** Most that can still be refunded on the order. */
  refundableCents: number;
  retest: { labName: string; labCertified: boolean; reportDate: string; values: Record<string, number | string>; reportUrl: string | null } | null;
  /** The retest beside the listing through the forage engine; null without retest values. */
  judgement: RetestJudgement | null;
}
