import { LOT_STATUSES, type LotStatus } from '../contracts/lots';
import {
  afterReviewedChange,
  approvedStatus,
  checkLotTransition,
  factsNeedingReview,
  LOT_EVENTS,
  lotEventsFor,
  type LotEvent,
  mayViewLot,
  onSaleStatus,
  PUBLIC_LOT_STATUSES,
  relistedStatus,
  requireLotTransition,
  statusAfterStockChange,
} from './lot-lifecycle';
import { type Actor, TransitionRefused } from './state-machine';

/**
 * The lot life-cycle as the README ("Listing a lot (growers) and the review desk (admins)") describes it:
 * growers submit drafts, admins approve or return them, growers withdraw and relist; an approved lot is on
 * sale while bales are left; after approval a change of the lot, its sampling, analysis or report sends it
 * back to review, stock, price and photos do not. Written out as (state, event, actor, next state) rows:
 * everything listed is allowed, every other combination of state × event × actor is refused.
 */
const ALLOWED: ReadonlyArray<[LotStatus, LotEvent, Actor, LotStatus]> = [
  ['draft', 'submit', 'grower', 'in_review'],
  ['returned', 'submit', 'grower', 'in_review'],
  ['in_review', 'approve', 'admin', 'listed'],
  ['in_review', 'return', 'admin', 'returned'],
  ['listed', 'withdraw', 'grower', 'withdrawn'],
  ['sold_out', 'withdraw', 'grower', 'withdrawn'],
  ['in_review', 'withdraw', 'grower', 'withdrawn'],
  ['withdrawn', 'relist', 'grower', 'listed'],
  ['withdrawn', 'relist_to_review', 'grower', 'in_review'],
  ['listed', 'sell_out', 'grower', 'sold_out'],
  ['listed', 'sell_out', 'system', 'sold_out'],
  ['sold_out', 'restock', 'grower', 'listed'],
  ['sold_out', 'restock', 'system', 'listed'],
  ['listed', 'reopen_review', 'grower', 'in_review'],
  ['sold_out', 'reopen_review', 'grower', 'in_review'],
];
const ACTORS: Actor[] = ['buyer', 'grower', 'admin', 'system'];

describe('lot life-cycle', () => {
  it.each(ALLOWED)('allows %s --%s by %s--> %s', (from, event, actor, to) => {
    expect(checkLotTransition(from, event, actor)).toEqual({ ok: true, to });
    expect(requireLotTransition(from, event, actor)).toBe(to);
  });

  const forbidden = LOT_STATUSES.flatMap((from) =>
    LOT_EVENTS.flatMap((event) =>
      ACTORS.filter((actor) => !ALLOWED.some(([f, e, a]) => f === from && e === event && a === actor)).map((actor) => [from, event, actor] as const),
    ),
  );

  it(`refuses the other ${LOT_STATUSES.length * LOT_EVENTS.length * ACTORS.length - ALLOWED.length} combinations`, () => {
    expect(forbidden).toHaveLength(LOT_STATUSES.length * LOT_EVENTS.length * ACTORS.length - ALLOWED.length);
    for (const [from, event, actor] of forbidden) {
      const result = checkLotTransition(from, event, actor);
      expect({ from, event, actor, ok: result.ok }).toEqual({ from, event, actor, ok: false });
      expect(() => requireLotTransition(from, event, actor)).toThrow(TransitionRefused);
    }
  });

  it('tells "not in this state" (409) from "not you" (403), with the grower-facing messages', () => {
    expect(catchRefusal(() => requireLotTransition('in_review', 'submit', 'grower'))).toMatchObject({ code: 'not_submittable', reason: 'wrong_state', message: 'This lot is already waiting for review.' });
    expect(catchRefusal(() => requireLotTransition('listed', 'submit', 'grower'))).toMatchObject({ code: 'not_submittable', message: 'Only drafts and returned lots can be submitted.' });
    expect(catchRefusal(() => requireLotTransition('draft', 'approve', 'admin'))).toMatchObject({ code: 'not_in_review', reason: 'wrong_state' });
    expect(catchRefusal(() => requireLotTransition('listed', 'relist', 'grower'))).toMatchObject({ code: 'not_relistable' });
    expect(catchRefusal(() => requireLotTransition('in_review', 'approve', 'grower'))).toMatchObject({ code: 'not_allowed', reason: 'not_allowed' });
    expect(catchRefusal(() => requireLotTransition('in_review', 'withdraw', 'buyer'))).toMatchObject({ reason: 'not_allowed' });
  });

  it('lists the steps open to each actor in each state', () => {
    expect(lotEventsFor('in_review', 'admin').sort()).toEqual(['approve', 'return']);
    expect(lotEventsFor('in_review', 'grower')).toEqual(['withdraw']);
    expect(lotEventsFor('listed', 'system')).toEqual(['sell_out']);
    expect(lotEventsFor('withdrawn', 'grower').sort()).toEqual(['relist', 'relist_to_review']);
    for (const s of LOT_STATUSES) expect(lotEventsFor(s, 'buyer')).toEqual([]);
  });
});

