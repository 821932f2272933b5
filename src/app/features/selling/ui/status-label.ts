import type { LotStatus } from '@shared/contracts/selling';
import { LOT_STATUS_LABELS } from '@shared/contracts/labels';

/** How each lot state is named (one home: shared/contracts/labels.ts). */
export const STATUS_LABELS: Record<LotStatus, string> = LOT_STATUS_LABELS;
