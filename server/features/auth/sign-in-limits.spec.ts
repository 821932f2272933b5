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
});
