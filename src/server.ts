import {
  AngularNodeAppEngine,
  createNodeRequestHandler,
  isMainModule,
  writeResponseToNodeResponse,
} from '@angular/ssr/node';
import express from 'express';
import helmet from 'helmet';
import { join } from 'node:path';
import { createApi } from '../server/api';
import { createAppDeps } from '../server/app-deps';
import { mediaRouter } from '../server/features/media/media.router';
import { startOrderTimers } from '../server/features/orders/order-timers';
import { cookiesAreSecure } from '../server/env';
import { createCsrf } from '../server/middleware/csrf';

const browserDistFolder = join(import.meta.dirname, '../browser');

const deps = createAppDeps();
const app = express();
app.disable('x-powered-by');
const angularApp = new AngularNodeAppEngine();

app.use('/api', createApi(deps));
app.use('/media', mediaRouter(deps.storage));

// Security headers for pages; the API sets its own stricter set. Angular's inline hydration script
// needs a nonce-based CSP, left for when one is configured.
app.use(helmet({ contentSecurityPolicy: false }));

// Pages hand out the CSRF cookie too: a server-rendered page may make its first API call a POST.
app.use(createCsrf(deps.env.SESSION_SECRET, cookiesAreSecure(deps.env)).issueCookie);

app.use(
  express.static(browserDistFolder, {
    maxAge: '1y',
    index: false,
    redirect: false,
  }),
);

app.use((req, res, next) => {
  angularApp
    .handle(req)
    .then((response) => (response ? writeResponseToNodeResponse(response, res) : next()))
    .catch(next);
});

if (isMainModule(import.meta.url) || process.env['pm_id']) {
  const port = deps.env.PORT;
  // The job queue (e-mail outbox) creates its tables on first start and works in the background.
  deps.jobs.start().catch((err) => deps.logger.error({ err }, 'job queue did not start; jobs wait in the database'));
  const server = app.listen(port, '127.0.0.1', (error) => {
    if (error) throw error;
    deps.logger.info(`Baleproof listening on http://127.0.0.1:${port}`);
  });
  startOrderTimers(deps);
  const shutdown = (signal: string) => {
    deps.logger.info({ signal }, 'shutting down');
    server.close(() => {
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
