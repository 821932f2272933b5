import nodemailer from 'nodemailer';
import { z } from 'zod';

/** An e-mail as stored in the outbox (plain JSON) and handed to SMTP. */
export const OutgoingMailSchema = z.object({
  to: z.string().email(),
  subject: z.string().min(1),
  text: z.string(),
  html: z.string().optional(),
});

export type OutgoingMail = z.infer<typeof OutgoingMailSchema>;

/**
 * Sends e-mail. Locally SMTP_URL points at the maildev catcher; in production at a real relay.
 * Only the outbox worker calls it (server/adapters/queue/jobs.ts): requests enqueue instead.
 */
export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

export function createSmtpMailer(smtpUrl: string, from: string): Mailer {
  const transport = nodemailer.createTransport(smtpUrl);
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
  };
}
