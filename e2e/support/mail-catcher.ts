/**
 * Reads what the app really sent: the messages maildev caught over SMTP, through its HTTP API
 * (`GET /api/email`). Used by the Playwright journeys and by integration tests in Jest.
 * `npm test` starts the catcher and exports MAIL_CATCHER_URL; MAILDEV_WEB_PORT is the fallback.
 */
import { stackUrl } from './stack';

export interface CaughtMail {
  id: string;
  subject: string;
  text: string;
  html?: string;
  to: { address: string; name?: string }[];
  from: { address: string; name?: string }[];
  date: string;
}

export function mailCatcherUrl(): string {
  const url = process.env['MAIL_CATCHER_URL'] ?? (process.env['MAILDEV_WEB_PORT'] ? `http://127.0.0.1:${process.env['MAILDEV_WEB_PORT']}` : undefined);
  if (!url) throw new Error('No mail catcher: run through `npm test`, which starts maildev and sets MAIL_CATCHER_URL.');
  // A journey reads the catcher of the app copy its worker uses (e2e/support/stack.ts).
  return stackUrl(url);
}

/** Every message the catcher holds. */
export async function caughtMails(): Promise<CaughtMail[]> {
  const res = await fetch(`${mailCatcherUrl()}/api/email`);
  if (!res.ok) throw new Error(`mail catcher answered ${res.status}`);
  return (await res.json()) as CaughtMail[];
}

const addressedTo = (mail: CaughtMail, address: string) => mail.to.some((t) => t.address.toLowerCase() === address.toLowerCase());

/** The messages sent to one address, oldest first. */
export async function mailsTo(address: string): Promise<CaughtMail[]> {
  return (await caughtMails()).filter((m) => addressedTo(m, address));
}

/**
 * Waits until a message to `address` whose subject matches arrives (mail leaves through the outbox after the request
 * that caused it has answered), and returns it. Fails with what did arrive for that address.
 */
export async function waitForMail(address: string, subject: RegExp | string, timeoutMs = 30_000): Promise<CaughtMail> {
  const matches = (m: CaughtMail) => (typeof subject === 'string' ? m.subject.includes(subject) : subject.test(m.subject));
  const deadline = Date.now() + timeoutMs;
  let seen: CaughtMail[] = [];
  while (Date.now() < deadline) {
    seen = await mailsTo(address);
    const found = seen.find(matches);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no e-mail to ${address} with subject ${subject} within ${timeoutMs} ms; it received: ${JSON.stringify(seen.map((m) => m.subject))}`);
}
