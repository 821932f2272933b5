import { randomUUID } from 'node:crypto';
import { and, eq, isNotNull, isNull } from 'drizzle-orm';
import { savedSearches, users } from '../server/db/schema';
import { caughtMails, waitForMail, type CaughtMail } from '../e2e/support/mail-catcher';
import { approveLot, completeLot, signedInGrower, signedInUser } from './support/grower-lot';
import { startTestApi, type TestApi } from './support/test-api';

// Spans selling, review and saved searches: approving a lot is what makes it public, and that is
// the moment buyers whose saved search matches it hear about it. Mail goes out through real SMTP into
// the mail catcher (maildev) and is read back through its HTTP API.
describe('approving a lot alerts matching saved searches', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi({}, { smtp: true });
  });
  afterAll(() => t.close());

  it('e-mails through SMTP the grower and exactly the users whose saved search lists the lot; every other user gets nothing', async () => {
    const grower = await signedInGrower(t, '66502'); // Manhattan, KS
    const title = `Alert check ${randomUUID().slice(0, 8)}`;
    const lotId = await completeLot(grower.agent, { lot: { title } });
    expect((await grower.agent.post(`/selling/lots/${lotId}/submit`)).status).toBe(200);

    // The lot is alfalfa at ADF 29 / NDF 38 and CP 21 % DM (tests/support/grower-lot.ts).
    const matching = await signedInUser(t, 'buyer');
    await confirmAddress(matching.email);
    expect((await matching.agent.post('/saved-searches', { name: 'Rich alfalfa', query: { q: title, forageType: 'alfalfa', rfvMin: '150' } })).status).toBe(201);
    // Near misses, each failing the lot on one point only.
    const nearMisses: { why: string; query: Record<string, string>; alerts?: boolean; disable?: boolean; unconfirmed?: true }[] = [
      { why: 'another forage type', query: { q: title, forageType: 'timothy' } },
      { why: 'RFV floor above the lot (RFV ≈ 162)', query: { q: title, rfvMin: '170' } },
      { why: 'protein floor above the lot', query: { q: title, cpMin: '22' } },
      { why: 'too far: Hastings, NE within 50 miles', query: { q: title, zip: '68901', radiusMi: '50' } },
      { why: 'alerts switched off', query: { q: title }, alerts: false },
      { why: 'account disabled', query: { q: title }, disable: true },
      { why: 'address not confirmed', query: { q: title }, unconfirmed: true },
    ];
    const missed: string[] = [];
    for (const miss of nearMisses) {
      const buyer = await signedInUser(t, 'buyer');
      const res = await buyer.agent.post('/saved-searches', { name: miss.why, query: miss.query, ...(miss.alerts === false ? { alerts: false } : {}) });
      expect(res.status).toBe(201);
      if (!miss.unconfirmed) await confirmAddress(buyer.email);
      if (miss.disable) await t.deps.db.update(users).set({ disabledAt: new Date() }).where(eq(users.email, buyer.email));
      missed.push(buyer.email);
    }

    const admin = await signedInUser(t, 'admin');
    const before = new Set((await caughtMails()).map((m) => m.id));
    expect((await approveLot(admin.agent, lotId)).status).toBe(200);
    // The outbox holds the e-mails until its jobs run (workers are off in tests).
    await t.drainJobs();

    // The grower's approval notice, as it arrived over SMTP: mail about one's own lots and orders does not
    // wait for a confirmed address (the fixture grower never confirmed).
    const listed = await waitForMail(grower.email, `Listed: ${title}`);
    expect(listed.text).toContain(`/hay/${lotId}`);
    // The buyer's alert with the lot's figures. RFV by Rohweder et al. (1978):
    // DDM = 88.9 − 0.779·29 = 66.31; DMI = 120/38 = 3.158; RFV = 66.31·3.158/1.29 = 162.3.
    const alert = await waitForMail(matching.email, title);
    expect(alert.text).toContain(title);
    expect(alert.text).toContain('RFV: 162');
    expect(alert.text).toContain('Crude protein: 21.0 % of DM');
    expect(alert.html).toContain('162');
    expect(alert.text).toContain(`/hay/${lotId}`);

    // Who should hear about the lot: its grower, and the owner of every saved search (alerts on, account
    // active, address confirmed) under which the public catalogue lists the lot, whoever created it (other tests share the database).
    const expected = new Set([grower.email.toLowerCase()]);
    const searches = await t.deps.db
      .select({ query: savedSearches.query, email: users.email })
      .from(savedSearches)
      .innerJoin(users, eq(users.id, savedSearches.userId))
      .where(and(eq(savedSearches.alerts, true), isNull(users.disabledAt), isNotNull(users.emailVerifiedAt)));
    for (const s of searches) if (await catalogueLists(s.query, lotId, title)) expected.add(s.email.toLowerCase());
    expect(expected.has(matching.email.toLowerCase())).toBe(true);
    for (const email of expected) await waitForMail(email, title);

    const about = (m: CaughtMail) => !before.has(m.id) && (m.subject.includes(title) || m.text.includes(title));
    const received = new Map<string, number>();
    for (const m of (await caughtMails()).filter(about)) for (const to of m.to) received.set(to.address.toLowerCase(), (received.get(to.address.toLowerCase()) ?? 0) + 1);
    // Every user of the database: mail about this lot if and only if expected, and then exactly one.
    const everyone = await t.deps.db.select({ email: users.email }).from(users);
    const wrong = everyone
      .map((u) => u.email.toLowerCase())
      .filter((email) => (received.get(email) ?? 0) !== (expected.has(email) ? 1 : 0))
      .map((email) => `${email}: ${received.get(email) ?? 0}`);
    expect(wrong).toEqual([]);
    for (const email of missed) expect(received.get(email.toLowerCase())).toBeUndefined();
    expect([...received.keys()].every((email) => everyone.some((u) => u.email.toLowerCase() === email))).toBe(true);
  }, 60_000);

  const confirmAddress = (email: string) => t.deps.db.update(users).set({ emailVerifiedAt: t.clock.now() }).where(eq(users.email, email));

  /** Whether the public catalogue, asked the saved query, lists the lot (narrowed by title when the query has no text). */
  async function catalogueLists(query: Record<string, string>, lotId: number, title: string): Promise<boolean> {
    const params = new URLSearchParams({ ...query, pageSize: '100' });
    if (!params.has('q')) params.set('q', title);
    for (let page = 1; ; page++) {
      params.set('page', String(page));
      const res = await t.agent().get(`/lots?${params.toString()}`);
      if (res.status !== 200) return false;
      const body = res.body as { items: { id: number }[]; total: number };
      if (body.items.some((i) => i.id === lotId)) return true;
      if (page * 100 >= body.total) return false;
    }
  }
});
