import { and, eq, isNull } from 'drizzle-orm';
import { LotSearchSchema } from '@shared/contracts/lots';
import { orderStatusLabel } from '@shared/lifecycle/order-lifecycle';
import { formatCents } from '@shared/units/money';
import type { ApiDeps } from '../../api-deps';
import { lotMail } from '../../adapters/mail/lot-mail';
import { lots, messages, messageThreads, orders, users } from '../../db/schema';
import { lotMailFacts } from '../lots/lot-mail-facts';
import { LotsService } from '../lots/lots.service';
import type { PostedMessage } from './messages.service';

/** Where a new message's e-mail notice goes (the e-mail outbox in the app; a recorder in tests if wanted). */
export interface MessageNotices {
  posted(message: PostedMessage): Promise<void>;
}

/**
 * Puts each notice in the e-mail outbox (the job queue retries SMTP). If even that fails, the message is
 * kept and its notice stays pending (noticeSentAt null): the sender's message is never lost over an e-mail.
 */
export function outboxMessageNotices(deps: Pick<ApiDeps, 'db' | 'jobs' | 'env' | 'logger' | 'clock'>): MessageNotices {
  return {
    async posted({ messageId }) {
      try {
        await queueMessageNotice(deps, messageId);
      } catch (error) {
        deps.logger.error({ err: error, messageId }, 'message notice not queued; it stays pending');
      }
    },
  };
}

/**
 * Queues the e-mail to the other person in the thread about one message, once: a message whose notice is
 * already queued is skipped, so running this again never sends twice. About a lot it carries the lot's
 * facts; about an order, the order's state and total.
 */
export async function queueMessageNotice(deps: Pick<ApiDeps, 'db' | 'jobs' | 'env' | 'clock'>, messageId: number): Promise<'queued' | 'already-queued' | 'missing'> {
  const { db } = deps;
  const [row] = await db.select({ message: messages, thread: messageThreads }).from(messages).innerJoin(messageThreads, eq(messageThreads.id, messages.threadId)).where(eq(messages.id, messageId));
  if (!row) return 'missing';
  if (row.message.noticeSentAt) return 'already-queued';
  const { message, thread } = row;
  const toId = message.senderId === thread.buyerId ? thread.growerId : thread.buyerId;
  const [[to], [from]] = await Promise.all([
    db.select({ email: users.email, name: users.displayName }).from(users).where(eq(users.id, toId)),
    db.select({ name: users.displayName }).from(users).where(eq(users.id, message.senderId)),
  ]);
  const people = { to: to!, from: from!.name, toGrower: toId === thread.growerId, body: message.body };
  const mail = thread.orderId !== null ? await orderNotice(deps, thread.orderId, people) : await lotNotice(deps, thread.lotId!, thread.id, people);
  // Claim the notice first so two runs cannot both queue it; release the claim if queueing fails.
  const claimed = await db.update(messages).set({ noticeSentAt: deps.clock.now() }).where(and(eq(messages.id, messageId), isNull(messages.noticeSentAt))).returning({ id: messages.id });
  if (claimed.length === 0) return 'already-queued';
  try {
    await deps.jobs.enqueueMail(mail);
  } catch (error) {
    await db.update(messages).set({ noticeSentAt: null }).where(eq(messages.id, messageId));
    throw error;
  }
  return 'queued';
}

interface NoticePeople {
  to: { email: string; name: string };
  from: string;
  toGrower: boolean;
  body: string;
}

async function lotNotice({ db, env }: Pick<ApiDeps, 'db' | 'env'>, lotId: number, threadId: number, p: NoticePeople) {
  const [lot] = await db.select({ title: lots.title }).from(lots).where(eq(lots.id, lotId));
  const summary = (await new LotsService(db).search(LotSearchSchema.parse({ page: '1', pageSize: '1' }), { lotIds: [lotId] })).items[0];
  return lotMail({
    to: p.to.email,
    subject: p.toGrower ? `A buyer asks about “${lot!.title}”` : `The grower answered about “${lot!.title}”`,
    greeting: `Hello ${p.to.name},`,
    lead: [p.toGrower ? `${p.from} wrote to you about your lot.` : `${p.from} answered your message about this lot.`],
    quote: { from: p.from, body: p.body },
    lot: { title: lot!.title, facts: summary ? lotMailFacts(summary) : [] },
    action: { label: 'Read and answer', url: `${env.PUBLIC_URL}/messages/${threadId}` },
    footer: 'You get this e-mail because someone wrote to you about a lot on Baleproof. Answer on Baleproof, not by replying to this e-mail.',
  });
}

async function orderNotice({ db, env }: Pick<ApiDeps, 'db' | 'env'>, orderId: number, p: NoticePeople) {
  const [order] = await db.select({ status: orders.status, method: orders.method, totalCents: orders.totalCents }).from(orders).where(eq(orders.id, orderId));
  return lotMail({
    to: p.to.email,
    subject: p.toGrower ? `The buyer wrote about order ${orderId}` : `The grower wrote about order ${orderId}`,
    greeting: `Hello ${p.to.name},`,
    lead: [`${p.from} wrote to you about order ${orderId}.`],
    quote: { from: p.from, body: p.body },
    lot: {
      title: `Order ${orderId}`,
      facts: [
        ['Status', orderStatusLabel(order!.status)],
        ['Handover', order!.method === 'delivery' ? 'delivery' : 'pickup at the farm'],
        ['Total', formatCents(order!.totalCents)],
      ],
    },
    action: { label: 'Read and answer', url: `${env.PUBLIC_URL}/orders/${orderId}#messages` },
    footer: `You get this e-mail because you are the ${p.toGrower ? 'grower' : 'buyer'} of order ${orderId} on Baleproof. Answer on the order's page, not by replying to this e-mail.`,
  });
}
