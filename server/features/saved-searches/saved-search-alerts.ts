import { and, eq, isNotNull, isNull } from 'drizzle-orm';
import { LotSearchSchema, type LotSummary } from '@shared/contracts/lots';
import type { ApiDeps } from '../../api-deps';
import { savedSearches, users } from '../../db/schema';
import { lotMail } from '../../adapters/mail/lot-mail';
import { LOT_MAIL_CAUTION, lotMailFacts } from '../lots/lot-mail-facts';
import { LotsService } from '../lots/lots.service';

export interface AlertOutcome {
  /** Saved searches the lot matched (and whose owners were e-mailed). */
  alerted: number[];
}

/**
 * After a lot is approved and listed: e-mails the owner of every saved search (alerts on) that the lot
 * matches, and stamps `lastAlertedAt`. Matching runs the catalogue's own SQL with the saved query,
 * narrowed to this lot, so an alert means the buyer would see the lot in that search.
 * A stored query that no longer parses (the catalogue changed) is skipped, not fatal. Only confirmed
 * addresses get alerts: an unconfirmed one may belong to someone who never asked for them.
 */
export async function alertSavedSearches(deps: Pick<ApiDeps, 'db' | 'jobs' | 'env' | 'logger' | 'clock'>, lotId: number): Promise<AlertOutcome> {
  const { db, jobs, env, logger } = deps;
  const lotsService = new LotsService(db);
  const candidates = await db
    .select({ search: savedSearches, email: users.email, displayName: users.displayName })
    .from(savedSearches)
    .innerJoin(users, eq(users.id, savedSearches.userId))
    .where(and(eq(savedSearches.alerts, true), isNull(users.disabledAt), isNotNull(users.emailVerifiedAt)));

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
    await jobs.enqueueMail({ ...alertMail(displayName, search.name, search.query, lot, env.PUBLIC_URL), to: email });
    await db.update(savedSearches).set({ lastAlertedAt: deps.clock.now() }).where(eq(savedSearches.id, search.id));
    alerted.push(search.id);
  }
  return { alerted };
}

function alertMail(name: string, searchName: string, query: Record<string, string>, lot: LotSummary, publicUrl: string) {
  const searchUrl = `${publicUrl}/hay?${new URLSearchParams(query).toString()}`;
  return lotMail({
    to: '',
    subject: `New hay for “${searchName}”: ${lot.title}`,
    greeting: `Hello ${name},`,
    lead: [`A newly listed lot matches your saved search “${searchName}”.`, `Your search: ${searchUrl}`],
    lot: { title: lot.title, facts: lotMailFacts(lot) },
    action: { label: 'See the lot and its lab report', url: `${publicUrl}/hay/${lot.id}` },
    footer: `${LOT_MAIL_CAUTION} To stop these e-mails, delete the saved search on the catalogue page.`,
  });
}
