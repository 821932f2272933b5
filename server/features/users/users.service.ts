import { and, desc, eq, isNotNull, isNull, sql, type SQL } from 'drizzle-orm';
import type { AdminUserRow } from '@shared/contracts/admin';
import type { UserRole } from '@shared/contracts/auth';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { session, users } from '../../db/schema';
import { conflict, HttpError, notFound } from '../../middleware/http-error';
import { recordAudit } from '../audit/audit-log';

type UserRow = typeof users.$inferSelect;

/** Admins' work on accounts: find, change role, suspend and reinstate — each audited with its reason. */
export class UsersService {
  constructor(private readonly db: Db, private readonly clock: Clock) {}

  async list(query: { q?: string | undefined; role?: UserRole | undefined; suspended?: 'yes' | 'no' | undefined; limit: number }): Promise<AdminUserRow[]> {
    const where: SQL[] = [];
    if (query.q) {
      const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      where.push(sql`(${users.email} ilike ${like} or ${users.displayName} ilike ${like})`);
    }
    if (query.role) where.push(eq(users.role, query.role));
    if (query.suspended === 'yes') where.push(isNotNull(users.disabledAt));
    if (query.suspended === 'no') where.push(isNull(users.disabledAt));
    const rows = await this.db.select().from(users).where(and(...where)).orderBy(desc(users.createdAt), desc(users.id)).limit(query.limit);
    return rows.map(toRow);
  }

  async changeRole(admin: Express.User, userId: number, role: UserRole, reason: string): Promise<AdminUserRow> {
    if (userId === admin.id) throw new HttpError(409, 'own_account', 'You cannot change your own role; ask another admin.');
    return this.change(admin, userId, async (before, tx, now) => {
      if (before.role === role) throw conflict('no_change', `This user is already a ${role}.`);
      const [after] = await tx.update(users).set({ role }).where(eq(users.id, userId)).returning();
      // A new role takes effect on the next request (the session holds only the id), so nothing else to end.
      await recordAudit(tx, { actorId: admin.id, action: 'user.role_changed', entityType: 'user', entityId: userId, before: { role: before.role }, after: { role }, data: { reason }, at: now });
      return after!;
    });
  }

  async suspend(admin: Express.User, userId: number, reason: string): Promise<AdminUserRow> {
    if (userId === admin.id) throw new HttpError(409, 'own_account', 'You cannot suspend your own account.');
    return this.change(admin, userId, async (before, tx, now) => {
      if (before.disabledAt) throw conflict('already_suspended', 'This account is already suspended.');
      const [after] = await tx.update(users).set({ disabledAt: now, disabledReason: reason }).where(eq(users.id, userId)).returning();
      // End every session of the user at once: they are signed out on their next request.
      const ended = await tx.delete(session).where(sql`(${session.sess} -> 'passport' ->> 'user') = ${String(userId)}`).returning({ sid: session.sid });
      await recordAudit(tx, { actorId: admin.id, action: 'user.suspended', entityType: 'user', entityId: userId, before: { suspendedAt: null }, after: { suspendedAt: now.toISOString() }, data: { reason, sessionsEnded: ended.length }, at: now });
      return after!;
    });
  }

  async reinstate(admin: Express.User, userId: number, reason: string): Promise<AdminUserRow> {
    return this.change(admin, userId, async (before, tx, now) => {
      if (!before.disabledAt) throw conflict('not_suspended', 'This account is not suspended.');
      const [after] = await tx.update(users).set({ disabledAt: null, disabledReason: null }).where(eq(users.id, userId)).returning();
      await recordAudit(tx, { actorId: admin.id, action: 'user.reinstated', entityType: 'user', entityId: userId, before: { suspendedAt: before.disabledAt.toISOString(), suspendedReason: before.disabledReason }, after: { suspendedAt: null }, data: { reason }, at: now });
      return after!;
    });
  }

  private async change(_admin: Express.User, userId: number, apply: (before: UserRow, tx: Parameters<Parameters<Db['transaction']>[0]>[0], now: Date) => Promise<UserRow>): Promise<AdminUserRow> {
    const now = this.clock.now();
    const row = await this.db.transaction(async (tx) => {
      const [before] = await tx.select().from(users).where(eq(users.id, userId)).for('update');
      if (!before) throw notFound('That user');
      return apply(before, tx, now);
    });
    return toRow(row);
  }
}

function toRow(u: UserRow): AdminUserRow {
  return {
    id: u.id,
    email: u.email,
    displayName: u.displayName,
    role: u.role,
    createdAt: u.createdAt.toISOString(),
    suspendedAt: u.disabledAt?.toISOString() ?? null,
    suspendedReason: u.disabledReason,
  };
}
