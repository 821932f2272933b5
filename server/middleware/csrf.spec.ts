import request from 'supertest';
import { startTestApi, type TestApi } from '../../tests/support/test-api';
import { uniqueEmail } from '../../tests/support/test-api';
import { users } from '../db/schema';
import { hashPassword } from '../features/auth/password';

// RFC 6265 §4.2: a Cookie header is `name=value` pairs separated by "; ". Browsers and proxies send
// broken ones too; a bad cookie is the client's mistake, so it must get a 4xx or be ignored, never a 500.
const MALFORMED = [
  'XSRF-TOKEN=%E0%A4%A', // a cut-off percent escape (decodeURIComponent throws on it)
  'XSRF-TOKEN=%', // a lone percent sign
  'XSRF-TOKEN', // a name without a value
  '=; ;;; XSRF-TOKEN==', // empty names and values
  'baleproof.sid=%ZZ; XSRF-TOKEN=%C0%AF', // a broken session cookie beside a broken token
];

describe('CSRF cookie reading', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  it.each(MALFORMED)('answers a read with a malformed cookie (%j) normally and hands out a fresh token', async (cookie) => {
    const res = await request(t.api).get('/auth/me').set('Cookie', cookie);
    expect(res.status).toBeLessThan(500);
    expect(res.status).toBe(200);
    expect(String(res.headers['set-cookie'] ?? '')).toMatch(/XSRF-TOKEN=/);
  });

  it.each(MALFORMED)('refuses a write with a malformed cookie (%j) with 403 csrf_failed, not 500', async (cookie) => {
    const res = await request(t.api).post('/auth/sign-out').set('Cookie', cookie).set('X-XSRF-TOKEN', '%E0%A4%A').send({});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_failed');
  });
});

/** The Set-Cookie line for `name`, or undefined. */
function setCookie(res: { headers: Record<string, unknown> }, name: string): string | undefined {
  return ([] as string[]).concat((res.headers['set-cookie'] as string[] | undefined) ?? []).find((c) => c.startsWith(`${name}=`));
}
const valueOf = (line: string | undefined) => (line ? decodeURIComponent(line.split(';')[0]!.split('=').slice(1).join('=')) : undefined);

/**
 * A sign-in done by hand (supertest's cookie jar would mix cookies in, and keeps Secure ones off plain http):
 * the visitor's token, the session cookie, and the token the sign-in answer hands out (the old one if none).
 */
async function signInByHand(t: TestApi, names: { csrf: string; session: string }) {
  const email = uniqueEmail('csrf');
  await t.deps.db.insert(users).values({ email, displayName: 'Token Tester', role: 'buyer', passwordHash: await hashPassword('fixture-password') });
  const visitorToken = valueOf(setCookie(await request(t.api).get('/auth/me'), names.csrf))!;
  // Secure cookies are set only on an https request: the TLS proxy in front says so (the API trusts loopback proxies).
  const res = await request(t.api).post('/auth/sign-in').set('X-Forwarded-Proto', names.csrf.startsWith('__Host-') ? 'https' : 'http').set('Cookie', `${names.csrf}=${visitorToken}`).set('X-XSRF-TOKEN', visitorToken).send({ email, password: 'fixture-password' });
  expect(res.status).toBe(200);
  const sessionLine = setCookie(res, names.session);
  const renewed = valueOf(setCookie(res, names.csrf));
  return { visitorToken, sessionLine, session: sessionLine?.split(';')[0], renewed, token: renewed ?? visitorToken };
}

const PLAIN = { csrf: 'XSRF-TOKEN', session: 'baleproof.sid' };
const write = (t: TestApi, cookie: string, token: string) => request(t.api).post('/saved-searches').set('Cookie', cookie).set('X-XSRF-TOKEN', token).send(SEARCH);

