import type { Pool } from 'pg';
import type { Logger } from '../../logger';
import { OutgoingMailSchema, type Mailer, type OutgoingMail } from '../mail/mailer';
import { createJobQueue, type JobKind, type JobQueue } from './job-queue';

/**
 * The outbox: every e-mail is a `send-mail` job. Requests only store the job; a worker talks to SMTP.
 * 12 retries starting at 30 s with doubling delays cover an SMTP outage of about two days
 * (30 s × (2 + 4 + … + 2^12) / 2 on average, plus jitter).
 */
export const SEND_MAIL: JobKind<OutgoingMail> = {
  name: 'send-mail',
  retryLimit: 12,
  retryDelaySeconds: 30,
  parse: (data) => OutgoingMailSchema.parse(data),
};

/** The app's background jobs: the generic queue plus the e-mail outbox. */
export interface Jobs extends JobQueue {
  /** Stores an e-mail for sending; resolves once it is durable (never waits on SMTP). */
  enqueueMail(mail: OutgoingMail): Promise<string>;
}

export function createJobs(options: { pool: Pool; logger: Logger; mailer: Mailer; schema?: string; workers?: boolean }): Jobs {
  const queue = createJobQueue(options);
  queue.register(SEND_MAIL, (mail) => options.mailer.send(mail));
  return { ...queue, enqueueMail: (mail) => queue.enqueue(SEND_MAIL, mail) };
}

export type { JobKind, JobHandler, DrainOutcome } from './job-queue';
