import { z } from 'zod';
import type { AuditChange } from './audit-changes';
import { USER_ROLES, type UserRole } from './auth';

/*
 * Contracts of the admin console: users, audit trail. Settings live in platform-settings.ts.
 */

export const UsersQuerySchema = z
  .object({
    q: z.string().trim().max(100, 'Search: at most 100 characters.').optional(),
    role: z.enum(USER_ROLES, { message: 'Role must be buyer, grower or admin.' }).optional(),
    suspended: z.enum(['yes', 'no']).optional(),
    limit: z.coerce.number().int().min(1).max(200).default(50),
  })
  .strict();

const reason = z.string({ error: 'Give a reason.' }).trim().min(5, 'Give a reason the user and other admins can understand (at least 5 characters).').max(1000, 'Reason: at most 1,000 characters.');

export const ChangeRoleSchema = z.object({ role: z.enum(USER_ROLES, { message: 'Role must be buyer, grower or admin.' }), reason }).strict();
export const SuspendSchema = z.object({ reason }).strict();
export const ReinstateSchema = z.object({ reason }).strict();

export interface AdminUserRow {
  id: number;
  email: string;
  displayName: string;
  role: UserRole;
  createdAt: string;
  /** Set while the account is suspended. */
  suspendedAt: string | null;
  suspendedReason: string | null;
}

export const AuditQuerySchema = z
  .object({
    entityType: z.string().trim().max(40).optional(),
    entityId: z.string().trim().max(40).optional(),
    action: z.string().trim().max(60).optional(),
    limit: z.coerce.number().int().min(1).max(500).default(100),
  })
  .strict();

export interface AuditRow {
  id: number;
  at: string;
  action: string;
  /** The action in words. */
  label: string;
  by: string | null;
  entityType: string;
  entityId: string;
  before: unknown;
  after: unknown;
  /** What changed, from → to, in words (from `before` and `after`). */
  changes: AuditChange[];
  data: unknown;
}

export interface AdminOverview {
  /** Paid orders and sales (paid less refunded, cents) per week, oldest first; weeks start on Monday (UTC). */
  weeks: { weekStart: string; orders: number; salesCents: number }[];
  lotsWaiting: number;
  openClaims: number;
  payoutsDue: { growers: number; totalCents: number; held: number };
}
