import { z } from 'zod';
import type { DeliveryStatus } from '../lifecycle/delivery-lifecycle';
import type { OrderEvent, OrderStatus } from '../lifecycle/order-lifecycle';
import { DELIVERY_METHODS, type DeliveryMethod } from './enums';

const zip = z.string().trim().regex(/^\d{5}$/, 'Enter a 5-digit ZIP code.');
const isoDay = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Give the date as YYYY-MM-DD.');

/** What the buyer asks for: a number of bales from one lot, delivered or picked up. */
export const OrderQuoteSchema = z
  .object({
    lotId: z.coerce.number().int().positive('Choose a lot.'),
    bales: z.coerce.number().int('Order whole bales.').positive('Order at least one bale.').max(100_000, 'That is more bales than any lot holds.'),
    method: z.enum(DELIVERY_METHODS, { message: 'Choose delivery or pickup at the farm.' }),
    deliveryZip: zip.optional(),
  })
  .refine((o) => o.method === 'pickup' || o.deliveryZip !== undefined, { message: 'Give the delivery ZIP code so the freight can be worked out.', path: ['deliveryZip'] });
export type OrderQuoteRequest = z.infer<typeof OrderQuoteSchema>;

/** The buyer's wish for when: a delivery day, or a pickup day and hour (farm time). */
export const WindowSchema = z.object({
  date: isoDay,
  pickupHour: z.number().int().min(0).max(23).optional(),
});
export type WindowRequest = z.infer<typeof WindowSchema>;

export const CreateOrderSchema = z
  .object({
    lotId: z.number().int().positive('Choose a lot.'),
    bales: z.number().int('Order whole bales.').positive('Order at least one bale.').max(100_000, 'That is more bales than any lot holds.'),
    method: z.enum(DELIVERY_METHODS, { message: 'Choose delivery or pickup at the farm.' }),
    deliveryZip: zip.optional(),
    deliveryAddress: z.string().trim().min(5, 'Give the delivery address.').max(300, 'Use at most 300 characters.').optional(),
    window: WindowSchema.optional(),
  })
  .strict()
  .refine((o) => o.method === 'pickup' || o.deliveryZip !== undefined, { message: 'Give the delivery ZIP code so the freight can be worked out.', path: ['deliveryZip'] })
  .refine((o) => o.method === 'pickup' || o.deliveryAddress !== undefined, { message: 'Give the delivery address.', path: ['deliveryAddress'] });
export type CreateOrder = z.infer<typeof CreateOrderSchema>;

/** Most lots one hay list may check out at once. */
export const HAY_LIST_MAX_LOTS = 20;

/** The lots of a hay list with the bales wanted of each (each lot once). */
const ListLinesSchema = z
      .array(
        z
          .object({
            lotId: z.number().int().positive('Choose a lot.'),
            bales: z.number().int('Order whole bales.').positive('Order at least one bale.').max(100_000, 'That is more bales than any lot holds.'),
          })
          .strict(),
      )
      .min(1, 'The hay list is empty.')
      .max(HAY_LIST_MAX_LOTS, `Check out at most ${HAY_LIST_MAX_LOTS} lots at once.`)
      .refine((lines) => new Set(lines.map((l) => l.lotId)).size === lines.length, 'Each lot once on the list.');

/**
 * Checking out the buyer's hay list: one order per grower (one payment, one truck trip for that grower's
 * lots), each with its own hold and payment page. All bales are held at once or none are. Dates are agreed
 * per order afterwards.
 */
export const ListCheckoutSchema = z
  .object({
    lines: ListLinesSchema,
    method: z.enum(DELIVERY_METHODS, { message: 'Choose delivery or pickup at the farm.' }),
    deliveryZip: zip.optional(),
    deliveryAddress: z.string().trim().min(5, 'Give the delivery address.').max(300, 'Use at most 300 characters.').optional(),
  })
  .strict()
  .refine((o) => o.method === 'pickup' || o.deliveryZip !== undefined, { message: 'Give the delivery ZIP code so the freight can be worked out.', path: ['deliveryZip'] })
  .refine((o) => o.method === 'pickup' || o.deliveryAddress !== undefined, { message: 'Give the delivery address.', path: ['deliveryAddress'] });
