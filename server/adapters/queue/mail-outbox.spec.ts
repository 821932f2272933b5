import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { Writable } from 'node:stream';
import { join } from 'node:path';
import pino from 'pino';
import { createDb, type Db } from '../../db/client';
import { createSmtpMailer, type OutgoingMail } from '../mail/mailer';
import { createJobs, type Jobs } from './jobs';

/*
 * The outbox against a real SMTP server (maildev, the project's mail catcher) that is down at first:
 * the e-mails wait in PostgreSQL, the failures are logged, and once SMTP is back every one is delivered.
 */
describe('e-mail outbox (pg-boss)', () => {
  let db: Db;
  let jobs: Jobs | undefined;
  let maildev: ChildProcess | undefined;
  const schema = `pgboss_outbox_${process.pid}`;
  const logLines: { msg: string; queue?: string; level: number }[] = [];
  const logger = pino({ level: 'warn' }, new Writable({ write: (chunk, _enc, done) => void (logLines.push(JSON.parse(String(chunk))), done()) }));

  beforeAll(() => {
    db = createDb(process.env['TEST_DATABASE_URL']!, 3);
  });
  afterEach(async () => {
    await jobs?.stop();
    maildev?.kill();
    await db.$client.query(`drop schema if exists ${schema} cascade`);
  });
  afterAll(() => db.$client.end());

  it('keeps e-mails queued while SMTP is down and delivers all of them when it is back', async () => {
    const [smtpPort, webPort] = [await freePort(), await freePort()];
    jobs = createJobs({ pool: db.$client, logger, mailer: createSmtpMailer(`smtp://127.0.0.1:${smtpPort}`, 'Baleproof <no-reply@baleproof.example>'), schema, workers: false });
    await jobs.start();
    const mails: OutgoingMail[] = [1, 2, 3].map((n) => ({ to: `buyer${n}@test.baleproof.example`, subject: `Outbox check ${n}`, text: `Body ${n}` }));

    const started = Date.now();
    for (const mail of mails) await jobs.enqueueMail(mail);
    expect(Date.now() - started).toBeLessThan(2000); // enqueueing never touches SMTP

    // Nothing listens on the SMTP port: every attempt fails, is logged, and waits for a retry.
    expect(await jobs.drain()).toEqual({ completed: 0, failed: 3 });
    expect(logLines.filter((l) => l.queue === 'send-mail' && l.msg === 'job failed; it will be retried')).toHaveLength(3);
    const waiting = await db.$client.query(`select state, start_after > now() as delayed from ${schema}.job where name = 'send-mail'`);
    expect(waiting.rows).toEqual(Array(3).fill({ state: 'retry', delayed: true }));
    // Backoff: the retries are not due yet.
    expect(await jobs.drain()).toEqual({ completed: 0, failed: 0 });

    maildev = await startMaildev(smtpPort, webPort);
    expect(await jobs.drain({ includeDelayed: true })).toEqual({ completed: 3, failed: 0 });
    const inbox = (await (await fetch(`http://127.0.0.1:${webPort}/api/email`)).json()) as { subject: string; to: { address: string }[] }[];
    expect(inbox.map((m) => m.subject).sort()).toEqual(mails.map((m) => m.subject));
    expect(inbox.find((m) => m.subject === 'Outbox check 2')!.to[0]!.address).toBe('buyer2@test.baleproof.example');
  }, 30_000);

  it('with workers on (the server), a queued e-mail is sent in the background', async () => {
    const sent: OutgoingMail[] = [];
    jobs = createJobs({ pool: db.$client, logger, mailer: { send: async (m) => void sent.push(m) }, schema, workers: true });
    await jobs.start();
    await jobs.enqueueMail({ to: 'grower@test.baleproof.example', subject: 'Background', text: 'Sent by a worker.' });
    for (let i = 0; i < 40 && sent.length === 0; i++) await new Promise((r) => setTimeout(r, 250));
    expect(sent.map((m) => m.subject)).toEqual(['Background']);
  }, 20_000);

  it('refuses to store an e-mail without a valid recipient', async () => {
    jobs = createJobs({ pool: db.$client, logger, mailer: { send: async () => undefined }, schema, workers: false });
    await jobs.start();
    await expect(jobs.enqueueMail({ to: 'not an address', subject: 'x', text: 'y' })).rejects.toThrow();
  });
});

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

async function startMaildev(smtpPort: number, webPort: number): Promise<ChildProcess> {
  const bin = join(__dirname, '../../../node_modules/.bin/maildev');
  const child = spawn(process.execPath, [bin, '--smtp', String(smtpPort), '--web', String(webPort), '--ip', '127.0.0.1', '--web-ip', '127.0.0.1', '--silent'], { stdio: 'ignore' });
  for (let i = 0; i < 80; i++) {
    const up = await fetch(`http://127.0.0.1:${webPort}/api/healthz`).then((r) => r.ok, () => false);
    if (up) return child;
    await new Promise((r) => setTimeout(r, 250));
  }
  child.kill();
  throw new Error('maildev did not start');
}
