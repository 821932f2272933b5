import { LOT_STATUSES, type LotStatus } from '../contracts/lots';
import { type Actor, checkTransition, eventsFor, type Lifecycle, TransitionRefused } from './state-machine';

/**
 * A lot's life, in one place: its states, the steps between them and who may take each, who may see a
 * lot in each state, and which changes send an approved lot back to review. Same shape as the order and
 * delivery life-cycles beside it; `grower` here is the grower who owns the lot.
 *
 *   draft ──submit──▶ in_review ──approve──▶ listed ⇄ sold_out  (sell_out / restock follow the stock)
 *   returned ◀─return─┘    ▲                   │
 *      └──submit──────────┘└──reopen_review───┘ (a buyer-visible fact changed)
 *   listed / sold_out / in_review ──withdraw──▶ withdrawn ──relist──▶ listed   (approval still holds)
 *                                              withdrawn ──relist_to_review──▶ in_review (it does not)
 */

export const LOT_EVENTS = ['submit', 'approve', 'return', 'withdraw', 'relist', 'relist_to_review', 'sell_out', 'restock', 'reopen_review'] as const;
export type LotEvent = (typeof LOT_EVENTS)[number];

export const LOT_LIFECYCLE: Lifecycle<LotStatus, LotEvent> = {
  states: LOT_STATUSES,
  transitions: {
    /** The grower sends a complete draft (or a lot an admin returned) to the review desk. */
    submit: { from: ['draft', 'returned'], to: 'in_review', by: ['grower'] },
    /** An admin checked the report against the lot; it goes on sale (sold out at once if no bales are left). */
    approve: { from: ['in_review'], to: 'listed', by: ['admin'] },
    /** An admin sends the lot back to its grower with a reason. */
    return: { from: ['in_review'], to: 'returned', by: ['admin'] },
    /** The grower takes the lot off sale or out of the queue; nothing is deleted. */
    withdraw: { from: ['listed', 'sold_out', 'in_review'], to: 'withdrawn', by: ['grower'] },
    /** Back on sale: the lot was published and its analysis is still verified. */
    relist: { from: ['withdrawn'], to: 'listed', by: ['grower'] },
    /** Back to the queue: the lot was never published or its approval lapsed while withdrawn. */
    relist_to_review: { from: ['withdrawn'], to: 'in_review', by: ['grower'] },
    /** The last bales were sold (by an order) or the grower set the stock to zero. */
    sell_out: { from: ['listed'], to: 'sold_out', by: ['grower', 'system'] },
    /** Bales are available again (a cancelled order, or the grower raised the stock). */
    restock: { from: ['sold_out'], to: 'listed', by: ['grower', 'system'] },
    /** A buyer-visible fact of an approved lot changed: the admin checks it again before buyers see it. */
    reopen_review: { from: ['listed', 'sold_out'], to: 'in_review', by: ['grower'] },
  },
};

const STATUS_WORDS: Record<LotStatus, string> = {
  draft: 'a draft',
  in_review: 'waiting for review',
  returned: 'returned to its grower',
  listed: 'on sale',
  withdrawn: 'withdrawn',
  sold_out: 'sold out',
};

/** What the grower (or admin) is told when a step is not possible in the lot's state. */
const WRONG_STATE: Partial<Record<LotEvent, { code: string; message: string; byState?: Partial<Record<LotStatus, string>> }>> = {
  submit: { code: 'not_submittable', message: 'Only drafts and returned lots can be submitted.', byState: { in_review: 'This lot is already waiting for review.' } },
  approve: { code: 'not_in_review', message: 'Only lots waiting for review can be approved.' },
  return: { code: 'not_in_review', message: 'Only lots waiting for review can be returned.' },
  withdraw: { code: 'not_withdrawable', message: 'Only listed lots or lots in review can be withdrawn.' },
  relist: { code: 'not_relistable', message: 'Only withdrawn lots can be relisted.' },
  relist_to_review: { code: 'not_relistable', message: 'Only withdrawn lots can be relisted.' },
};

export function checkLotTransition(from: LotStatus, event: LotEvent, actor: Actor) {
  return checkTransition(LOT_LIFECYCLE, from, event, actor, (s) => STATUS_WORDS[s]);
}

export function lotEventsFor(from: LotStatus, actor: Actor): LotEvent[] {
  return eventsFor(LOT_LIFECYCLE, from, actor);
}

/** The state `event` leads to, or a `TransitionRefused` (409 wrong state, 403 wrong actor) in the grower's words. */
export function requireLotTransition(from: LotStatus, event: LotEvent, actor: Actor): LotStatus {
  const result = checkLotTransition(from, event, actor);
  if (result.ok) return result.to;
  if (result.reason === 'not_allowed') throw new TransitionRefused('not_allowed', result.message, 'not_allowed');
  const w = WRONG_STATE[event];
  throw new TransitionRefused(w?.code ?? 'lot_state', w ? (w.byState?.[from] ?? w.message) : result.message, 'wrong_state');
}

