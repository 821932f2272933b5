import { Router, type Request, type RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { SignInSchema, SignUpSchema, type SessionUser } from '@shared/contracts/auth';
import type { Db } from '../../db/client';
import { HttpError } from '../../middleware/http-error';
import { AuthService } from './auth.service';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}

/** Wires passport-local to the users table; the session stores only the user id. */
export function configurePassport(db: Db): void {
  const auth = new AuthService(db);
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      auth.checkCredentials({ email, password }).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: number, done) => {
    auth.findSessionUser(id).then((user) => done(null, user ?? false), done);
  });
}

export function authRouter(db: Db, options: { signInLimit: number; issueCsrfCookie: RequestHandler }): Router {
  const auth = new AuthService(db);
  const router = Router();

  const signInLimiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: options.signInLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // Per address and account, so one attacker cannot lock out everyone behind the same address.
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}:${String(req.body?.email ?? '').toLowerCase()}`,
    handler: (_req, _res, next) =>
      next(new HttpError(429, 'too_many_attempts', 'Too many sign-in attempts. Wait 15 minutes and try again.')),
  });

  // The app's first call: it also hands out the CSRF cookie for API clients that start here.
  router.get('/me', options.issueCsrfCookie, (req, res) => {
    res.json({ user: req.user ?? null });
  });

  router.post('/sign-up', async (req, res) => {
    const input = SignUpSchema.parse(req.body);
    const user = await auth.signUp(input);
    await logIn(req, user);
    res.status(201).json({ user });
  });

  router.post('/sign-in', signInLimiter, async (req, res) => {
    const input = SignInSchema.parse(req.body);
    const user = await auth.checkCredentials(input);
    if (!user) throw new HttpError(401, 'invalid_credentials', 'E-mail or password is wrong.');
    await logIn(req, user);
    res.json({ user });
  });

  router.post('/sign-out', async (req, res) => {
    await new Promise<void>((resolve, reject) => req.logout((err) => (err ? reject(err) : resolve())));
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    res.clearCookie('baleproof.sid', { path: '/' });
    res.status(204).end();
  });

  return router;
}

/** passport 0.7 regenerates the session id on login, which prevents session fixation. */
function logIn(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
}
