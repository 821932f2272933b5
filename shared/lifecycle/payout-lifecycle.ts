import { type Actor, checkTransition, eventsFor, type Lifecycle } from './state-machine';

/**
 * A payout: one transfer of a grower's earnings for a batch of orders. Each payout carries its own
 * idempotency key, given to the payment provider, so sending it again after a retry or a crash
 * returns the first transfer instead of making a second.
 */
export const PAYOUT_STATUSES = [
  'held', // the grower has not finished payout set-up: kept, with the reason, until they do
  'due', // ready to send
  'sent', // the transfer was made
  'failed', // the provider refused it; an admin may try again
] as const;
export type PayoutStatus = (typeof PAYOUT_STATUSES)[number];

export const PAYOUT_EVENTS = ['release', 'send', 'fail', 'retry'] as const;
export type PayoutEvent = (typeof PAYOUT_EVENTS)[number];

export const PAYOUT_LIFECYCLE: Lifecycle<PayoutStatus, PayoutEvent> = {
  states: PAYOUT_STATUSES,
  transitions: {
    // Set-up finished: the system lets the held payout go with the next settlement.
    release: { from: ['held'], to: 'due', by: ['admin', 'system'] },
    send: { from: ['due'], to: 'sent', by: ['admin', 'system'] },
    fail: { from: ['due'], to: 'failed', by: ['admin', 'system'] },
    retry: { from: ['failed'], to: 'due', by: ['admin'] },
  },
};

const WORDS: Record<PayoutStatus, string> = { held: 'held', due: 'ready to send', sent: 'sent', failed: 'refused by the payment provider' };

export function payoutStatusLabel(status: PayoutStatus): string {
  return WORDS[status];
}

export function checkPayoutTransition(from: PayoutStatus, event: PayoutEvent, actor: Actor) {
  return checkTransition(PAYOUT_LIFECYCLE, from, event, actor, (s) => WORDS[s]);
}

export function payoutEventsFor(from: PayoutStatus, actor: Actor): PayoutEvent[] {
  return eventsFor(PAYOUT_LIFECYCLE, from, actor);
}
