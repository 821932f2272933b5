import { z } from 'zod';

/** POST a message: plain text, up to 2,000 characters. */
export const MessageCreateSchema = z
  .object({
    body: z.string().trim().min(1, 'Write a message first.').max(2000, 'Keep a message under 2,000 characters.'),
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

/** A conversation about a lot (or an order from it), as one of its two people sees it. */
export interface ThreadView {
  id: number;
  lotId: number;
  lotTitle: string;
  orderId: number | null;
  /** The other person: the grower's farm for a buyer, the buyer's name for a grower. */
  withName: string;
  lastMessageAt: string;
  lastMessage: string;
  unread: number;
}

export interface ThreadDetail extends ThreadView {
  messages: MessageView[];
}
