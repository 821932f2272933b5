import { HttpErrorResponse } from '@angular/common/http';

/** A readable message from the API's error shape `{ error: { code, message, details } }`. */
export function apiErrorMessage(error: unknown, fallback = 'Something went wrong. Please try again.'): string {
  if (error instanceof HttpErrorResponse) {
    const message = (error.error as { error?: { message?: unknown } } | null)?.error?.message;
    if (typeof message === 'string') return message;
    if (error.status === 0) return 'Cannot reach Baleproof. Check your connection and try again.';
  }
  return fallback;
}

/** Field-level messages keyed by path, for showing beside form fields. */
export function apiFieldErrors(error: unknown): Record<string, string> {
  if (!(error instanceof HttpErrorResponse)) return {};
  const details = (error.error as { error?: { details?: unknown } } | null)?.error?.details;
  if (!Array.isArray(details)) return {};
  const out: Record<string, string> = {};
  for (const d of details as { path?: string; message?: string }[]) {
    if (d.path && d.message && !out[d.path]) out[d.path] = d.message;
  }
  return out;
}