export type ListCheckout = z.infer<typeof ListCheckoutSchema>;

/** Figures of a hay list before checkout: per grower (one order each), with each lot's line. */
export const ListQuoteSchema = z
  .object({
    lines: ListLinesSchema,
    method: z.enum(DELIVERY_METHODS, { message: 'Choose delivery or pickup at the farm.' }),
    deliveryZip: zip.optional(),
  })
  .strict()
  .refine((o) => o.method === 'pickup' || o.deliveryZip !== undefined, { message: 'Give the delivery ZIP code so the freight can be worked out.', path: ['deliveryZip'] });
export type ListQuoteRequest = z.infer<typeof ListQuoteSchema>;

/** One lot of a grower's order in a quote. */
export interface LineQuote {
  lotId: number;
  lotTitle: string;
  bales: number;
  tons: number;
  goodsCents: number;
  minBales: number;
  balesAvailable: number;
  /** Bales of this lot in one full load of the grower's truck. */
  balesPerLoad: number;
  /** Why this line cannot be ordered as asked, or null. */
  problem: string | null;
}

/** One grower's order in a quote: its lines and the order's figures (freight on the combined loads). */
export interface GrowerQuote {
  farmId: number;
  farmName: string;
  lines: LineQuote[];
  bales: number;
  tons: number;
  goodsCents: number;
  loads: number;
  freightCents: number;
  platformFeeCents: number;
  platformFeeBps: number;
  totalCents: number;
  distanceMi: number | null;
  /** Why this order cannot be placed as asked (the first line problem, or one of the whole order), or null. */
  problem: string | null;
}

export interface ListQuote {
  growers: GrowerQuote[];
}

export interface ListCheckoutResult {
  /** One order per grower, in the order the growers first appear on the list. */
  orders: (CreatedOrder & { farmName: string; lines: { lotId: number; lotTitle: string; bales: number }[] })[];
}

export interface OrderQuote {
  lotId: number;
  bales: number;
  tons: number;
  goodsCents: number;
  freightCents: number;
  platformFeeCents: number;
  /** The platform fee rate in basis points (300 = 3 %), from the admin settings. */
  platformFeeBps: number;
  totalCents: number;
  loads: number;
  /** Straight-line miles from the farm, an estimate (roads run longer). */
  distanceMi: number | null;
  minBales: number;
  balesAvailable: number;
  /** Bales in one full load of the grower's truck (by weight, or by count when that fills first). */
  balesPerLoad: number;
  /** Why this order cannot be placed as asked, or null. */
  problem: string | null;
}

export interface CreatedOrder {
  id: number;
  status: OrderStatus;
  totalCents: number;
  paymentUrl: string;
}

export interface OrderTimelineEntry {
  event: string;
  status: OrderStatus;
  actor: string;
  note: string;
  at: string;
}

export interface DeliveryView {
  id: number;
  method: DeliveryMethod;
  status: DeliveryStatus;
  windowStart: string;
  windowEnd: string;
  scaleTicketLb: number | null;
  hasScaleTicket: boolean;
  completedAt: string | null;
}

/** One lot of an order: its bales, terms as sold, hay cost and (ton-priced lines) the weighed tons. */
export interface OrderLineView {
  id: number;
  lot: { id: number; title: string; forageType: string; cutting: number; baleType: string; avgBaleWeightLb: number };
  bales: number;
  tons: number;
  pricingUnit: 'ton' | 'bale';
  priceCentsPerTon: number;
  goodsCents: number;
  weighedTons: number | null;
}

