/** An error with an HTTP status and a stable machine-readable code, safe to show to the client. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export const notFound = (what: string) => new HttpError(404, 'not_found', `${what} was not found.`);
export const forbidden = (message = 'You do not have permission to do that.') => new HttpError(403, 'forbidden', message);
export const unauthenticated = () => new HttpError(401, 'unauthenticated', 'Please sign in first.');
export const conflict = (code: string, message: string) => new HttpError(409, code, message);
