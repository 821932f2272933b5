import { type Actor, checkTransition, eventsFor, type Lifecycle } from './state-machine';

/**
 * A delivery or a pickup appointment of an order. The buyer asks for a window; the grower confirms it or
 * offers another; once agreed, the grower marks the load handed over (with an optional scale ticket).
 */
export const DELIVERY_STATUSES = [
  'proposed', // the buyer asked for this window; the grower has to answer
  'rescheduled', // the grower offered another window; the buyer has to answer
  'confirmed', // both agree on the window
  'in_transit', // the load is on the road
  'done', // delivered or picked up
  'missed', // the window passed without the load changing hands
] as const;
export type DeliveryStatus = (typeof DELIVERY_STATUSES)[number];

export const DELIVERY_EVENTS = ['confirm', 'offer_other_date', 'agree', 'ask_other_date', 'load', 'hand_over', 'miss'] as const;
export type DeliveryEvent = (typeof DELIVERY_EVENTS)[number];

export const DELIVERY_LIFECYCLE: Lifecycle<DeliveryStatus, DeliveryEvent> = {
  states: DELIVERY_STATUSES,
  transitions: {
    confirm: { from: ['proposed'], to: 'confirmed', by: ['grower', 'admin'] },
    // The grower may move a window the buyer asked for, or one already agreed (weather, breakdowns).
    offer_other_date: { from: ['proposed', 'confirmed', 'missed'], to: 'rescheduled', by: ['grower', 'admin'] },
    agree: { from: ['rescheduled'], to: 'confirmed', by: ['buyer'] },
    ask_other_date: { from: ['rescheduled', 'missed'], to: 'proposed', by: ['buyer'] },
    load: { from: ['confirmed'], to: 'in_transit', by: ['grower'] },
    hand_over: { from: ['confirmed', 'in_transit'], to: 'done', by: ['grower', 'admin'] },
    miss: { from: ['confirmed', 'in_transit'], to: 'missed', by: ['grower', 'admin', 'system'] },
  },
};

const STATUS_WORDS: Record<DeliveryStatus, string> = {
  proposed: 'asked for, waiting for the grower',
  rescheduled: 'other date offered, waiting for the buyer',
  confirmed: 'confirmed',
  in_transit: 'on the road',
  done: 'handed over',
  missed: 'missed',
};

export function deliveryStatusLabel(status: DeliveryStatus): string {
  return STATUS_WORDS[status];
}

export function checkDeliveryTransition(from: DeliveryStatus, event: DeliveryEvent, actor: Actor) {
  return checkTransition(DELIVERY_LIFECYCLE, from, event, actor, (s) => STATUS_WORDS[s]);
}

export function deliveryEventsFor(from: DeliveryStatus, actor: Actor): DeliveryEvent[] {
  return eventsFor(DELIVERY_LIFECYCLE, from, actor);
}
