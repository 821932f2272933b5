import type { ApiDeps } from '../../api-deps';
import { DomainEvents } from '../../events/domain-events';
import { alertSavedSearches } from '../saved-searches/saved-search-alerts';

/** Something to do once a lot has been approved and is public (e.g. saved-search alerts). */
export type LotApprovedListener = (deps: ApiDeps, lotId: number) => Promise<void> | void;

const events = new DomainEvents();

// Buyers' saved-search e-mail alerts run after every approval.
events.on('lot.approved', async (deps, { lotId }) => void (await alertSavedSearches(deps, lotId)));

/** Registers a listener; returns a function that removes it again. */
export function addLotApprovedListener(listener: LotApprovedListener): () => void {
  return events.on('lot.approved', (deps, { lotId }) => listener(deps, lotId));
}

/**
 * Called after an approval has been committed. Each listener runs in turn; one that fails is logged
 * and does not stop the others or undo the approval (the lot is already public).
 */
export async function onLotApproved(deps: ApiDeps, lotId: number): Promise<void> {
  await events.emit(deps, 'lot.approved', { lotId });
}
