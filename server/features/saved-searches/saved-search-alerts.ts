import { and, eq, isNull } from 'drizzle-orm';
import { LotSearchSchema, type LotSummary } from '@shared/contracts/lots';
import { formatCents } from '@shared/units/money';
import type { ApiDeps } from '../../api-deps';
import { savedSearches, users } from '../../db/schema';
import { LotsService } from '../lots/lots.service';

export interface AlertOutcome {
  /** Saved searches the lot matched (and whose owners were e-mailed). */
  alerted: number[];
}

/**
 * After a lot is approved and listed: e-mails the owner of every saved search (alerts on) that the lot
 * matches, and stamps `lastAlertedAt`. Matching runs the catalogue's own SQL with the saved query,
 * narrowed to this lot, so an alert means the buyer would see the lot in that search.
 * A stored query that no longer parses (the catalogue changed) is skipped, not fatal.
 */
export async function alertSavedSearches(deps: Pick<ApiDeps, 'db' | 'jobs' | 'env' | 'logger' | 'clock'>, lotId: number): Promise<AlertOutcome> {
  const { db, jobs, env, logger } = deps;
  const lotsService = new LotsService(db);
  const candidates = await db
    .select({ search: savedSearches, email: users.email, displayName: users.displayName })
    .from(savedSearches)
    .innerJoin(users, eq(users.id, savedSearches.userId))
    .where(and(eq(savedSearches.alerts, true), isNull(users.disabledAt)));

  const alerted: number[] = [];
  for (const { search, email, displayName } of candidates) {
    const query = LotSearchSchema.safeParse({ ...search.query, page: '1', pageSize: '1' });
    if (!query.success) {
      logger.warn({ savedSearchId: search.id }, 'saved search no longer parses; skipped');
      continue;
    }
    const { items } = await lotsService.search(query.data, { lotIds: [lotId] });
    const lot = items[0];
    if (!lot) continue;
    await jobs.enqueueMail({ to: email, ...alertMail(displayName, search.name, search.query, lot, env.PUBLIC_URL) });
    await db.update(savedSearches).set({ lastAlertedAt: deps.clock.now() }).where(eq(savedSearches.id, search.id));
    alerted.push(search.id);
  }
  return { alerted };
}

function alertMail(name: string, searchName: string, query: Record<string, string>, lot: LotSummary, publicUrl: string) {
  const lotUrl = `${publicUrl}/hay/${lot.id}`;
  const searchUrl = `${publicUrl}/hay?${new URLSearchParams(query).toString()}`;
  const figures = [
    `RFV ${Math.round(lot.rfv)}`,
    `crude protein ${lot.crudeProteinPct.toFixed(1)} % of DM`,
    lot.nscPct === null ? null : `NSC ${lot.nscPct.toFixed(1)} % of DM`,
    `${formatCents(lot.priceCentsPerTon, { showCents: false })}/ton as-fed`,
    lot.distanceMi === null ? null : `${Math.round(lot.distanceMi)} mi away`,
  ].filter((f): f is string => f !== null);
  return {
    subject: `New hay for “${searchName}”: ${lot.title}`,
    text: [
      `Hello ${name},`,
      '',
      `A newly listed lot matches your saved search “${searchName}”:`,
      '',
      `${lot.title} — ${lot.farmName}, ${lot.city}, ${lot.state}`,
      figures.join(' · '),
      '',
      `See the lot and its lab report: ${lotUrl}`,
      `Your search: ${searchUrl}`,
      '',
      'Lab figures describe the sample, not every bale; look the hay over before feeding, and confirm rations with your veterinarian or an equine nutritionist.',
      'To stop these e-mails, delete the saved search on the catalogue page.',
    ].join('\n'),
  };
}