describe('lot stock and status', () => {
  it('is on sale while bales are left and sold out at zero', () => {
    expect(onSaleStatus(1)).toBe('listed');
    expect(onSaleStatus(0)).toBe('sold_out');
  });

  it('moves only listed and sold-out lots with the stock', () => {
    expect(statusAfterStockChange('listed', 0)).toBe('sold_out');
    expect(statusAfterStockChange('sold_out', 12, 'system')).toBe('listed');
    expect(statusAfterStockChange('listed', 5)).toBe('listed');
    for (const s of ['draft', 'in_review', 'returned', 'withdrawn'] as const) {
      expect(statusAfterStockChange(s, 0)).toBe(s);
      expect(statusAfterStockChange(s, 10)).toBe(s);
    }
  });

  it('approves onto sale, or straight to sold out with no bales left', () => {
    expect(approvedStatus('in_review', 40)).toBe('listed');
    expect(approvedStatus('in_review', 0)).toBe('sold_out');
    expect(() => approvedStatus('draft', 40)).toThrow(TransitionRefused);
  });

  it('relists straight onto sale only a published lot whose analysis is still verified', () => {
    expect(relistedStatus('withdrawn', { analysisVerified: true, everPublished: true, balesAvailable: 3 })).toBe('listed');
    expect(relistedStatus('withdrawn', { analysisVerified: true, everPublished: true, balesAvailable: 0 })).toBe('sold_out');
    expect(relistedStatus('withdrawn', { analysisVerified: false, everPublished: true, balesAvailable: 3 })).toBe('in_review');
    expect(relistedStatus('withdrawn', { analysisVerified: true, everPublished: false, balesAvailable: 3 })).toBe('in_review');
    expect(() => relistedStatus('listed', { analysisVerified: true, everPublished: true, balesAvailable: 3 })).toThrow(TransitionRefused);
  });
});

describe('who may see a lot', () => {
  it('shows listed and sold-out lots to everyone, other states only to the grower and admins', () => {
    expect([...PUBLIC_LOT_STATUSES].sort()).toEqual(['listed', 'sold_out']);
    for (const status of LOT_STATUSES) {
      const isPublic = status === 'listed' || status === 'sold_out';
      expect({ status, stranger: mayViewLot(status, { isOwner: false, isAdmin: false }) }).toEqual({ status, stranger: isPublic });
      expect(mayViewLot(status, { isOwner: true, isAdmin: false })).toBe(true);
      expect(mayViewLot(status, { isOwner: false, isAdmin: true })).toBe(true);
    }
  });
});

describe('changes after approval', () => {
  it('sends back to review for what the admin checked and buyers rely on, not for stock, price or photos', () => {
    expect(factsNeedingReview({ balesAvailable: 10, priceCentsPerTon: 25000, deliveryTerms: 'a' }, { balesAvailable: 3, priceCentsPerTon: 30000, deliveryTerms: 'b' })).toEqual([]);
    expect(factsNeedingReview({ title: 'A', storage: 'barn' }, { title: 'A', storage: 'outside' })).toEqual(['storage']);
    expect(factsNeedingReview({ description: 'x', baleType: 'round_4x5' }, { description: 'y', baleType: 'round_5x5' }).sort()).toEqual(['baleType', 'description']);
    expect(factsNeedingReview({ moistureAtBalingPct: null }, { moistureAtBalingPct: undefined })).toEqual([]);
    expect(factsNeedingReview({}, { sampling: 1, analysis: 1, labReport: 1 }).sort()).toEqual(['analysis', 'labReport', 'sampling']);
  });

  it('puts a listed or sold-out lot back in the queue; a withdrawn lot stays withdrawn but loses its approval', () => {
    expect(afterReviewedChange('listed')).toEqual({ status: 'in_review', approvalLapses: true });
    expect(afterReviewedChange('sold_out')).toEqual({ status: 'in_review', approvalLapses: true });
    expect(afterReviewedChange('withdrawn')).toEqual({ status: 'withdrawn', approvalLapses: true });
    for (const s of ['draft', 'in_review', 'returned'] as const) expect(afterReviewedChange(s)).toEqual({ status: s, approvalLapses: false });
  });
});

function catchRefusal(f: () => unknown): TransitionRefused {
  try {
    f();
  } catch (e) {
    if (e instanceof TransitionRefused) return e;
    throw e;
  }
  throw new Error('expected a refusal');
}
