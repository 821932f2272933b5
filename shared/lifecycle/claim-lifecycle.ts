import { type Actor, checkTransition, eventsFor, type Lifecycle } from './state-machine';

/** A buyer's quality claim on a delivered load, judged by an admin on a retest. */
export const CLAIM_STATUSES = [
  'open', // reported; waiting for an admin
  'declined', // the admin found the hay as listed: no refund
  'upheld', // the admin refunded part or all of the order
  'withdrawn', // the buyer took it back
] as const;
export type ClaimStatus = (typeof CLAIM_STATUSES)[number];

export const CLAIM_EVENTS = ['decline', 'uphold', 'withdraw'] as const;
export type ClaimEvent = (typeof CLAIM_EVENTS)[number];

export const CLAIM_LIFECYCLE: Lifecycle<ClaimStatus, ClaimEvent> = {
  states: CLAIM_STATUSES,
  transitions: {
    decline: { from: ['open'], to: 'declined', by: ['admin'] },
    uphold: { from: ['open'], to: 'upheld', by: ['admin'] },
    withdraw: { from: ['open'], to: 'withdrawn', by: ['buyer'] },
  },
};

const WORDS: Record<ClaimStatus, string> = { open: 'waiting for an admin', declined: 'no refund', upheld: 'refunded', withdrawn: 'withdrawn by the buyer' };

export function claimStatusLabel(status: ClaimStatus): string {
  return WORDS[status];
}

export function checkClaimTransition(from: ClaimStatus, event: ClaimEvent, actor: Actor) {
  return checkTransition(CLAIM_LIFECYCLE, from, event, actor, (s) => WORDS[s]);
}

export function claimEventsFor(from: ClaimStatus, actor: Actor): ClaimEvent[] {
  return eventsFor(CLAIM_LIFECYCLE, from, actor);
}
