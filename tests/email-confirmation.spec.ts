import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { users } from '../server/db/schema';
import { alertSavedSearches } from '../server/features/saved-searches/saved-search-alerts';
import { emailTokens } from '../server/features/auth/email-token';
import { plusDays } from '@shared/time/days';
import { mailsTo, waitForMail } from '../e2e/support/mail-catcher';
import { createGrower, createLot } from './support/fixtures';
import { startTestApi, uniqueEmail, type TestApi } from './support/test-api';
import { TEST_NOW } from './support/test-clock';

// Spans sign-up, the outbox and saved-search alerts. Mail goes through real SMTP into the mail catcher
// (maildev) and the confirmation link is read back out of the e-mail as its recipient would see it.
// The rules follow the OWASP Authentication Cheat Sheet (common practice): confirm an address before
// sending it anything it did not ask for, and answer a sign-up alike whether or not the address is registered.
describe('confirming an e-mail address', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi({}, { smtp: true });
  });
  afterAll(() => t.close());
  afterEach(() => t.clock.set(TEST_NOW));

  const newAccount = { password: 'a-long-password', displayName: 'Pat Newcomer', role: 'buyer' };
  const signUp = async (email = uniqueEmail('confirm')) => {
    const agent = t.agent();
    const res = await agent.post('/auth/sign-up', { email, ...newAccount });
    await t.drainJobs();
    return { agent, email, res };
  };
  /** The token in the link of the newest confirmation e-mail to `email`. */
  const linkToken = async (email: string) => {
    await waitForMail(email, 'Confirm your e-mail address');
    const mails = (await mailsTo(email)).filter((m) => m.subject.includes('Confirm your e-mail address'));
    const link = /\/confirm-email\?token=(\S+)/.exec(mails.at(-1)!.text);
    expect(link).not.toBeNull();
    return decodeURIComponent(link![1]!);
  };
  const confirm = (token: string) => t.agent().post('/auth/confirm-email', { token });

  it('e-mails a link at sign-up; opening it confirms the address once, and again answers "already confirmed"', async () => {
    const { agent, email, res } = await signUp();
    expect(res.status).toBe(201);
    expect((await agent.get('/auth/me')).body.user).toMatchObject({ email, emailVerified: false });

    const token = await linkToken(email);
    const first = await confirm(token);
    expect(first.status).toBe(200);
    expect(first.body).toEqual({ email, alreadyConfirmed: false, message: expect.stringContaining('confirmed') });
    expect((await agent.get('/auth/me')).body.user.emailVerified).toBe(true);
    const [row] = await t.deps.db.select({ at: users.emailVerifiedAt }).from(users).where(eq(users.email, email));
    expect(row!.at!.toISOString()).toBe(TEST_NOW);

    const again = await confirm(token);
    expect(again.status).toBe(200);
    expect(again.body).toEqual({ email, alreadyConfirmed: true, message: `${email} is already confirmed.` });
  });

  it('refuses with 400 a link opened after 48 hours', async () => {
    const { email } = await signUp();
    const token = await linkToken(email);
    t.clock.set(plusDays(new Date(TEST_NOW), 2));
    const late = await confirm(token);
    expect(late.status).toBe(400);
    expect(late.body.error).toMatchObject({ code: 'invalid_confirmation_link', message: expect.stringContaining('expired') });
    t.clock.set(new Date(plusDays(new Date(TEST_NOW), 2).getTime() - 60_000));
    expect((await confirm(token)).status).toBe(200); // a minute before the end it still works
  });

  it('refuses with 400 a tampered link, one signed with another key, and one for an address the account no longer has', async () => {
    const { email } = await signUp();
    const token = await linkToken(email);
    const [body, mac] = token.split('.') as [string, string];
    const [user] = await t.deps.db.select({ id: users.id }).from(users).where(eq(users.email, email));

    // Someone else's account id in an otherwise valid-looking payload, the original signature kept.
    const otherPayload = Buffer.from(JSON.stringify({ u: user!.id + 1, e: email, x: Date.parse(TEST_NOW) + 3_600_000 })).toString('base64url');
    const forged = emailTokens('some-other-secret-of-enough-length').issue({ userId: user!.id, email, expiresAt: plusDays(new Date(TEST_NOW), 1) });
    for (const bad of [`${otherPayload}.${mac}`, `${body}.${mac.slice(0, -2)}AA`, forged, 'not-a-token', `${body}.${mac}.extra`]) {
      const res = await confirm(bad);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('invalid_confirmation_link');
    }
    expect((await t.agent().post('/auth/confirm-email', {})).status).toBe(400);

    const moved = uniqueEmail('moved');
    await t.deps.db.update(users).set({ email: moved }).where(eq(users.id, user!.id));
    const stale = await confirm(token);
    expect(stale.status).toBe(400);
    expect(stale.body.error.message).toContain('no longer uses');
    const [row] = await t.deps.db.select({ at: users.emailVerifiedAt }).from(users).where(eq(users.id, user!.id));
    expect(row!.at).toBeNull();
  });

  it('sends saved-search alerts only once the address is confirmed', async () => {
    const tag = `V${randomUUID().slice(0, 6)}`;
    const { agent, email } = await signUp();
    const saved = await agent.post('/saved-searches', { name: `Confirm check ${tag}`, query: { q: tag } });
    expect(saved.status).toBe(201);
    const grower = await createGrower(t.deps.db, '66502');
    const first = await createLot(t.deps.db, grower.farm.id, { title: `${tag} first cutting` });

    expect((await alertSavedSearches(t.deps, first.id)).alerted).not.toContain(saved.body.id);
    await t.drainJobs();
    expect((await mailsTo(email)).filter((m) => m.subject.includes(tag))).toEqual([]);

    expect((await confirm(await linkToken(email))).status).toBe(200);
    const second = await createLot(t.deps.db, grower.farm.id, { title: `${tag} second cutting` });
    expect((await alertSavedSearches(t.deps, second.id)).alerted).toContain(saved.body.id);
    await t.drainJobs();
    const alert = await waitForMail(email, `${tag} second cutting`);
    expect(alert.text).toContain(`/hay/${second.id}`);
  });

  it('answers a sign-up with a registered address exactly like a new one, signs nobody in and warns the owner', async () => {
    const owner = await signUp(uniqueEmail('owner'));
    const fresh = await signUp(uniqueEmail('fresh'));
    const taken = await signUp(owner.email.toUpperCase());

    expect(taken.res.status).toBe(fresh.res.status);
    expect(taken.res.headers['content-type']).toBe(fresh.res.headers['content-type']);
    // The same bytes once the address is swapped out (the address as typed, lower-cased by the form's schema).
    const shape = (res: typeof fresh.res, email: string) => JSON.stringify(res.body).split(email.toLowerCase()).join('<address>');
    expect(shape(taken.res, owner.email)).toBe(shape(fresh.res, fresh.email));
    expect(Object.keys(taken.res.body)).toEqual(Object.keys(fresh.res.body));

    expect((await taken.agent.get('/auth/me')).body.user).toBeNull();
    const accounts = await t.deps.db.select({ name: users.displayName }).from(users).where(eq(users.email, owner.email));
    expect(accounts).toHaveLength(1);

    const warning = await waitForMail(owner.email, 'Someone tried to create a Baleproof account');
    expect(warning.text).toContain('/sign-in');
    // Only the first sign-up sent the owner a confirmation link; the second sent the warning instead.
    expect((await mailsTo(owner.email)).filter((m) => m.subject.includes('Confirm your e-mail address'))).toHaveLength(1);
  });

  it('sends a signed-in unconfirmed user the link again, three times an hour, then 429', async () => {
    const { agent, email } = await signUp();
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) statuses.push((await agent.post('/auth/confirmation-link', {})).status);
    expect(statuses).toEqual([202, 202, 202, 429]);
    await t.drainJobs();
    await waitForMail(email, 'Confirm your e-mail address');
    const deadline = Date.now() + 10_000;
    while ((await mailsTo(email)).length < 4 && Date.now() < deadline) await new Promise((r) => setTimeout(r, 200));
    expect((await mailsTo(email)).filter((m) => m.subject.includes('Confirm your e-mail address'))).toHaveLength(4); // sign-up + 3

    // A new link works, the older ones too until the address is confirmed.
    expect((await confirm(await linkToken(email))).status).toBe(200);
    const other = await signUp();
    expect((await confirm(await linkToken(other.email))).status).toBe(200);
    expect((await other.agent.post('/auth/confirmation-link', {})).status).toBe(409);
    expect((await t.agent().post('/auth/confirmation-link', {})).status).toBe(401);
  });
});
