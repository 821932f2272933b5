import { and, desc, eq, type SQL } from 'drizzle-orm';
import type { AuditRow } from '@shared/contracts/admin';
import { auditChanges } from '@shared/contracts/audit-changes';
import { auditActionLabel } from '@shared/contracts/audit-labels';
import type { Db } from '../../db/client';
import { auditEvents, users } from '../../db/schema';

/** The audit trail, newest first, with who acted in words. */
export async function auditTrail(db: Db, query: { entityType?: string | undefined; entityId?: string | undefined; action?: string | undefined; limit: number }): Promise<AuditRow[]> {
  const where: SQL[] = [];
  if (query.entityType) where.push(eq(auditEvents.entityType, query.entityType));
  if (query.entityId) where.push(eq(auditEvents.entityId, query.entityId));
  if (query.action) where.push(eq(auditEvents.action, query.action));
  const rows = await db
    .select({ e: auditEvents, name: users.displayName, role: users.role })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(and(...where))
    .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
    .limit(query.limit);
  return rows.map(({ e, name, role }) => ({
    id: e.id,
    at: e.createdAt.toISOString(),
    action: e.action,
    label: auditActionLabel(e.action),
    by: name ? `${name} (${role})` : 'the system',
    entityType: e.entityType,
    entityId: e.entityId,
    before: e.before,
    after: e.after,
    changes: auditChanges(e.entityType, e.before, e.after),
    data: e.data,
  }));
}
