import { and, eq, isNull } from 'drizzle-orm';
import { LotSearchSchema } from '@shared/contracts/lots';
import type { ApiDeps } from '../../api-deps';
import { lotMail } from '../../adapters/mail/lot-mail';
import { lots, messages, messageThreads, users } from '../../db/schema';
import { lotMailFacts } from '../lots/lot-mail-facts';
import { LotsService } from '../lots/lots.service';
import type { PostedMessage } from './messages.service';

/**
 * Where a new message's e-mail notice goes. Today it is sent straight after the message is stored; the job
 * queue will implement the same interface by enqueueing `sendMessageNotice(messageId)` and retrying it.
 */
export interface MessageNotices {
  posted(message: PostedMessage): Promise<void>;
}

/** Sends each notice at once; a failed send is logged and left unsent (noticeSentAt stays null) for a retry. */
export function immediateMessageNotices(deps: Pick<ApiDeps, 'db' | 'mailer' | 'env' | 'logger' | 'clock'>): MessageNotices {
  return {
    async posted({ messageId }) {
      try {
        await sendMessageNotice(deps, messageId);
      } catch (error) {
        deps.logger.error({ err: error, messageId }, 'message notice not sent; it stays pending');
      }
    },
  };
}

/**
 * E-mails the other person in the thread about one message, with the lot's facts, once: a message whose
 * notice went out already is skipped, so a retried job never sends twice.
 */
export async function sendMessageNotice(deps: Pick<ApiDeps, 'db' | 'mailer' | 'env' | 'clock'>, messageId: number): Promise<'sent' | 'already-sent' | 'missing'> {
  const { db, env } = deps;
  const [row] = await db
    .select({ message: messages, thread: messageThreads, lotTitle: lots.title })
    .from(messages)
    .innerJoin(messageThreads, eq(messageThreads.id, messages.threadId))
    .innerJoin(lots, eq(lots.id, messageThreads.lotId))
    .where(eq(messages.id, messageId));
  if (!row) return 'missing';
  if (row.message.noticeSentAt) return 'already-sent';
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
  // Claim the notice first so two workers cannot both send it; release the claim if sending fails.
  const claimed = await db.update(messages).set({ noticeSentAt: deps.clock.now() }).where(and(eq(messages.id, messageId), isNull(messages.noticeSentAt))).returning({ id: messages.id });
  if (claimed.length === 0) return 'already-sent';
  try {
    await deps.mailer.send(mail);
  } catch (error) {
    await db.update(messages).set({ noticeSentAt: null }).where(eq(messages.id, messageId));
    throw error;
  }
  return 'sent';
}
