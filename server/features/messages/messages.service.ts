import { and, asc, desc, eq, isNull, ne, or, sql, type SQL } from 'drizzle-orm';
import type { MessageView, OrderThread, ThreadDetail, ThreadView } from '@shared/contracts/messages';
import type { Clock } from '../../clock';
import type { Db } from '../../db/client';
import { farms, lots, messages, messageThreads, orders, users } from '../../db/schema';
import { conflict, forbidden, notFound } from '../../middleware/http-error';
import { orderParty } from './order-party';

/** What a notice e-mail needs to know; sent after the message is stored (see message-notices.ts). */
export interface PostedMessage {
  messageId: number;
  threadId: number;
}

/** The signed-in user as the messages see them. */
interface Reader {
  id: number;
  role: 'buyer' | 'grower' | 'admin';
}

const UNPAID = 'Messages about an order open once it is paid. Until then, ask about the lot on its page.';
const ADMIN_READS = 'Admins read order conversations; only the buyer and the grower write in them.';

/**
 * Messages between a buyer and a grower. Before a sale a buyer opens a thread by writing about a listed lot;
 * after it either of them opens the order's thread. From then on both can write. Only the two people in a
 * thread read it, and admins read (never write in, never mark read) the conversations about orders.
 */
export class MessagesService {
  constructor(
    private readonly db: Db,
    private readonly clock: Clock,
  ) {}

  /** A buyer writes to a lot's grower: the thread for this buyer and lot is made on the first message. */
  async writeAboutLot(buyer: Reader, lotId: number, body: string): Promise<PostedMessage> {
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

  /** The order's buyer or grower writes about it: the order's one thread is made on the first message. */
  async writeAboutOrder(user: Reader, orderId: number, body: string): Promise<PostedMessage> {
    const party = await orderParty(this.db, orderId, user);
    if (party.part === 'admin') throw forbidden(ADMIN_READS);
    if (!party.paid) throw conflict('order_unpaid', UNPAID);
    return this.db.transaction(async (tx) => {
      const now = this.clock.now();
      // Buyer and grower writing first at the same moment meet on the unique index and share one thread.
      await tx
        .insert(messageThreads)
        .values({ orderId, buyerId: party.buyerId, growerId: party.growerId, createdAt: now, lastMessageAt: now })
        .onConflictDoNothing({ target: messageThreads.orderId, where: sql`${messageThreads.orderId} is not null` });
      const [thread] = await tx.select({ id: messageThreads.id }).from(messageThreads).where(eq(messageThreads.orderId, orderId));
      return this.append(tx, thread!.id, user.id, body, now);
    });
  }

  /** The order's thread (null before the first message) and whether this reader may write in it. */
  async aboutOrder(user: Reader, orderId: number): Promise<OrderThread> {
    const party = await orderParty(this.db, orderId, user);
    const [row] = await this.db.select({ id: messageThreads.id }).from(messageThreads).where(eq(messageThreads.orderId, orderId));
    const whyNot = party.part === 'admin' ? ADMIN_READS : party.paid ? null : UNPAID;
    return { thread: row ? await this.read(user, row.id) : null, mayWrite: whyNot === null, whyNot };
  }

  /** Either person answers in an existing thread. */
  async reply(user: Reader, threadId: number, body: string): Promise<PostedMessage> {
    await this.threadFor(user, threadId);
    if (user.role === 'admin') throw forbidden(ADMIN_READS);
    return this.db.transaction((tx) => this.append(tx, threadId, user.id, body, this.clock.now()));
  }

  /** The user's threads, newest first, with the last message and how many are unread. */
  async inbox(user: Reader): Promise<ThreadView[]> {
    return this.threadRows(user, or(eq(messageThreads.buyerId, user.id), eq(messageThreads.growerId, user.id))!);
  }

  /** The buyer's thread about a lot, or null before the first message. */
  async threadAboutLot(user: Reader, lotId: number): Promise<ThreadDetail | null> {
    const [row] = await this.db
      .select({ id: messageThreads.id })
      .from(messageThreads)
      .where(and(eq(messageThreads.lotId, lotId), eq(messageThreads.buyerId, user.id), isNull(messageThreads.orderId)));
    return row ? this.read(user, row.id) : null;
  }

  /** A whole thread; one of its two people opening it marks the other's messages read (an admin's look does not). */
  async read(user: Reader, threadId: number): Promise<ThreadDetail> {
    const thread = await this.threadFor(user, threadId);
    if (user.id === thread.buyerId || user.id === thread.growerId) {
      await this.db
        .update(messages)
        .set({ readAt: this.clock.now() })
        .where(and(eq(messages.threadId, threadId), ne(messages.senderId, user.id), isNull(messages.readAt)));
    }
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

  private async threadFor(user: Reader, threadId: number) {
    const [thread] = await this.db.select().from(messageThreads).where(eq(messageThreads.id, threadId));
    const mayRead = thread && (thread.buyerId === user.id || thread.growerId === user.id || (user.role === 'admin' && thread.orderId !== null));
    // Someone else's thread answers 404, not 403: its existence is nobody else's business.
    if (!mayRead) throw notFound('Conversation');
    return thread;
  }

  private async append(tx: Pick<Db, 'insert' | 'update'>, threadId: number, senderId: number, body: string, now: Date): Promise<PostedMessage> {
    const [message] = await tx.insert(messages).values({ threadId, senderId, body, createdAt: now }).returning({ id: messages.id });
    await tx.update(messageThreads).set({ lastMessageAt: now }).where(eq(messageThreads.id, threadId));
    return { messageId: message!.id, threadId };
  }

  private async threadRows(user: Reader, where: SQL): Promise<ThreadView[]> {
    const rows = await this.db
      .select({
        id: messageThreads.id,
        lotId: messageThreads.lotId,
        lotTitle: lots.title,
        orderId: messageThreads.orderId,
        buyerId: messageThreads.buyerId,
        growerId: messageThreads.growerId,
        farmName: farms.name,
        buyerName: sql<string>`(select display_name from users where users.id = ${messageThreads.buyerId})`,
        lastMessageAt: messageThreads.lastMessageAt,
        lastMessage: sql<string>`(select body from messages m where m.thread_id = ${messageThreads.id} order by m.created_at desc, m.id desc limit 1)`,
        unread: sql<number>`(select count(*) from messages m where m.thread_id = ${messageThreads.id} and m.sender_id <> ${user.id} and m.read_at is null)`.mapWith(Number),
      })
      .from(messageThreads)
      .leftJoin(lots, eq(lots.id, messageThreads.lotId))
      .leftJoin(orders, eq(orders.id, messageThreads.orderId))
      // A lot's thread is with the lot's farm; an order's with the farm that sells it.
      .innerJoin(farms, sql`${farms.id} = coalesce(${lots.farmId}, ${orders.farmId})`)
      .where(where)
      .orderBy(desc(messageThreads.lastMessageAt), desc(messageThreads.id));
    return rows.map((r) => {
      const party = r.buyerId === user.id || r.growerId === user.id;
      return {
        id: r.id,
        lotId: r.lotId,
        orderId: r.orderId,
        subject: r.orderId !== null ? `Order ${r.orderId}` : (r.lotTitle ?? ''),
        withName: r.buyerId === user.id ? r.farmName : r.growerId === user.id ? r.buyerName : `${r.buyerName} and ${r.farmName}`,
        lastMessageAt: r.lastMessageAt.toISOString(),
        lastMessage: r.lastMessage ?? '',
        unread: party ? r.unread : 0,
      };
    });
  }
}
