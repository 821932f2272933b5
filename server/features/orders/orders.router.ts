import express, { Router } from 'express';
import { z } from 'zod';
import {
  CancelReasonSchema,
  CreateOrderSchema,
  DeliverySettingsSchema,
  HandOverSchema,
  ListCheckoutSchema,
  ListQuoteSchema,
  OrderQuoteSchema,
  ProposeWindowSchema,
} from '@shared/contracts/orders';
import type { ApiDeps } from '../../api-deps';
import { HttpError } from '../../middleware/http-error';
import { requireRole, requireSignedIn } from '../../middleware/require-role';
import { acceptScaleTicket } from '../uploads/upload-limits';
import { DeliveriesService } from './deliveries.service';
import { OrdersService } from './orders.service';
import { PaymentEventsService } from './payment-events.service';

const IdParams = z.object({ id: z.coerce.number().int().positive('Order id must be a positive whole number.') });
const LotParams = z.object({ lotId: z.coerce.number().int().positive('Lot id must be a positive whole number.') });
const CalendarQuery = z.object({
  from: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Give the first day as YYYY-MM-DD.'),
  days: z.coerce.number().int().min(1).max(42).default(7),
});

export interface OrderFeature {
  orders: OrdersService;
  deliveries: DeliveriesService;
  paymentEvents: PaymentEventsService;
}

export function createOrderFeature(deps: ApiDeps): OrderFeature {
  const orders = new OrdersService(deps);
  return { orders, deliveries: new DeliveriesService(deps, orders), paymentEvents: new PaymentEventsService(deps.db, orders) };
}

/** Buying a load: quote, place, pay, agree a date, hand over, accept. */
export function ordersRouter({ orders, deliveries }: OrderFeature): Router {
  const router = Router();

  router.get('/quote', async (req, res) => {
    res.json(await orders.quote(OrderQuoteSchema.parse(req.query)));
  });
  router.post('/quote-list', async (req, res) => {
    res.json(await orders.quoteList(ListQuoteSchema.parse(req.body)));
  });
  router.get('/lots/:lotId/open-days', async (req, res) => {
    res.json(await deliveries.openDays(LotParams.parse(req.params).lotId));
  });

  router.post('/', requireRole('buyer'), async (req, res) => {
    res.status(201).json(await orders.create(req.user!, CreateOrderSchema.parse(req.body)));
  });
  router.post('/from-list', requireRole('buyer'), async (req, res) => {
    res.status(201).json(await orders.checkoutList(req.user!, ListCheckoutSchema.parse(req.body)));
  });
  router.get('/mine', requireRole('buyer'), async (req, res) => {
    res.json({ items: await orders.listForBuyer(req.user!.id) });
  });
  router.get('/incoming', requireRole('grower'), async (req, res) => {
    res.json({ items: await orders.listForGrower(req.user!.id) });
  });

  router.get('/:id', requireSignedIn, async (req, res) => {
    res.json(await orders.get(req.user!, IdParams.parse(req.params).id));
  });
  router.post('/:id/cancel', requireSignedIn, async (req, res) => {
    CancelReasonSchema.parse(req.body ?? {});
    res.json(await orders.cancel(req.user!, IdParams.parse(req.params).id));
  });
  router.put('/:id/window', requireSignedIn, async (req, res) => {
    res.json(await deliveries.askForWindow(req.user!, IdParams.parse(req.params).id, ProposeWindowSchema.parse(req.body)));
  });
  router.post('/:id/offer-window', requireSignedIn, async (req, res) => {
    res.json(await deliveries.offerWindow(req.user!, IdParams.parse(req.params).id, ProposeWindowSchema.parse(req.body)));
  });
  router.post('/:id/confirm-date', requireSignedIn, async (req, res) => {
    res.json(await deliveries.confirm(req.user!, IdParams.parse(req.params).id));
  });
  router.post('/:id/hand-over', requireRole('grower', 'admin'), acceptScaleTicket, async (req, res) => {
    const files = Array.isArray(req.files) ? (req.files as Express.Multer.File[]) : [];
    const ticket = files[0];
    if (ticket && ticket.size === 0) throw new HttpError(400, 'empty_file', `“${ticket.originalname}” is empty.`);
    res.json(await deliveries.handOver(req.user!, IdParams.parse(req.params).id, HandOverSchema.parse(req.body ?? {}), ticket));
  });
  router.post('/:id/accept', requireRole('buyer'), async (req, res) => {
    res.json(await deliveries.accept(req.user!, IdParams.parse(req.params).id));
  });
  return router;
}

/** The grower's delivery calendar and the settings behind it. */
export function deliveryCalendarRouter({ deliveries }: OrderFeature): Router {
  const router = Router();
  router.use(requireRole('grower'));
  router.get('/', async (req, res) => {
    const { from, days } = CalendarQuery.parse(req.query);
    res.json(await deliveries.calendar(req.user!, from, days));
  });
  router.get('/settings', async (req, res) => {
    res.json(await deliveries.settings(req.user!));
  });
  router.put('/settings', async (req, res) => {
    res.json(await deliveries.saveSettings(req.user!, DeliverySettingsSchema.parse(req.body)));
  });
  return router;
}

/**
 * The payment provider's webhook: the raw body is verified with `stripe.webhooks.constructEvent` before
 * anything is read from it. Mounted before the JSON parser and the CSRF check (the provider has no cookie).
 */
export function paymentWebhookRouter({ orders, paymentEvents }: OrderFeature): Router {
  const router = Router();
  router.post('/', express.raw({ type: '*/*', limit: '1mb' }), async (req, res) => {
    const signature = req.get('stripe-signature');
    if (!signature || !Buffer.isBuffer(req.body)) throw new HttpError(400, 'bad_signature', 'The webhook has no signature.');
    const event = orders.payments.verify(req.body, signature);
    res.json({ received: true, outcome: await paymentEvents.apply(event) });
  });
  return router;
}
