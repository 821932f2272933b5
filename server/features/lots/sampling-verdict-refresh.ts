import { z } from 'zod';
import type { JobKind } from '../../adapters/queue/jobs';
import type { ApiDeps } from '../../api-deps';
import { refreshStoredSamplingVerdicts } from './sampling-report';

const NoData = z.object({}).strict();

/** Refreshes every stored sampling verdict (see `refreshStoredSamplingVerdicts`); one waiting and one running at most. */
export const REFRESH_SAMPLING_VERDICTS: JobKind<Record<string, never>> = {
  name: 'sampling-verdicts-refresh',
  policy: 'stately',
  retryLimit: 2,
  retryDelaySeconds: 60,
  parse: (data) => NoData.parse(data ?? {}) as Record<string, never>,
};

/** Daily at 03:17 UTC: verdicts of lots never listed are judged on today's date, so they age. */
export const SAMPLING_REFRESH_CRON = '17 3 * * *';

type Deps = Pick<ApiDeps, 'db' | 'clock' | 'logger' | 'jobs'>;

export function registerSamplingVerdictRefresh(deps: Deps): void {
  deps.jobs.register(REFRESH_SAMPLING_VERDICTS, async () => {
    const changed = await refreshStoredSamplingVerdicts(deps.db, deps.clock.now());
    if (changed) deps.logger.info({ changed }, 'refreshed stored sampling verdicts');
  });
}

/** Runs the refresh once now (rules may have changed since the last start) and schedules the daily one. */
export async function startSamplingVerdictRefresh(deps: Pick<ApiDeps, 'jobs'>): Promise<void> {
  // Workers start together: one waiting refresh serves them all.
  await deps.jobs.enqueue(REFRESH_SAMPLING_VERDICTS, {}, { unlessWaiting: true });
  await deps.jobs.schedule(REFRESH_SAMPLING_VERDICTS, SAMPLING_REFRESH_CRON, {});
}
