import type { Db } from '../../db/client';
import { auditEvents } from '../../db/schema';

/** A database handle or an open transaction: audit rows are written in the same transaction as the change. */
export type DbOrTx = Db | Parameters<Parameters<Db['transaction']>[0]>[0];

export interface AuditEntry {
  /** The user who acted; null for the system (scheduled jobs, webhooks). */
  actorId: number | null;
  /** What happened, as `entity.verb` (e.g. `user.suspended`, `payout.sent`). */
  action: string;
  entityType: string;
  entityId: string | number;
  /** The changed fields before and after, where something changed. */
  before?: Record<string, unknown> | null;
  after?: Record<string, unknown> | null;
  /** Anything else worth keeping (a reason, an amount, an idempotency key). */
  data?: Record<string, unknown>;
  at: Date;
}

/** Appends one row to the audit trail (the table refuses updates and deletes). */
export async function recordAudit(db: DbOrTx, entry: AuditEntry): Promise<void> {
  await db.insert(auditEvents).values({
    actorId: entry.actorId,
    action: entry.action,
    entityType: entry.entityType,
    entityId: String(entry.entityId),
    before: entry.before ?? null,
    after: entry.after ?? null,
    data: entry.data ?? {},
    createdAt: entry.at,
  });
}
