import { notFound } from './http-error';

/** The largest id a PostgreSQL `integer` (serial) column holds. */
export const PG_INTEGER_MAX = 2_147_483_647;

/**
 * Reads the numeric ids named in a route (`/lots/:id/photos/:photoId`). An id that is not a whole number
 * from 1 to PostgreSQL's integer maximum names nothing that can exist, so the answer is 404 — never a 500
 * from the database refusing an out-of-range value.
 *
 *   const { id, photoId } = idParams(req.params, { id: 'That lot', photoId: 'That photo' });
 */
export function idParams<K extends string>(params: Record<string, string | string[] | undefined>, names: Record<K, string>): Record<K, number> {
  const out = {} as Record<K, number>;
  for (const key of Object.keys(names) as K[]) out[key] = parseId(params[key], names[key]);
  return out;
}

/** One id from a route or query; 404 naming `what` when it cannot be an id. */
export function parseId(raw: unknown, what: string): number {
  const text = typeof raw === 'string' ? raw : '';
  if (!/^[1-9]\d{0,9}$/.test(text)) throw notFound(what);
  const id = Number(text);
  if (id > PG_INTEGER_MAX) throw notFound(what);
  return id;
}
