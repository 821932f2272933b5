import { CLAIM_EVENTS, CLAIM_LIFECYCLE, CLAIM_STATUSES, checkClaimTransition } from './claim-lifecycle';
import { PAYOUT_EVENTS, PAYOUT_LIFECYCLE, PAYOUT_STATUSES, checkPayoutTransition } from './payout-lifecycle';
import type { Actor } from './state-machine';

const ACTORS: Actor[] = ['buyer', 'grower', 'admin', 'system'];

// The allowed moves are our own policy (common practice for marketplace payouts and claims), listed in full.
const PAYOUT_ALLOWED = new Set(['held:release:admin', 'held:release:system', 'due:send:admin', 'due:send:system', 'due:fail:admin', 'due:fail:system', 'failed:retry:admin']);
const CLAIM_ALLOWED = new Set(['open:decline:admin', 'open:uphold:admin', 'open:withdraw:buyer']);

describe('payout life-cycle', () => {
  it.each(PAYOUT_STATUSES.flatMap((s) => PAYOUT_EVENTS.flatMap((e) => ACTORS.map((a) => [s, e, a] as const))))('%s —%s→ by %s', (state, event, actor) => {
    const result = checkPayoutTransition(state, event, actor);
    expect(result.ok).toBe(PAYOUT_ALLOWED.has(`${state}:${event}:${actor}`));
  });

  it('never leaves sent: a sent payout cannot be sent, failed or retried again', () => {
    expect(PAYOUT_EVENTS.filter((e) => PAYOUT_LIFECYCLE.transitions[e].from.includes('sent'))).toEqual([]);
  });
});

describe('claim life-cycle', () => {
  it.each(CLAIM_STATUSES.flatMap((s) => CLAIM_EVENTS.flatMap((e) => ACTORS.map((a) => [s, e, a] as const))))('%s —%s→ by %s', (state, event, actor) => {
    expect(checkClaimTransition(state, event, actor).ok).toBe(CLAIM_ALLOWED.has(`${state}:${event}:${actor}`));
  });

  it('a decided claim stays decided', () => {
    for (const done of ['declined', 'upheld', 'withdrawn'] as const) {
      expect(CLAIM_EVENTS.filter((e) => CLAIM_LIFECYCLE.transitions[e].from.includes(done))).toEqual([]);
    }
  });
});
