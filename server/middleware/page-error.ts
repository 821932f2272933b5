import type { ErrorRequestHandler } from 'express';
import type { Logger } from '../logger';
import { databaseUnreachable } from './error-handler';

/** A page that stands alone (no scripts, styles inline, nothing from the database) for when pages cannot be served. */
function errorPage(title: string, message: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${title} · Baleproof</title>
<style>body{font-family:system-ui,sans-serif;max-width:36rem;margin:4rem auto;padding:0 1rem;color:#2b2b25;line-height:1.5}h1{font-size:1.5rem}a{color:#3d6b2a}</style>
</head><body><main><h1>${title}</h1><p>${message}</p><p><a href="">Try again</a></p></main></body></html>`;
}

/**
 * The last handler for pages: a friendly page instead of Express's default (a stack trace outside production).
 * With the database unreachable it is 503 with Retry-After, saying so; anything else is 500 and logged.
 */
export function pageErrorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) return next(err);
    res.setHeader('Content-Type', 'text/html; charset=utf-8');
    res.setHeader('Cache-Control', 'no-store');
    if (databaseUnreachable(err)) {
      logger.error({ err, url: req.originalUrl }, 'page: database unreachable');
      res.setHeader('Retry-After', '30');
      return void res.status(503).send(errorPage('Baleproof is briefly unavailable', 'We cannot reach our database right now, so this page cannot be shown. Your account, orders and listings are safe. Please try again in a minute.'));
    }
    logger.error({ err, url: req.originalUrl }, 'page: unhandled error');
    res.status(500).send(errorPage('Something went wrong', 'This page could not be shown because of a fault on our side. Please try again; if it keeps happening, tell us what you were doing.'));
  };
}