export interface OrderView {
  id: number;
  status: OrderStatus;
  /** The lots bought, one line each (all from this order's grower). */
  lines: OrderLineView[];
  /** `timeZone`: the farm's IANA zone; windows are shown in it. */
  farm: { id: number; name: string; city: string; state: string; pickupFromHour: number; pickupToHour: number; timeZone: string };
  buyer: { displayName: string; email: string };
  /** Bales, tons and hay cost of all lines together. */
  bales: number;
  tons: number;
  goodsCents: number;
  freightCents: number;
  platformFeeCents: number;
  /** The fee rate the order was sold at, basis points. */
  platformFeeBps: number;
  totalCents: number;
  refundedCents: number;
  method: DeliveryMethod;
  loads: number;
  deliveryZip: string | null;
  deliveryAddress: string | null;
  distanceMi: number | null;
  paymentUrl: string | null;
  reservedUntil: string | null;
  paidAt: string | null;
  deliveredAt: string | null;
  acceptBy: string | null;
  cancelReason: string | null;
  createdAt: string;
  delivery: DeliveryView | null;
  timeline: OrderTimelineEntry[];
  /** What the signed-in user may do now (order events plus delivery steps). */
  actions: string[];
  /** The viewer's part in this order. */
  viewerRole: 'buyer' | 'grower' | 'admin';
}

export type OrderSummary = Pick<OrderView, 'id' | 'status' | 'bales' | 'tons' | 'totalCents' | 'method' | 'createdAt' | 'lines' | 'farm'> & {
  buyerName: string;
  windowStart: string | null;
  deliveryStatus: DeliveryStatus | null;
};

export const CancelReasonSchema = z.object({ reason: z.string().trim().max(500).optional() }).strict();

export const ProposeWindowSchema = WindowSchema.strict();

const weighed = z.coerce.number().positive('The weighed tons must be above zero.').max(1000, 'That is more than any order.');

/**
 * Handing the hay over, with the scale ticket: `weighedTons` for an order with one ton-priced line, or
 * `lines` (the net tons of each ton-priced line; a JSON text when sent with the ticket photo as a form).
 */
export const HandOverSchema = z
  .object({
    /** Net hay weight from the scale ticket, short tons. */
    weighedTons: weighed.optional(),
    lines: z
      .preprocess(
        (v) => {
          if (typeof v !== 'string') return v;
          try {
            return JSON.parse(v);
          } catch {
            return v;
          }
        },
        z.array(z.object({ lineId: z.coerce.number().int().positive('Name the order line.'), weighedTons: weighed }).strict()).min(1).max(50),
      )
      .refine((l) => new Set(l.map((x) => x.lineId)).size === l.length, 'Each line once.')
      .optional(),
  })
  .strict()
  .refine((h) => h.weighedTons === undefined || h.lines === undefined, { message: 'Give the weighed tons of the order or of each line, not both.', path: ['lines'] });
export type HandOver = z.infer<typeof HandOverSchema>;

export const DeliverySettingsSchema = z
  .object({
    deliveryWeekdays: z.array(z.number().int().min(0).max(6)).max(7).refine((d) => new Set(d).size === d.length, 'Each day once.'),
    loadsPerDay: z.number().int().min(0, 'Zero or more loads a day.').max(50),
    tonsPerLoad: z.number().positive('A load carries some hay.').max(40, 'More than 40 t is beyond legal truck weights.'),
    balesPerLoad: z.number().int().positive().max(5000).nullable(),
    pickupFromHour: z.number().int().min(0).max(23),
    pickupToHour: z.number().int().min(1).max(24),
  })
  .strict()
  .refine((s) => s.pickupToHour > s.pickupFromHour, { message: 'Pickup hours must end after they start.', path: ['pickupToHour'] });
export type DeliverySettings = z.infer<typeof DeliverySettingsSchema>;

/** One day of the grower's delivery calendar. */
export interface CalendarDay {
  date: string;
  deliveryDay: boolean;
  capacityLoads: number;
  bookedLoads: number;
  orders: { id: number; status: OrderStatus; deliveryStatus: DeliveryStatus; method: DeliveryMethod; loads: number; buyerName: string; lotTitle: string; windowStart: string }[];
}

export type { DeliveryStatus, OrderEvent, OrderStatus };

/** An order's lots by name, in line order: "Lot A", or "Lot A + Lot B". */
export function lotTitlesOf(lines: readonly { lot: { title: string } }[]): string {
  return lines.map((l) => l.lot.title).join(' + ');
}
