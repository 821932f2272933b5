import type { ApiDeps } from '../../api-deps';
import { DeliveriesService } from './deliveries.service';
import { OrdersService } from './orders.service';

/**
 * The order work that time alone triggers: unpaid holds that ran out go back on the lot, and loads the
 * buyer did not answer for complete. Each run reads the injected clock; a failed run is retried next time.
 */
export function startOrderTimers(deps: ApiDeps, everyMs = 60_000): () => void {
  const orders = new OrdersService(deps);
  const deliveries = new DeliveriesService(deps, orders);
  let running = false;
  const run = async () => {
    if (running) return;
    running = true;
    try {
      const expired = await orders.expireDueReservations();
      const completed = await deliveries.completeUnanswered();
      if (expired || completed) deps.logger.info({ expired, completed }, 'order timers');
    } catch (err) {
      deps.logger.error({ err }, 'order timers failed');
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void run(), everyMs);
  timer.unref();
  void run();
  return () => clearInterval(timer);
}
