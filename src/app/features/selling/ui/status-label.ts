import type { LotStatus } from '@shared/contracts/selling';

/** How each lot state is named to its grower. */
export const STATUS_LABELS: Record<LotStatus, string> = {
  draft: 'Draft',
  in_review: 'Waiting for review',
  returned: 'Needs changes',
  listed: 'On sale',
  withdrawn: 'Off sale',
  sold_out: 'Sold out',
};
