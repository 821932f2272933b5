import { lt } from 'drizzle-orm';
import { z } from 'zod';
import { plusDays } from '@shared/time/days';
import type { ApiDeps } from '../../api-deps';
import type { JobKind } from '../../adapters/queue/jobs';
import { lotViewMarks } from '../../db/schema';

/**
 * A view mark only decides whether today's visit was already counted, so marks of earlier days are dropped by
 * a daily job (the count itself is on the lot). Yesterday's are kept, so a visit across midnight UTC never
 * meets a half-pruned day.
 */
export const PRUNE_VIEW_MARKS: JobKind<Record<string, never>> = {
  name: 'lots-prune-view-marks',
  policy: 'stately',
  retryLimit: 2,
  retryDelaySeconds: 300,
  parse: (data) => z.object({}).strict().parse(data ?? {}) as Record<string, never>,
};

/** Daily at 03:17 UTC (a quiet hour off the full hour). */
export const PRUNE_VIEW_MARKS_CRON = '17 3 * * *';

type Deps = Pick<ApiDeps, 'db' | 'clock' | 'logger' | 'jobs'>;

/** Drops the view marks of days before yesterday (UTC) by the injected clock; answers how many went. */
export async function pruneViewMarks({ db, clock }: Pick<ApiDeps, 'db' | 'clock'>): Promise<number> {
  const yesterday = plusDays(clock.now(), -1).toISOString().slice(0, 10);
  return (await db.delete(lotViewMarks).where(lt(lotViewMarks.day, yesterday))).rowCount ?? 0;
}

export function registerViewMarkPrune(deps: Deps): void {
  deps.jobs.register(PRUNE_VIEW_MARKS, async () => {
    const pruned = await pruneViewMarks(deps);
    if (pruned) deps.logger.info({ pruned }, 'pruned old lot view marks');
  });
}

export async function scheduleViewMarkPrune(deps: Pick<ApiDeps, 'jobs'>): Promise<void> {
  await deps.jobs.schedule(PRUNE_VIEW_MARKS, PRUNE_VIEW_MARKS_CRON, {});
}
