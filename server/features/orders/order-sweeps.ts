import { z } from 'zod';
import type { ApiDeps } from '../../api-deps';
import type { JobKind } from '../../adapters/queue/jobs';
import { DeliveriesService } from './deliveries.service';
import { OrdersService } from './orders.service';

const NoData = z.object({}).strict();

/**
 * The order work that time alone triggers, as pg-boss jobs on a cron tick: unpaid holds that ran out go
 * back on the lot, and delivered loads the buyer did not answer for complete. 'stately' keeps at most
 * one sweep waiting and one running; each sweep is also safe to run twice at once (every order is
 * changed under its row lock, and only the run that changed it sends its e-mail).
 */
export const EXPIRE_HOLDS: JobKind<Record<string, never>> = {
  name: 'orders-expire-holds',
  policy: 'stately',
  retryLimit: 1,
  retryDelaySeconds: 20,
  parse: (data) => NoData.parse(data ?? {}) as Record<string, never>,
};

export const COMPLETE_UNANSWERED: JobKind<Record<string, never>> = {
  name: 'orders-complete-unanswered',
  policy: 'stately',
  retryLimit: 1,
  retryDelaySeconds: 20,
  parse: (data) => NoData.parse(data ?? {}) as Record<string, never>,
};

/** Every minute (cron, UTC): a hold lasts 30 minutes, so it ends at most a minute late. */
export const SWEEP_CRON = '* * * * *';

type Deps = Pick<ApiDeps, 'db' | 'stripe' | 'env' | 'clock' | 'logger' | 'jobs' | 'storage'>;

/** Tells the job queue how to run the sweeps (each process that works jobs). */
export function registerOrderSweeps(deps: Deps): void {
  const orders = new OrdersService(deps);
  const deliveries = new DeliveriesService(deps, orders);
  deps.jobs.register(EXPIRE_HOLDS, async () => {
    const expired = await orders.expireDueReservations();
    if (expired) deps.logger.info({ expired }, 'expired unpaid holds');
  });
  deps.jobs.register(COMPLETE_UNANSWERED, async () => {
    const completed = await deliveries.completeUnanswered();
    if (completed) deps.logger.info({ completed }, 'completed unanswered deliveries');
  });
}

/** Stores the sweeps' cron schedule (idempotent: every process may call it on start). */
export async function scheduleOrderSweeps(deps: Pick<ApiDeps, 'jobs'>): Promise<void> {
  await deps.jobs.schedule(EXPIRE_HOLDS, SWEEP_CRON, {});
  await deps.jobs.schedule(COMPLETE_UNANSWERED, SWEEP_CRON, {});
}
