import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { TransitionRefused } from '@shared/lifecycle/state-machine';
import type { Logger } from '../logger';
import { HttpError } from './http-error';

/** The one error shape of the API: `{ error: { code, message, details } }`. */
export interface ApiErrorBody {
  error: { code: string; message: string; details?: unknown };
}

export const apiNotFound: RequestHandler = (req, _res, next) =>
  next(new HttpError(404, 'not_found', `No API route for ${req.method} ${req.path}.`));

export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const body = (status: number, code: string, message: string, details?: unknown) =>
      res.status(status).json({ error: { code, message, ...(details === undefined ? {} : { details }) } } satisfies ApiErrorBody);

    if (err instanceof ZodError) {
      const details = err.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
      const first = details[0];
      return body(400, 'invalid_input', first ? `${first.path || 'input'}: ${first.message}` : 'Invalid input.', details);
    }
    if (err instanceof HttpError) return body(err.status, err.code, err.message, err.details);
    // A life-cycle step refused: not possible in this state (409) or not this user's to take (403).
    if (err instanceof TransitionRefused) return body(err.reason === 'not_allowed' ? 403 : 409, err.code, err.message);
    // body-parser errors (malformed JSON, too large) carry a status and a type.
    if (typeof err?.status === 'number' && err.status >= 400 && err.status < 500) {
      const code = err.type === 'entity.parse.failed' ? 'malformed_json' : String(err.type ?? 'bad_request').replace(/\W+/g, '_');
      const message = err.type === 'entity.parse.failed' ? 'The request body is not valid JSON.' : err.expose ? err.message : 'Bad request.';
      return body(err.status, code, message);
    }
    // Constraint violations that slipped past validation: report them as bad input, not a crash.
    // Drizzle wraps driver errors; the PostgreSQL error is its cause.
    const pgError = err?.cause?.code ? err.cause : err;
    if (pgError?.code === '23514' || pgError?.code === '23503' || pgError?.code === '22P02') {
      return body(400, 'constraint_violation', 'The request breaks a data rule.', { constraint: pgError.constraint });
    }
    // Values PostgreSQL cannot hold (a NUL byte; a number beyond its column) are bad input too.
    if (pgError?.code === '22021' || pgError?.code === '22P05') return body(400, 'invalid_text', 'The request holds characters that cannot be stored (such as a NUL byte).');
    if (pgError?.code === '22003') return body(400, 'number_out_of_range', 'A number in the request is too large.');
    if (pgError?.code === '22001') return body(400, 'text_too_long', 'A text in the request is too long.');
    if (pgError?.code === '23505') return body(409, 'duplicate', 'That already exists.', { constraint: pgError.constraint });
    if (databaseUnreachable(err)) {
      (req as { log?: Logger }).log?.error({ err }, 'database unreachable') ?? logger.error({ err }, 'database unreachable');
      res.setHeader('Retry-After', '30');
      return body(503, 'database_unavailable', 'Baleproof cannot reach its database right now. Please try again in a minute.');
    }
    (req as { log?: Logger }).log?.error({ err }, 'unhandled error') ?? logger.error({ err }, 'unhandled error');
    return body(500, 'internal', 'Something went wrong on our side. Please try again.');
  };
}

/** Socket errors and PostgreSQL's "cannot connect now" / shutdown / connection-exception codes, on the error or its causes. */
const UNREACHABLE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'ENOTFOUND', 'EHOSTUNREACH', '57P01', '57P02', '57P03', '08000', '08001', '08003', '08006']);

export function databaseUnreachable(err: unknown): boolean {
  for (let e = err as { code?: unknown; cause?: unknown; message?: unknown; errors?: unknown[] } | undefined, depth = 0; e && depth < 5; e = e.cause as typeof e, depth++) {
    if (typeof e.code === 'string' && UNREACHABLE_CODES.has(e.code)) return true;
    if (Array.isArray(e.errors) && e.errors.some((inner) => databaseUnreachable(inner))) return true;
    if (typeof e.message === 'string' && /Connection terminated|timeout exceeded when trying to connect/i.test(e.message)) return true;
  }
  return false;
}
