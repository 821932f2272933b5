import { z } from 'zod';
import { multiLineText } from './text';
import { MESSAGE_MAX_CHARS } from './message-limits';

/** POST a message: plain text over several lines, up to 2,000 characters, no control characters. */
export const MessageCreateSchema = z
  .object({
    body: multiLineText('Message', MESSAGE_MAX_CHARS, { min: 1, minMessage: 'Write a message first.' }),
  })
  .strict();
export type MessageCreate = z.input<typeof MessageCreateSchema>;

export interface MessageView {
  id: number;
  /** True when the signed-in reader wrote it. */
  mine: boolean;
  senderName: string;
  body: string;
  createdAt: string;
  readAt: string | null;
}

/**
 * A conversation about a lot (before a sale) or about an order (after one), as one of its two people sees
 * it; an admin reads order conversations without taking part.
 */
export interface ThreadView {
  id: number;
  /** Set for a conversation about a lot, null for one about an order. */
  lotId: number | null;
  /** Set for a conversation about an order, null for one about a lot. */
  orderId: number | null;
  /** What it is about, in words: the lot's title, or "Order 12". */
  subject: string;
  /** The other person: the grower's farm for a buyer, the buyer's name for a grower (both for an admin). */
  withName: string;
  lastMessageAt: string;
  lastMessage: string;
  unread: number;
}

export interface ThreadDetail extends ThreadView {
  messages: MessageView[];
}

/** Which messages an order has, as its page asks: the thread (null before the first) and whether the reader may write. */
export interface OrderThread {
  thread: ThreadDetail | null;
  /** False for an admin (reads only) and before the order is paid. */
  mayWrite: boolean;
  /** Why the reader may not write, in words; null when they may. */
  whyNot: string | null;
}
