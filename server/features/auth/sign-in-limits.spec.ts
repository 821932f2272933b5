import { users } from '../../db/schema';
import { hashPassword } from './password';
import { startTestApi, uniqueEmail, type TestApi } from '../../../tests/support/test-api';

/* Failed sign-ins are limited per account and per client address; successful ones are not counted (common practice, OWASP authentication cheat sheet). */
describe('sign-in limits', () => {
  describe('per account', () => {
    let t: TestApi;
    beforeAll(async () => {
      t = await startTestApi({ SIGN_IN_RATE_LIMIT: '3' });
    });
    afterAll(() => t.close());

    it('counts spellings of one e-mail (spaces, capitals) as the same account', async () => {
      const email = uniqueEmail();
      const spellings = [email, ` ${email}`, `${email.toUpperCase()} `, `  ${email}`];
      const statuses = [];
      for (const spelling of spellings) statuses.push((await t.agent().post('/auth/sign-in', { email: spelling, password: 'wrong-password' })).status);
      expect(statuses).toEqual([401, 401, 401, 429]);
    });

    it('does not count successful sign-ins', async () => {
      const email = uniqueEmail();
      await t.deps.db.insert(users).values({ email, displayName: 'Often', role: 'buyer', passwordHash: await hashPassword('the-right-password') });
      const statuses = [];
      for (let i = 0; i < 5; i++) statuses.push((await t.agent().post('/auth/sign-in', { email, password: 'the-right-password' })).status);
      expect(statuses).toEqual([200, 200, 200, 200, 200]);
    });
  });

  describe('per client address', () => {
    let t: TestApi;
    beforeAll(async () => {
      t = await startTestApi({ SIGN_IN_IP_RATE_LIMIT: '5' });
    });
    afterAll(() => t.close());

    it('limits one password tried across many accounts from one address', async () => {
      const statuses = [];
      for (let i = 0; i < 6; i++) statuses.push((await t.agent().post('/auth/sign-in', { email: uniqueEmail(), password: 'Summer2026!' })).status);
      expect(statuses).toEqual([401, 401, 401, 401, 401, 429]);
    });
  });

  describe('across server processes', () => {
    // Production runs one process per core on one database: two test APIs with one scope stand for two of them.
    const scope = `shared_${process.pid}_${Date.now()}:`;
    let a: TestApi;
    let b: TestApi;
    beforeAll(async () => {
      a = await startTestApi({ SIGN_IN_RATE_LIMIT: '4', RATE_LIMIT_SCOPE: scope });
      b = await startTestApi({ SIGN_IN_RATE_LIMIT: '4', RATE_LIMIT_SCOPE: scope });
    });
    afterAll(async () => {
      await a.close();
      await b.close();
    });

    it('shares one count: failures spread over two processes reach the limit together', async () => {
      const email = uniqueEmail();
      const statuses = [];
      for (const api of [a, b, a, b, a, b]) statuses.push((await api.agent().post('/auth/sign-in', { email, password: 'wrong-password' })).status);
      expect(statuses).toEqual([401, 401, 401, 401, 429, 429]);
    });

    it('counts parallel failures exactly (one atomic upsert each)', async () => {
      const email = uniqueEmail();
      const statuses = await Promise.all(Array.from({ length: 10 }, (_, i) => (i % 2 ? a : b).agent().post('/auth/sign-in', { email, password: 'wrong-password' }).then((r) => r.status)));
      expect(statuses.filter((s) => s === 401)).toHaveLength(4);
      expect(statuses.filter((s) => s === 429)).toHaveLength(6);
    });
  });

  describe('sign-ups per client address', () => {
    let t: TestApi;
    beforeAll(async () => {
      t = await startTestApi({ SIGN_UP_IP_RATE_LIMIT: '3' });
    });
    afterAll(() => t.close());

    it('allows a few new accounts an hour from one address, then answers 429', async () => {
      const statuses = [];
      for (let i = 0; i < 4; i++) statuses.push((await t.agent().post('/auth/sign-up', { email: uniqueEmail(), password: 'a-long-password', displayName: 'New Person', role: 'buyer' })).status);
      expect(statuses).toEqual([201, 201, 201, 429]);
      // An hour later the address may sign up again (the API's clock).
      t.clock.set(new Date(t.clock.now().getTime() + 61 * 60 * 1000));
      expect((await t.agent().post('/auth/sign-up', { email: uniqueEmail(), password: 'a-long-password', displayName: 'New Person', role: 'buyer' })).status).toBe(201);
    });
  });
});