// OWASP CSRF Prevention Cheat Sheet, "Signed Double-Submit Cookie (recommended)": the token's HMAC covers
// the session, so a token made for one session (or planted from a sibling subdomain) is worthless in another.
describe('CSRF token bound to the session', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi();
  });
  afterAll(() => t.close());

  it("refuses one user's token inside another user's session", async () => {
    const alice = await signInByHand(t, PLAIN);
    const bob = await signInByHand(t, PLAIN);
    expect((await write(t, `${bob.session}; XSRF-TOKEN=${bob.token}`, bob.token)).status).toBe(201);
    const res = await write(t, `${bob.session}; XSRF-TOKEN=${alice.token}`, alice.token);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_failed');
  });

  it("hands out a new token with the sign-in and refuses the visitor's token once signed in", async () => {
    const s = await signInByHand(t, PLAIN);
    expect(s.renewed).toBeDefined();
    expect(s.renewed).not.toBe(s.visitorToken);
    expect((await write(t, `${s.session}; XSRF-TOKEN=${s.visitorToken}`, s.visitorToken)).status).toBe(403);
  });

  it("hands out a visitor's token with the sign-out and refuses the session's token after it", async () => {
    const s = await signInByHand(t, PLAIN);
    const out = await request(t.api).post('/auth/sign-out').set('Cookie', `${s.session}; XSRF-TOKEN=${s.token}`).set('X-XSRF-TOKEN', s.token).send({});
    expect(out.status).toBe(204);
    const visitor = valueOf(setCookie(out, 'XSRF-TOKEN'));
    expect(visitor).toBeDefined();
    const stale = await request(t.api).post('/auth/sign-in').set('Cookie', `XSRF-TOKEN=${s.token}`).set('X-XSRF-TOKEN', s.token).send({});
    expect(stale.status).toBe(403);
    const fresh = await request(t.api).post('/auth/sign-in').set('Cookie', `XSRF-TOKEN=${visitor}`).set('X-XSRF-TOKEN', visitor!).send({});
    expect(fresh.status).toBe(400); // past the token check, stopped by the empty form
  });
});

// RFC 6265bis §4.1.3.2: a browser keeps a `__Host-` cookie only when it is Secure, has Path=/ and no
// Domain, so no other host (a sibling subdomain) can set or overwrite it.
describe('cookies when they are secure', () => {
  let t: TestApi;
  beforeAll(async () => {
    t = await startTestApi({ COOKIE_SECURE: 'true' });
  });
  afterAll(() => t.close());

  it('names the CSRF cookie __Host-XSRF-TOKEN: Secure, Path=/, no Domain', async () => {
    const res = await request(t.api).get('/auth/me');
    const cookie = setCookie(res, '__Host-XSRF-TOKEN');
    expect(cookie).toMatch(/; Secure/i);
    expect(cookie).toMatch(/; Path=\/(;|$)/);
    expect(cookie).not.toMatch(/Domain=/i);
    expect(setCookie(res, 'XSRF-TOKEN')).toBeUndefined();
  });

  it('names the session cookie __Host-baleproof.sid and reads only the prefixed token', async () => {
    const s = await signInByHand(t, { csrf: '__Host-XSRF-TOKEN', session: '__Host-baleproof.sid' });
    expect(s.sessionLine).toMatch(/; Secure/i);
    expect(s.sessionLine).toMatch(/; Path=\/(;|$)/);
    expect(s.sessionLine).not.toMatch(/Domain=/i);
    expect((await write(t, `${s.session}; __Host-XSRF-TOKEN=${s.token}`, s.token)).status).toBe(201);
    // A token planted under the unprefixed name is not read.
    expect((await write(t, `${s.session}; XSRF-TOKEN=${s.token}`, s.token)).status).toBe(403);
  });
});

// Alerts off: other test files approve alfalfa lots and count every alert they cause.
const SEARCH = { name: 'Second-cutting alfalfa', query: { forageType: 'alfalfa' }, alerts: false };
