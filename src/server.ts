import {
  AngularNodeAppEngine,
  createNodeRequestHandler,
  isMainModule,
  writeResponseToNodeResponse,
} from '@angular/ssr/node';
import compression from 'compression';
import expressStaticGzip from 'express-static-gzip';
import express from 'express';
import helmet from 'helmet';
import cluster from 'node:cluster';
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { createApi, createSessionMiddleware } from '../server/api';
import { createAuthenticator } from '../server/features/auth/auth.router';
import { createAppDeps } from '../server/app-deps';
import { listenForCatalogueChanges } from '../server/features/catalogue-cache/catalogue-cache';
import { cachedPages } from '../server/features/catalogue-cache/page-cache';
import { countKeptLotPageView } from '../server/features/lots/lot-views';
import { registerViewMarkPrune, scheduleViewMarkPrune } from '../server/features/lots/view-mark-prune';
import { mediaRouter } from '../server/features/media/media.router';
import { registerOrderSweeps, scheduleOrderSweeps } from '../server/features/orders/order-sweeps';
import { registerSamplingVerdictRefresh, startSamplingVerdictRefresh } from '../server/features/lots/sampling-verdict-refresh';
import { cookiesAreSecure } from '../server/env';
import { createCsrf } from '../server/middleware/csrf';
import { loopbackRenderRequest } from '../server/middleware/render-request';
import { appStartFiles, pageWithPrefetchHints } from '../server/middleware/page-prefetch-hints';
import { pageWaitsForUse } from '@shared/contracts/page-wake';
import { pageErrorHandler } from '../server/middleware/page-error';
import { STATIC_CONTENT_SECURITY_POLICY } from '../server/middleware/page-csp';

const browserDistFolder = join(import.meta.dirname, '../browser');

const deps = createAppDeps();
const app = express();
app.disable('x-powered-by');
const angularApp = new AngularNodeAppEngine();
// What the browser fetches to start the app, hinted on pages that start it only when used (read once from the build).
const startFiles = appStartFiles(browserDistFolder);

// Compressed responses (brotli or gzip, as the browser asks) for pages, API JSON and static files.
app.use(compression());
app.use('/api', createApi(deps));
app.use('/media', mediaRouter(deps.storage));

// Security headers for pages; the API sets its own stricter set. The Content-Security-Policy here allows
// no inline script (static files, error pages); each rendered page replaces it with one that also allows its
// own inline scripts by hash (cachedPages, server/middleware/page-csp.ts).
app.use(helmet({ contentSecurityPolicy: false }), (_req, res, next) => {
  res.setHeader('Content-Security-Policy', STATIC_CONTENT_SECURITY_POLICY);
  next();
});

// Static files: the brotli or gzip copy made at build time (scripts/build/precompress.ts) when the browser
// takes it, else the file itself.
app.use(
  expressStaticGzip(browserDistFolder, {
    enableBrotli: true,
    orderPreference: ['br', 'gzip'],
    index: false,
    serveStatic: { maxAge: '1y', index: false, redirect: false },
  }),
);

// Pages hand out the CSRF cookie too: a server-rendered page may make its first API call a POST. The
// token is bound to the session, so pages (not static files) read the session first.
app.use(createSessionMiddleware(deps), createAuthenticator(deps.db).session(), createCsrf(deps.env.SESSION_SECRET, cookiesAreSecure(deps.env)).issueCookie);

// The renderer sees the page on the app's own loopback port, so its API calls (with the visitor's cookie)
// can never be sent where a Host or X-Forwarded-Host header points.
// A kept lot page still counts its visitor's view (the render's API call would have). A kept page past its
// time is sent while a fresh one renders behind it (server/features/catalogue-cache/page-cache.ts).
app.use(
  cachedPages(
    async (req) => {
      const page = await angularApp.handle(loopbackRenderRequest(req, deps.env.PORT));
      return page && pageWaitsForUse(req.path) ? pageWithPrefetchHints(page, startFiles) : page;
    },
    writeResponseToNodeResponse,
    deps.catalogueCache,
    countKeptLotPageView(deps),
    (err, req) => deps.logger.warn({ err, url: req.originalUrl }, 'kept page: render behind it failed'),
  ),
);
// A friendly page (503 when the database is unreachable) instead of Express's default error output.
app.use(pageErrorHandler(deps.logger));

/**
 * Worker processes: WEB_CONCURRENCY, else every core in production and one process otherwise. Sessions,
 * jobs and cache invalidation go through PostgreSQL, so workers share nothing in memory that matters
 * (sign-in limits are counted in PostgreSQL too).
 */
function workerCount(): number {
  const asked = Number(process.env['WEB_CONCURRENCY']);
  if (Number.isInteger(asked) && asked > 0) return asked;
  return deps.env.NODE_ENV === 'production' ? availableParallelism() : 1;
}

const isEntry = isMainModule(import.meta.url) || process.env['pm_id'];
if (isEntry && cluster.isPrimary && workerCount() > 1) {
  const count = workerCount();
  deps.logger.info(`Baleproof starting ${count} workers`);
  let stopping = false;
  for (let i = 0; i < count; i++) cluster.fork();
  cluster.on('exit', (worker, code) => {
    if (stopping) return;
    deps.logger.error({ pid: worker.process.pid, code }, 'worker exited; starting another');
    cluster.fork();
  });
  const stopAll = () => {
    stopping = true;
    for (const worker of Object.values(cluster.workers ?? {})) worker?.process.kill('SIGTERM');
    setTimeout(() => process.exit(0), 6000).unref();
    cluster.on('exit', () => Object.keys(cluster.workers ?? {}).length === 0 && process.exit(0));
  };
  process.once('SIGTERM', stopAll);
  process.once('SIGINT', stopAll);
} else if (isEntry) {
  const port = deps.env.PORT;
  const stopListening = deps.catalogueCache ? listenForCatalogueChanges(deps.env.DATABASE_URL, deps.catalogueCache, deps.logger) : async () => undefined;
  // The job queue (e-mail outbox, order sweeps, sampling verdicts) creates its tables on first start and works in
  // the background; the cron schedules are stored once and tick however many workers run.
  registerOrderSweeps(deps);
  registerSamplingVerdictRefresh(deps);
  registerViewMarkPrune(deps);
  deps.jobs
    .start()
    .then(() => Promise.all([scheduleOrderSweeps(deps), scheduleViewMarkPrune(deps)]))
    .then(() => startSamplingVerdictRefresh(deps))
    .catch((err) => deps.logger.error({ err }, 'job queue did not start; jobs wait in the database'));
  const server = app.listen(port, '127.0.0.1', (error) => {
    if (error) throw error;
    deps.logger.info(`Baleproof listening on http://127.0.0.1:${port}`);
  });
  const shutdown = (signal: string) => {
    deps.logger.info({ signal }, 'shutting down');
    server.close(() => {
      void stopListening();
      deps.jobs
        .stop()
        .catch((err) => deps.logger.error({ err }, 'job queue did not stop cleanly'))
        .then(() => deps.db.$client.end())
        .finally(() => process.exit(0));
    });
    // Keep-alive sockets would hold close() open; give in-flight requests a moment, then go.
    setTimeout(() => process.exit(0), 5000).unref();
    server.closeIdleConnections();
  };
  process.once('SIGTERM', () => shutdown('SIGTERM'));
  process.once('SIGINT', () => shutdown('SIGINT'));
}

export const reqHandler = createNodeRequestHandler(app);
