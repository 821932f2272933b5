import connectPgSimple from 'connect-pg-simple';
import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { ApiDeps } from './api-deps';
import { cookieNames } from '@shared/contracts/cookies';
import { cookiesAreSecure } from './env';
import { authRouter, createAuthenticator } from './features/auth/auth.router';
import { healthRouter } from './features/health/health.router';
import { lotsRouter } from './features/lots/lots.router';
import { keptSearchAnswers } from './features/lots/search-answers';
import { adminRouter } from './features/admin/admin.router';
import { adminPayoutsRouter, growerPayoutsRouter } from './features/payouts/payouts.router';
import { adminClaimsRouter, claimsRouter } from './features/claims/claims.router';
import { forageRouter } from './features/forage/forage.router';
import { farmsRouter } from './features/farms/farms.router';
import { sellingRouter } from './features/selling/selling.router';
import { uploadsRouter } from './features/uploads/uploads.router';
import { reviewRouter } from './features/review/review.router';
import { lotCompareRouter } from './features/lots/lot-compare.router';
import { plannerRouter } from './features/planner/planner.router';
import { savedSearchesRouter } from './features/saved-searches/saved-searches.router';
import { createOrderFeature, deliveryCalendarRouter, ordersRouter, paymentWebhookRouter } from './features/orders/orders.router';
import { messagesRouter } from './features/messages/messages.router';
import { createCsrf } from './middleware/csrf';
import { apiNotFound, errorHandler } from './middleware/error-handler';

/** The session middleware, shared by the API and the server-side renderer (which needs to know the user). */
export function createSessionMiddleware({ env, db }: Pick<ApiDeps, 'env' | 'db'>) {
  const PgStore = connectPgSimple(session);
  return session({
    name: cookieNames(cookiesAreSecure(env)).session,
    secret: env.SESSION_SECRET,
    // Tests open and close many apps on one pool; a prune timer firing after the pool closed would log after
    // the test ended (which fails the Jest run), so expired sessions are pruned only outside tests.
    store: new PgStore({
      pool: db.$client,
      tableName: 'session',
      createTableIfMissing: false,
      pruneSessionInterval: env.NODE_ENV === 'test' ? false : 60 * 15,
    }),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: cookiesAreSecure(env), maxAge: 1000 * 60 * 60 * 24 * 14 },
  });
}

/**
 * The Express app behind /api, testable without listening. Mount it with `app.use('/api', createApi(deps))`.
 */
export function createApi(deps: ApiDeps): Express {
  const { env, db, logger } = deps;
  const api = express();
  api.disable('x-powered-by');
  api.set('trust proxy', 'loopback');
  const securityHeaders = helmet();
  const requestLog = pinoHttp({
    logger,
    autoLogging: { ignore: (req) => req.url === '/health' },
    // Method, path and status are enough; headers (cookies!) and bodies are never logged.
    serializers: {
      req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url }),
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
  });
  // A visitor's repeated catalogue search is answered from kept bytes, with the security headers but before
  // the session store, passport and CSRF (features/lots/search-answers.ts). Answered requests are logged at
  // info; with that level off the request log would write nothing for them, so they are answered before it.
  const keptSearches = keptSearchAnswers(deps.catalogueCache, securityHeaders);
  if (logger.isLevelEnabled('info')) api.use(requestLog, keptSearches);
  else api.use(keptSearches, requestLog);
  api.use(securityHeaders);
  const orderFeature = createOrderFeature(deps);
  // Verified on the raw bytes, so before the JSON parser; the provider holds no CSRF cookie.
  api.use('/payments/webhook', paymentWebhookRouter(orderFeature));
  api.use(express.json({ limit: '200kb' }));
  api.use(createSessionMiddleware(deps));
  api.use(createAuthenticator(db).session());
  const csrf = createCsrf(env.SESSION_SECRET, cookiesAreSecure(env));
  api.use(csrf.requireToken);

  api.use('/health', healthRouter(db));
  api.use('/auth', authRouter(deps, { signInLimit: env.SIGN_IN_RATE_LIMIT, signInIpLimit: env.SIGN_IN_IP_RATE_LIMIT, signUpIpLimit: env.SIGN_UP_IP_RATE_LIMIT, csrf, secureCookies: cookiesAreSecure(env), rateLimitScope: env.RATE_LIMIT_SCOPE }));
  api.use('/lots/compare', lotCompareRouter(db));
  api.use('/lots', lotsRouter(deps));
  api.use('/admin/payouts', adminPayoutsRouter(deps));
  api.use('/admin/claims', adminClaimsRouter(deps));
  api.use('/claims', claimsRouter(deps));
  api.use('/admin', adminRouter(deps));
  api.use('/payouts', growerPayoutsRouter(deps));
  api.use('/forage', forageRouter());
  api.use('/farms', farmsRouter(deps));
  api.use('/selling', sellingRouter(deps));
  api.use('/uploads', uploadsRouter(deps));
  api.use('/review', reviewRouter(deps));
  api.use('/planner', plannerRouter(db));
  api.use('/saved-searches', savedSearchesRouter(db));
  api.use('/orders', ordersRouter(orderFeature));
  api.use('/delivery-calendar', deliveryCalendarRouter(orderFeature));
  api.use('/messages', messagesRouter(deps));

  api.use(apiNotFound);
  api.use(errorHandler(logger));
  return api;
}
