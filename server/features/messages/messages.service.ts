import { and, asc, desc, eq, isNull, ne, or, sql } from 'drizzle-orm';
import type { MessageView, ThreadDetail, ThreadView } from '@shared/contracts/messages';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { farms, lots, messages, messageThreads, users } from '../../db/schema';
import { conflict, notFound } from '../../middleware/http-error';

/** What a notice e-mail needs to know; sent after the message is stored (see message-notices.ts). */
export interface PostedMessage {
  messageId: number;
  threadId: number;
}

/** A thread's people as the signed-in user is one of them. */
interface Participant {
  id: number;
  role: 'buyer' | 'grower' | 'admin';
}

/**
 * Messages between a buyer and the grower of a lot. A buyer opens a thread by writing about a listed lot;
 * from then on both can write. Only the two people in a thread can read it.
 */
export class MessagesService {
  constructor(
    private readonly db: Db,
    private readonly clock: Clock,
  ) {}

  /** A buyer writes to a lot's grower: the thread for this buyer and lot is made on the first message. */
  async writeAboutLot(buyer: Participant, lotId: number, body: string): Promise<PostedMessage> {
    const [lot] = await this.db
      .select({ id: lots.id, status: lots.status, growerId: farms.ownerId })
      .from(lots)
      .innerJoin(farms, eq(farms.id, lots.farmId))
      .where(eq(lots.id, lotId));
    if (!lot) throw notFound('Lot');
    if (lot.status !== 'listed' && lot.status !== 'sold_out') throw notFound('Lot');
    if (lot.growerId === buyer.id) throw conflict('own_lot', 'This is your own lot.');
    return this.db.transaction(async (tx) => {
      const now = this.clock.now();
      // Two first messages racing for the same lot meet on the unique index and share one thread.
      await tx
        .insert(messageThreads)
        .values({ lotId, buyerId: buyer.id, growerId: lot.growerId, createdAt: now, lastMessageAt: now })
        .onConflictDoNothing({ target: [messageThreads.lotId, messageThreads.buyerId], where: sql`${messageThreads.orderId} is null` });
      const [thread] = await tx
        .select({ id: messageThreads.id })
        .from(messageThreads)
        .where(and(eq(messageThreads.lotId, lotId), eq(messageThreads.buyerId, buyer.id), isNull(messageThreads.orderId)));
      return this.append(tx, thread!.id, buyer.id, body, now);
    });
  }

  /** Either person answers in an existing thread. */
  async reply(user: Participant, threadId: number, body: string): Promise<PostedMessage> {
    await this.threadFor(user, threadId);
    return this.db.transaction((tx) => this.append(tx, threadId, user.id, body, this.clock.now()));
  }

  /** The user's threads, newest first, with the last message and how many are unread. */
  async inbox(user: Participant): Promise<ThreadView[]> {
    const rows = await this.threadRows(user, or(eq(messageThreads.buyerId, user.id), eq(messageThreads.growerId, user.id))!);
    return rows;
  }

  /** The buyer's thread about a lot, or null before the first message. */
  async threadAboutLot(user: Participant, lotId: number): Promise<ThreadDetail | null> {
    const [row] = await this.db
      .select({ id: messageThreads.id })
      .from(messageThreads)
      .where(and(eq(messageThreads.lotId, lotId), eq(messageThreads.buyerId, user.id), isNull(messageThreads.orderId)));
    return row ? this.read(user, row.id) : null;
  }

  /** A whole thread; opening it marks the other person's messages read. */
  async read(user: Participant, threadId: number): Promise<ThreadDetail> {
    await this.threadFor(user, threadId);
    await this.db
      .update(messages)
      .set({ readAt: this.clock.now() })
      .where(and(eq(messages.threadId, threadId), ne(messages.senderId, user.id), isNull(messages.readAt)));
    const [view] = await this.threadRows(user, eq(messageThreads.id, threadId));
    const list = await this.db
      .select({ id: messages.id, senderId: messages.senderId, senderName: users.displayName, body: messages.body, createdAt: messages.createdAt, readAt: messages.readAt })
      .from(messages)
      .innerJoin(users, eq(users.id, messages.senderId))
      .where(eq(messages.threadId, threadId))
      .orderBy(asc(messages.createdAt), asc(messages.id));
    return {
      ...view!,
      messages: list.map(
        (m): MessageView => ({ id: m.id, mine: m.senderId === user.id, senderName: m.senderName, body: m.body, createdAt: m.createdAt.toISOString(), readAt: m.readAt?.toISOString() ?? null }),
      ),
    };
  }

  private async threadFor(user: Participant, threadId: number) {
    const [thread] = await this.db.select().from(messageThreads).where(eq(messageThreads.id, threadId));
    // Someone else's thread answers 404, not 403: its existence is nobody else's business.
    if (!thread || (thread.buyerId !== user.id && thread.growerId !== user.id)) throw notFound('Conversation');
    return thread;
  }

  private async append(tx: Pick<Db, 'insert' | 'update'>, threadId: number, senderId: number, body: string, now: Date): Promise<PostedMessage> {
    const [message] = await tx.insert(messages).values({ threadId, senderId, body, createdAt: now }).returning({ id: messages.id });
    await tx.update(messageThreads).set({ lastMessageAt: now }).where(eq(messageThreads.id, threadId));
    return { messageId: message!.id, threadId };
  }

  private async threadRows(user: Participant, where: ReturnType<typeof eq>): Promise<ThreadView[]> {
    const rows = await this.db
      .select({
        id: messageThreads.id,
        lotId: messageThreads.lotId,
        lotTitle: lots.title,
        orderId: messageThreads.orderId,
        buyerId: messageThreads.buyerId,
        farmName: farms.name,
        buyerName: sql<string>`(select display_name from users where users.id = ${messageThreads.buyerId})`,
        lastMessageAt: messageThreads.lastMessageAt,
        lastMessage: sql<string>`(select body from messages m where m.thread_id = ${messageThreads.id} order by m.created_at desc, m.id desc limit 1)`,
        unread: sql<number>`(select count(*) from messages m where m.thread_id = ${messageThreads.id} and m.sender_id <> ${user.id} and m.read_at is null)`.mapWith(Number),
      })
      .from(messageThreads)
      .innerJoin(lots, eq(lots.id, messageThreads.lotId))
      .innerJoin(farms, eq(farms.id, lots.farmId))
      .where(where)
      .orderBy(desc(messageThreads.lastMessageAt), desc(messageThreads.id));
    return rows.map((r) => ({
      id: r.id,
      lotId: r.lotId,
      lotTitle: r.lotTitle,
      orderId: r.orderId,
      withName: r.buyerId === user.id ? r.farmName : r.buyerName,
      lastMessageAt: r.lastMessageAt.toISOString(),
      lastMessage: r.lastMessage ?? '',
      unread: r.unread,
    }));
  }
}
