import { Router, type Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { cookieNames } from '@shared/contracts/cookies';
import { SignInSchema, SignUpSchema, VerifyEmailSchema, type SessionUser, type SignUpAnswer } from '@shared/contracts/auth';
import type { ApiDeps } from '../../api-deps';
import type { Db } from '../../db/client';
import { PgRateLimitStore } from '../../middleware/pg-rate-limit-store';
import type { Csrf } from '../../middleware/csrf';
import { conflict, HttpError } from '../../middleware/http-error';
import { requireSignedIn } from '../../middleware/require-role';
import { AuthService } from './auth.service';
import { EmailVerification } from './email-verification';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}

/**
 * Wires passport-local to the users table; the session stores only the user id. One authenticator per API,
 * not passport's global one: a second API in the same process (tests) would otherwise read sessions
 * through the first API's database pool.
 */
export function createAuthenticator(db: Db) {
  const auth = new AuthService(db);
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      auth.checkCredentials({ email, password }).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: number, done) => {
    auth.findSessionUser(id).then((user) => done(null, user ?? false), done);
  });
  return passport;
}

/** Confirmation links a signed-in user may ask for again per hour (each is an e-mail to the address). */
export const CONFIRMATION_RESENDS_PER_HOUR = 3;

export function authRouter(
  deps: Pick<ApiDeps, 'db' | 'jobs' | 'env' | 'clock'>,
  options: { signInLimit: number; signInIpLimit: number; signUpIpLimit: number; csrf: Pick<Csrf, 'issueCookie' | 'renew'>; secureCookies: boolean; rateLimitScope: string },
): Router {
  const { db } = deps;
  const auth = new AuthService(db);
  const verification = new EmailVerification(deps);
  const router = Router();
  const clock = deps.clock;

  // Two limits on failed sign-ins (successes are not counted): per account, keyed on the e-mail as the
  // sign-in form normalises it (so " Name@X" is the same account), and per client address, so one
  // password tried across many accounts is limited too. Counts live in PostgreSQL, shared by every server
  // process. Each attempt is counted first (one atomic upsert, so parallel attempts cannot slip through);
  // a successful sign-in takes its count back before it answers.
  const failedSignIns = (limit: number, store: PgRateLimitStore, keyGenerator: (req: Request) => string) =>
    rateLimit({
      store,
      windowMs: 15 * 60 * 1000,
      limit,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      keyGenerator,
      handler: (_req, _res, next) => next(new HttpError(429, 'too_many_attempts', 'Too many sign-in attempts. Wait 15 minutes and try again.')),
    });
  const accountKey = (req: Request) => `account:${normalisedEmail(req.body?.email)}`;
  const addressKey = (req: Request) => `ip:${ipKeyGenerator(req.ip ?? '')}`;
  const accountCounts = new PgRateLimitStore(db, clock, `${options.rateLimitScope}sign-in:`);
  const addressCounts = new PgRateLimitStore(db, clock, `${options.rateLimitScope}sign-in-ip:`);
  const perAccount = failedSignIns(options.signInLimit, accountCounts, accountKey);
  const perAddress = failedSignIns(options.signInIpLimit, addressCounts, addressKey);
  // New accounts per client address per hour, so one address cannot create accounts (or probe e-mails) in bulk.
  const signUpsPerAddress = rateLimit({
    store: new PgRateLimitStore(db, clock, `${options.rateLimitScope}sign-up-ip:`),
    windowMs: 60 * 60 * 1000,
    limit: options.signUpIpLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: addressKey,
    handler: (_req, _res, next) => next(new HttpError(429, 'too_many_sign_ups', 'Too many new accounts from this network. Wait an hour and try again.')),
  });
  const forgiveAttempt = (req: Request) => Promise.all([accountCounts.decrement(accountKey(req)), addressCounts.decrement(addressKey(req))]);

  // The app's first call: it also hands out the CSRF cookie for API clients that start here.
  router.get('/me', options.csrf.issueCookie, (req, res) => {
    res.json({ user: req.user ?? null });
  });

  // A new address gets an account, a session and a confirmation link; an address that already has an
  // account gets no session, and its owner a warning e-mail. Both answer the same status and body.
  router.post('/sign-up', signUpsPerAddress, async (req, res) => {
    const input = SignUpSchema.parse(req.body);
    const user = await auth.signUp(input);
    if (user) {
      await verification.sendLink(user);
      await logIn(req, user);
    } else {
      await verification.warnOwner(input.email);
    }
    options.csrf.renew(req, res);
    const answer: SignUpAnswer = { email: input.email, message: `We sent a message to ${input.email}. Open the link in it to confirm your address.` };
    res.status(201).json(answer);
  });

  // Opening the link from the e-mail; it works signed in or not (the token names the account).
  router.post('/confirm-email', async (req, res) => {
    const { token } = VerifyEmailSchema.parse(req.body);
    res.json(await verification.confirm(token));
  });

  const resendsPerUser = rateLimit({
    store: new PgRateLimitStore(db, clock, `${options.rateLimitScope}confirmation-link:`),
    windowMs: 60 * 60 * 1000,
    limit: CONFIRMATION_RESENDS_PER_HOUR,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `user:${req.user?.id ?? 0}`,
    handler: (_req, _res, next) => next(new HttpError(429, 'too_many_links', 'We already sent several links this hour. Look for them in your e-mail (and its spam folder), or wait an hour.')),
  });

  // Sends the signed-in user a new confirmation link.
  router.post('/confirmation-link', requireSignedIn, resendsPerUser, async (req, res) => {
    const user = req.user!;
    if (user.emailVerified) throw conflict('already_confirmed', `${user.email} is already confirmed.`);
    await verification.sendLink(user);
    res.status(202).json({ email: user.email, message: `We sent a new link to ${user.email}.` });
  });

  router.post('/sign-in', perAddress, perAccount, async (req, res) => {
    const input = SignInSchema.parse(req.body);
    const user = await auth.checkCredentials(input);
    if (!user) throw new HttpError(401, 'invalid_credentials', 'E-mail or password is wrong.');
    await forgiveAttempt(req);
    await logIn(req, user);
    options.csrf.renew(req, res);
    res.json({ user });
  });

  router.post('/sign-out', async (req, res) => {
    await new Promise<void>((resolve, reject) => req.logout((err) => (err ? reject(err) : resolve())));
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    // A `__Host-` cookie is only replaced by a Set-Cookie with the same Secure and Path attributes.
    res.clearCookie(cookieNames(options.secureCookies).session, { path: '/', secure: options.secureCookies, httpOnly: true, sameSite: 'lax' });
    options.csrf.renew(req, res);
    res.status(204).end();
  });

  return router;
}

/** The account an attempt is about, normalised as SignInSchema does (trim, lower case). */
function normalisedEmail(value: unknown): string {
  return typeof value === 'string' ? value.trim().toLowerCase() : '';
}

/** passport 0.7 regenerates the session id on login, which prevents session fixation. */
function logIn(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
}
