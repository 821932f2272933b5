import { and, eq, isNull } from 'drizzle-orm';
import { LotSearchSchema } from '@shared/contracts/lots';
import type { ApiDeps } from '../../api-deps';
import { lotMail } from '../../adapters/mail/lot-mail';
import { lots, messages, messageThreads, users } from '../../db/schema';
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
 * Queues the e-mail to the other person in the thread about one message, with the lot's facts, once: a
 * message whose notice is already queued is skipped, so running this again never sends twice.
 */
export async function queueMessageNotice(deps: Pick<ApiDeps, 'db' | 'jobs' | 'env' | 'clock'>, messageId: number): Promise<'queued' | 'already-queued' | 'missing'> {
  const { db, env } = deps;
  const [row] = await db
    .select({ message: messages, thread: messageThreads, lotTitle: lots.title })
    .from(messages)
    .innerJoin(messageThreads, eq(messageThreads.id, messages.threadId))
    .innerJoin(lots, eq(lots.id, messageThreads.lotId))
    .where(eq(messages.id, messageId));
  if (!row) return 'missing';
  if (row.message.noticeSentAt) return 'already-queued';
  const { message, thread } = row;
  const toId = message.senderId === thread.buyerId ? thread.growerId : thread.buyerId;
  const [[to], [from]] = await Promise.all([
    db.select({ email: users.email, name: users.displayName }).from(users).where(eq(users.id, toId)),
    db.select({ name: users.displayName }).from(users).where(eq(users.id, message.senderId)),
  ]);
  const toGrower = toId === thread.growerId;
  const summary = (await new LotsService(db).search(LotSearchSchema.parse({ page: '1', pageSize: '1' }), { lotIds: [thread.lotId] })).items[0];
  const mail = lotMail({
    to: to!.email,
    subject: toGrower ? `A buyer asks about “${row.lotTitle}”` : `The grower answered about “${row.lotTitle}”`,
    greeting: `Hello ${to!.name},`,
    lead: [toGrower ? `${from!.name} wrote to you about your lot.` : `${from!.name} answered your message about this lot.`],
    quote: { from: from!.name, body: message.body },
    lot: { title: row.lotTitle, facts: summary ? lotMailFacts(summary) : [] },
    action: { label: 'Read and answer', url: `${env.PUBLIC_URL}/messages/${thread.id}` },
    footer: 'You get this e-mail because someone wrote to you about a lot on Baleproof. Answer on Baleproof, not by replying to this e-mail.',
  });
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
