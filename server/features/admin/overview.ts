import { and, eq, gte, isNotNull, sql } from 'drizzle-orm';
import type { AdminOverview } from '@shared/contracts/admin';
import type { Db } from '../../db/client';
import { lots, orders, qualityClaims } from '../../db/schema';
import { payoutsDue } from '../payouts/payouts-due';
import { isoWeekStart, plusCalendarDays, plusDays } from '@shared/time/days';

const WEEKS = 12;

/** The admin's first page: paid sales and orders per week, and what waits on an admin. */
export async function adminOverview(db: Db, now: Date): Promise<AdminOverview> {
  const since = plusDays(now, -WEEKS * 7);
  const week = sql<string>`to_char(date_trunc('week', ${orders.paidAt} at time zone 'UTC'), 'YYYY-MM-DD')`;
  const rows = await db
    .select({ week, orders: sql<number>`count(*)`.mapWith(Number), salesCents: sql<number>`coalesce(sum(${orders.totalCents} - ${orders.refundedCents}), 0)`.mapWith(Number) })
    .from(orders)
    .where(and(isNotNull(orders.paidAt), gte(orders.paidAt, since)))
    // By position: the week expression carries bound parameters, which PostgreSQL would not match textually.
    .groupBy(sql`1`)
    .orderBy(sql`1`);
  const byWeek = new Map(rows.map((r) => [r.week, r]));
  const weeks = [];
  // Monday-started weeks (ISO, as PostgreSQL's date_trunc), oldest first, empty weeks included.
  const monday = isoWeekStart(now);
  for (let i = WEEKS - 1; i >= 0; i--) {
    const start = plusCalendarDays(monday, -7 * i);
    const r = byWeek.get(start);
    weeks.push({ weekStart: start, orders: r?.orders ?? 0, salesCents: r?.salesCents ?? 0 });
  }
  const [waiting] = await db.select({ n: sql<number>`count(*)`.mapWith(Number) }).from(lots).where(eq(lots.status, 'in_review'));
  const [claims] = await db.select({ n: sql<number>`count(*)`.mapWith(Number) }).from(qualityClaims).where(eq(qualityClaims.status, 'open'));
  const due = (await payoutsDue(db, now)).filter((g) => g.totalCents > 0);
  return {
    weeks,
    lotsWaiting: waiting!.n,
    openClaims: claims!.n,
    payoutsDue: { growers: due.length, totalCents: due.reduce((s, g) => s + g.totalCents, 0), held: due.filter((g) => !g.ready).length },
  };
}