/** An approved lot is on sale while bales are left, sold out otherwise. */
export function onSaleStatus(balesAvailable: number): 'listed' | 'sold_out' {
  return balesAvailable > 0 ? 'listed' : 'sold_out';
}

/** The status after the stock changed: only `listed` ⇄ `sold_out` follow the stock; other states keep theirs. */
export function statusAfterStockChange(status: LotStatus, balesAvailable: number, actor: Actor = 'grower'): LotStatus {
  const wanted = onSaleStatus(balesAvailable);
  if (status === 'listed' && wanted === 'sold_out') return requireLotTransition(status, 'sell_out', actor);
  if (status === 'sold_out' && wanted === 'listed') return requireLotTransition(status, 'restock', actor);
  return status;
}

/** Approving a lot: on sale, or sold out at once when no bales are left. */
export function approvedStatus(from: LotStatus, balesAvailable: number): LotStatus {
  return statusAfterStockChange(requireLotTransition(from, 'approve', 'admin'), balesAvailable, 'system');
}

/** Relisting a withdrawn lot: straight back on sale only if it was published and its analysis is still verified. */
export function relistedStatus(from: LotStatus, lot: { analysisVerified: boolean; everPublished: boolean; balesAvailable: number }): LotStatus {
  if (!(lot.analysisVerified && lot.everPublished)) return requireLotTransition(from, 'relist_to_review', 'grower');
  return statusAfterStockChange(requireLotTransition(from, 'relist', 'grower'), lot.balesAvailable, 'system');
}

// ---------------------------------------------------------------- who may see a lot

/** Who may see a lot in each state: buyers and visitors only once an admin approved it. */
export const LOT_VISIBILITY: Readonly<Record<LotStatus, 'public' | 'owner_and_admin'>> = {
  draft: 'owner_and_admin',
  in_review: 'owner_and_admin',
  returned: 'owner_and_admin',
  listed: 'public',
  sold_out: 'public',
  withdrawn: 'owner_and_admin',
};

export const PUBLIC_LOT_STATUSES = LOT_STATUSES.filter((s) => LOT_VISIBILITY[s] === 'public');

export function isPublicLot(status: LotStatus): boolean {
  return LOT_VISIBILITY[status] === 'public';
}

/** The lot's own grower and admins see it in any state; everyone else only when it is public. */
export function mayViewLot(status: LotStatus, viewer: { isOwner: boolean; isAdmin: boolean }): boolean {
  return isPublicLot(status) || viewer.isOwner || viewer.isAdmin;
}

// ---------------------------------------------------------------- which changes need review

/**
 * Every fact a grower can change on a lot, and what a change does to an approved lot:
 * `review` facts are what the admin checked (or what buyers rely on) and send it back to review;
 * `stock`, `price` and `photos` are the grower's to change at any time (as the README promises growers).
 */
export const LOT_FACTS = {
  title: 'review',
  fieldName: 'review',
  cutting: 'review',
  forageType: 'review',
  mixDescription: 'review',
  harvestStartedOn: 'review',
  harvestEndedOn: 'review',
  storage: 'review',
  moistureAtBalingPct: 'review',
  droughtStressed: 'review',
  heavyNitrogen: 'review',
  description: 'review',
  baleType: 'review',
  baleCount: 'review',
  avgBaleWeightLb: 'review',
  balesAvailable: 'stock',
  pricingUnit: 'price',
  priceCentsPerTon: 'price',
  priceCentsPerBale: 'price',
  minOrderTons: 'price',
  deliveryTerms: 'price',
  freightCentsPerLoadedMile: 'price',
  pickupAllowed: 'price',
  sampling: 'review',
  analysis: 'review',
  labReport: 'review',
  photos: 'photos',
} as const satisfies Record<string, 'review' | 'stock' | 'price' | 'photos'>;
export type LotFact = keyof typeof LOT_FACTS;

/** The facts whose value differs between `before` and `after` and that need the admin to look again. */
export function factsNeedingReview(before: Partial<Record<LotFact, unknown>>, after: Partial<Record<LotFact, unknown>>): LotFact[] {
  return (Object.keys(after) as LotFact[]).filter((k) => k in LOT_FACTS && LOT_FACTS[k] === 'review' && !sameValue(before[k], after[k]));
}

function sameValue(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if ((a === null || a === undefined) && (b === null || b === undefined)) return true;
  return typeof a === 'number' && typeof b === 'number' && Number.isNaN(a) && Number.isNaN(b);
}

/**
 * After a `review` fact changed: a listed or sold-out lot goes back to review; other states keep theirs.
 * `approvalLapses` says whether the admin's verification of the analysis no longer holds (the lot had been
 * approved: on sale, sold out, or withdrawn and waiting to be relisted).
 */
export function afterReviewedChange(status: LotStatus): { status: LotStatus; approvalLapses: boolean } {
  const next = checkLotTransition(status, 'reopen_review', 'grower').ok ? requireLotTransition(status, 'reopen_review', 'grower') : status;
  return { status: next, approvalLapses: status === 'listed' || status === 'sold_out' || status === 'withdrawn' };
}
