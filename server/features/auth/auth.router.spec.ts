import { eq } from 'drizzle-orm';
import request from 'supertest';
import { users } from '../../db/schema';
import { startTestApi, uniqueEmail, type TestApi } from '../../../tests/support/test-api';
import { hashPassword } from './password';

describe('auth API', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  const signUp = (agent: ReturnType<TestApi['agent']>, email: string, role = 'buyer') =>
    agent.post('/auth/sign-up', { email, password: 'a-long-password', displayName: 'Test Person', role });

  it('signs up, reports the current user, signs out and signs back in', async () => {
    const agent = t.agent();
    const email = uniqueEmail();
    const created = await signUp(agent, email, 'grower');
    expect(created.status).toBe(201);
    expect(created.body).toEqual({ email, message: expect.stringContaining(email) });

    const me = (await agent.get('/auth/me')).body.user;
    expect(me).toMatchObject({ email, role: 'grower', displayName: 'Test Person', emailVerified: false });
    expect(me.passwordHash).toBeUndefined();
    expect((await agent.post('/auth/sign-out')).status).toBe(204);
    expect((await agent.get('/auth/me')).body.user).toBeNull();

    const back = await agent.post('/auth/sign-in', { email, password: 'a-long-password' });
    expect(back.status).toBe(200);
    expect((await agent.get('/auth/me')).body.user.role).toBe('grower');
  });

  it('stores a scrypt hash, never the password', async () => {
    const email = uniqueEmail();
    await signUp(t.agent(), email);
    const [row] = await t.deps.db.select().from(users).where(eq(users.email, email));
    expect(row!.passwordHash).toMatch(/^scrypt\$32768\$8\$1\$/);
    expect(row!.passwordHash).not.toContain('a-long-password');
  });

  it('creates no second account for a taken e-mail in any letter case, and signs nobody in', async () => {
    const email = uniqueEmail('Dup');
    expect((await signUp(t.agent(), email)).status).toBe(201);
    const agent = t.agent();
    expect((await signUp(agent, email.toUpperCase())).status).toBe(201);
    expect((await agent.get('/auth/me')).body.user).toBeNull();
    const rows = await t.deps.db.select({ id: users.id }).from(users).where(eq(users.email, email.toLowerCase()));
    expect(rows).toHaveLength(1);
  });

  it('rejects a wrong password and an unknown account with the same 401', async () => {
    const email = uniqueEmail();
    await signUp(t.agent(), email);
    const wrong = await t.agent().post('/auth/sign-in', { email, password: 'not-the-password' });
    const unknown = await t.agent().post('/auth/sign-in', { email: uniqueEmail('nobody'), password: 'whatever-it-is' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('invalid_credentials');
  });

  it('gives a new session id on sign-in (no session fixation)', async () => {
    const agent = t.agent();
    const email = uniqueEmail();
    await signUp(agent, email);
    await agent.post('/auth/sign-out');
    // Sign-out destroyed the session; a fresh anonymous request may set none, so compare the cookie before and after sign-in.
    const before = await agent.post('/auth/sign-in', { email, password: 'a-long-password' });
    const firstSid = sidOf(before.headers['set-cookie']);
    const again = await agent.post('/auth/sign-in', { email, password: 'a-long-password' });
    const secondSid = sidOf(again.headers['set-cookie']);
    expect(firstSid).toBeTruthy();
    expect(secondSid).toBeTruthy();
    expect(secondSid).not.toBe(firstSid);
  });

  it('sets the session cookie httpOnly and SameSite=Lax', async () => {
    const res = await signUp(t.agent(), uniqueEmail());
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('baleproof.sid='));
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('refuses a state-changing request without the CSRF token', async () => {
    const res = await request(t.api).post('/auth/sign-in').send({ email: uniqueEmail(), password: 'whatever-it-is' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_failed');
  });

  it('answers malformed JSON with 400 and the error shape', async () => {
    const agent = t.agent();
    const token = await agent.token();
    const res = await agent.raw.post('/auth/sign-in').set('X-XSRF-TOKEN', token).set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ error: { code: 'malformed_json', message: expect.any(String) } });
  });

  it('answers invalid fields with 400 naming each field', async () => {
    const res = await t.agent().post('/auth/sign-up', { email: 'not-an-email', password: 'short', displayName: '', role: 'admin' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['email', 'password', 'displayName', 'role']));
  });

  it('rejects unknown fields rather than ignoring them', async () => {
    const res = await t.agent().post('/auth/sign-up', { email: uniqueEmail(), password: 'a-long-password', displayName: 'X', role: 'buyer', isAdmin: true });
    expect(res.status).toBe(400);
  });

  it('does not let a disabled account sign in', async () => {
    const email = uniqueEmail();
    await t.deps.db.insert(users).values({ email, displayName: 'Gone', role: 'buyer', passwordHash: await hashPassword('a-long-password'), disabledAt: new Date() });
    expect((await t.agent().post('/auth/sign-in', { email, password: 'a-long-password' })).status).toBe(401);
  });
});

describe('sign-in rate limit', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi({ SIGN_IN_RATE_LIMIT: '3' });
  });
  afterAll(() => t.close());

  it('answers 429 after too many attempts for one account, while another account from the same address may still try', async () => {
    const agent = t.agent();
    const email = uniqueEmail();
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await agent.post('/auth/sign-in', { email, password: 'wrong-password' })).status);
    expect(statuses).toEqual([401, 401, 401, 429]);
    // Same client, same address, another account: not limited, so the limit is per account, not per address alone.
    expect((await agent.post('/auth/sign-in', { email: uniqueEmail(), password: 'wrong-password' })).status).toBe(401);
  });
});

function sidOf(setCookie: string | string[] | undefined): string | undefined {
  return ([] as string[]).concat(setCookie ?? []).find((c) => c.startsWith('baleproof.sid='))?.split(';')[0];
}
