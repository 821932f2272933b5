import { Router } from 'express';
import { z } from 'zod';
import { MessageCreateSchema } from '@shared/contracts/messages';
import type { ApiDeps } from '../../api-deps';
import { requireRole } from '../../middleware/require-role';
import { outboxMessageNotices, type MessageNotices } from './message-notices';
import { MessagesService } from './messages.service';

const LotParams = z.object({ lotId: z.coerce.number().int().positive('Lot id must be a positive whole number.') });
const OrderParams = z.object({ orderId: z.coerce.number().int().positive('Order id must be a positive whole number.') });
const ThreadParams = z.object({ id: z.coerce.number().int().positive('Conversation id must be a positive whole number.') });

/**
 * Messages between buyers and growers: a buyer's thread per lot, one thread per order (its buyer and grower
 * write; admins read), and everyone's inbox.
 */
export function messagesRouter(deps: ApiDeps, notices: MessageNotices = outboxMessageNotices(deps)): Router {
  const service = new MessagesService(deps.db, deps.clock);
  const router = Router();
  const parties = requireRole('buyer', 'grower');

  router.get('/threads', parties, async (req, res) => {
    res.json({ items: await service.inbox(req.user!) });
  });

  router.get('/threads/:id', parties, async (req, res) => {
    const { id } = ThreadParams.parse(req.params);
    res.json(await service.read(req.user!, id));
  });

  router.post('/threads/:id', parties, async (req, res) => {
    const { id } = ThreadParams.parse(req.params);
    const { body } = MessageCreateSchema.parse(req.body);
    const posted = await service.reply(req.user!, id, body);
    await notices.posted(posted);
    res.status(201).json(await service.read(req.user!, posted.threadId));
  });

  // Only buyers open or read a conversation about a lot; growers answer in their inbox (threads above).
  router.get('/lots/:lotId', requireRole('buyer'), async (req, res) => {
    const { lotId } = LotParams.parse(req.params);
    res.json({ thread: await service.threadAboutLot(req.user!, lotId) });
  });

  router.post('/lots/:lotId', requireRole('buyer'), async (req, res) => {
    const { lotId } = LotParams.parse(req.params);
    const { body } = MessageCreateSchema.parse(req.body);
    const posted = await service.writeAboutLot(req.user!, lotId, body);
    await notices.posted(posted);
    res.status(201).json(await service.read(req.user!, posted.threadId));
  });

  router.get('/orders/:orderId', requireRole('buyer', 'grower', 'admin'), async (req, res) => {
    const { orderId } = OrderParams.parse(req.params);
    res.json(await service.aboutOrder(req.user!, orderId));
  });

  router.post('/orders/:orderId', parties, async (req, res) => {
    const { orderId } = OrderParams.parse(req.params);
    const { body } = MessageCreateSchema.parse(req.body);
    const posted = await service.writeAboutOrder(req.user!, orderId, body);
    await notices.posted(posted);
    res.status(201).json(await service.aboutOrder(req.user!, orderId));
  });

  return router;
}
