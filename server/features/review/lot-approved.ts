import type { ApiDeps } from '../../api-deps';
import { alertSavedSearches } from '../saved-searches/saved-search-alerts';

/** Something to do once a lot has been approved and is public (e.g. saved-search alerts). */
export type LotApprovedListener = (deps: ApiDeps, lotId: number) => Promise<void> | void;

// Buyers' saved-search e-mail alerts (issue #5) run after every approval.
const listeners: LotApprovedListener[] = [async (deps, lotId) => void (await alertSavedSearches(deps, lotId))];

/** Registers a listener; returns a function that removes it again. */
export function addLotApprovedListener(listener: LotApprovedListener): () => void {
  listeners.push(listener);
  return () => {
    const at = listeners.indexOf(listener);
    if (at >= 0) listeners.splice(at, 1);
  };
}

/**
 * Called after an approval has been committed. Each listener runs in turn; one that fails is logged
 * and does not stop the others or undo the approval (the lot is already public).
 */
export async function onLotApproved(deps: ApiDeps, lotId: number): Promise<void> {
  for (const listener of [...listeners]) {
    try {
      await listener(deps, lotId);
    } catch (err) {
      deps.logger.error({ err, lotId }, 'a lot-approved listener failed');
    }
  }
}
