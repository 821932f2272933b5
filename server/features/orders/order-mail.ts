import { formatCents } from '@shared/units/money';
import { farmDateLabel, farmTimeLabel } from '@shared/time/farm-time';
import type { OutgoingMail } from '../../adapters/mail/mailer';
import type { DeliveryMethod } from '@shared/contracts/enums';

/** The facts of an order that every order e-mail repeats. */
export interface OrderMailFacts {
  orderId: number;
  /** The lots bought, one line each. */
  lines: { title: string; forageType: string; cutting: number; bales: number; tons: number }[];
  farmName: string;
  /** Bales, tons and hay of all lines together. */
  bales: number;
  tons: number;
  method: DeliveryMethod;
  goodsCents: number;
  freightCents: number;
  platformFeeCents: number;
  totalCents: number;
  refundedCents: number;
  windowStart: Date | null;
  /** The farm's IANA zone: the window is written in its time. */
  timeZone: string;
  deliveryAddress: string | null;
}

export type OrderMailKind = 'order_received' | 'new_order' | 'date_confirmed' | 'date_changed' | 'delivered' | 'receipt';

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const when = (f: OrderMailFacts) =>
  f.windowStart
    ? f.method === 'pickup'
      ? `pickup ${farmDateLabel(f.windowStart, f.timeZone)} at ${farmTimeLabel(f.windowStart, f.timeZone)} (farm time)`
      : `delivery on ${farmDateLabel(f.windowStart, f.timeZone)}`
    : 'date to agree';

function factRows(f: OrderMailFacts): [string, string][] {
  return [
    ...f.lines.map((l): [string, string] => ['Lot', `${l.title} (${l.forageType.replace(/_/g, ' ')}, cutting ${l.cutting})${f.lines.length > 1 ? `: ${l.bales} bales, about ${l.tons.toFixed(2)} t` : ''}`]),
    ['From', f.farmName],
    ['Quantity', `${f.bales} bales, about ${f.tons.toFixed(2)} t`],
    [f.method === 'pickup' ? 'Pickup' : 'Delivery', when(f) + (f.method === 'delivery' && f.deliveryAddress ? ` to ${f.deliveryAddress}` : '')],
    ['Hay', formatCents(f.goodsCents)],
    ['Freight', formatCents(f.freightCents)],
    ['Platform fee', formatCents(f.platformFeeCents)],
    ['Total', formatCents(f.totalCents)],
    ...(f.refundedCents > 0 ? ([['Refunded', formatCents(f.refundedCents)]] as [string, string][]) : []),
  ];
}

/** The lots of an order by name: "Lot A", or "Lot A + Lot B". */
const titles = (f: OrderMailFacts) => f.lines.map((l) => l.title).join(' + ');

const INTRO: Record<OrderMailKind, (f: OrderMailFacts) => { subject: string; lead: string }> = {
  order_received: (f) => ({ subject: `Order ${f.orderId} paid: ${titles(f)}`, lead: 'Thank you: your payment arrived and the grower has been told. You will hear when the date is confirmed.' }),
  new_order: (f) => ({ subject: `New order ${f.orderId}: ${f.bales} bales of ${titles(f)}`, lead: f.lines.length > 1 ? 'A buyer has paid for hay from your lots, to go together on one trip. Please confirm the date or offer another one.' : 'A buyer has paid for hay from your lot. Please confirm the date or offer another one.' }),
  date_confirmed: (f) => ({ subject: `Date confirmed for order ${f.orderId}`, lead: `The grower confirmed the ${when(f)}.` }),
  date_changed: (f) => ({ subject: `Another date offered for order ${f.orderId}`, lead: `The grower offered another date: ${when(f)}. Please agree to it or ask for another.` }),
  delivered: (f) => ({ subject: `Order ${f.orderId} handed over`, lead: 'The grower marked your hay delivered or picked up. Please accept the load, or report a problem within the period shown on the order.' }),
  receipt: (f) => ({ subject: `Receipt for order ${f.orderId}`, lead: 'Your order is complete. This is your receipt.' }),
};

const CAUTION =
  'Check hay for mould, dust and (in alfalfa) blister beetles before feeding, and store it dry: wet hay can heat and catch fire. Confirm feeding plans with a veterinarian or equine nutritionist.';

/** An order e-mail in plain text and HTML, with the lot's facts and a link to the order. */
export function orderMail(kind: OrderMailKind, to: string, facts: OrderMailFacts, publicUrl: string): OutgoingMail {
  const { subject, lead } = INTRO[kind](facts);
  const url = `${publicUrl}/orders/${facts.orderId}`;
  const rows = factRows(facts);
  const text = `${lead}\n\n${rows.map(([k, v]) => `${k}: ${v}`).join('\n')}\n\nSee the order: ${url}\n\n${CAUTION}\n\n— Baleproof`;
  const html = `<p>${escape(lead)}</p><table>${rows.map(([k, v]) => `<tr><th align="left">${escape(k)}</th><td>${escape(v)}</td></tr>`).join('')}</table>
<p><a href="${escape(url)}">See the order</a></p><p style="color:#555;font-size:90%">${escape(CAUTION)}</p><p>— Baleproof</p>`;
  return { to, subject, text, html };
}
