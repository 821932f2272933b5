import { createHmac } from 'node:crypto';
import type { Request } from 'express';
import { sql } from 'drizzle-orm';
import type { Db } from '../../db/client';

/** User agents of crawlers, link previewers and scripts (common practice: these words name them); their reads are not views. */
const NOT_A_PERSON = /bot\b|bot\/|crawl|spider|slurp|preview|facebookexternalhit|embedly|curl\/|wget\/|python-|go-http-client|java\/|okhttp|axios\/|node-fetch|undici|headless|lighthouse|pingdom|uptime/i;

/**
 * Who is viewing, as an opaque key: the signed-in user's id, or for a visitor an HMAC of address and browser
 * (so no raw address is stored). Null for a robot or a request without a browser, whose reads are not counted.
 */
export function visitorKey(req: Pick<Request, 'ip' | 'headers'> & { user?: Express.User }, secret: string): string | null {
  if (req.user) return `u:${req.user.id}`;
  const agent = req.headers['user-agent'] ?? '';
  if (!agent || NOT_A_PERSON.test(agent)) return null;
  return `v:${createHmac('sha256', secret).update(`${req.ip ?? ''}\n${agent}`).digest('base64url').slice(0, 32)}`;
}

/** Counts one view of a lot per visitor per day (UTC): the day's mark and the count change in one statement. */
export async function countLotView(db: Db, lotId: number, visitor: string, now: Date): Promise<boolean> {
  const day = now.toISOString().slice(0, 10);
  const counted = await db.execute(sql`
    with mark as (
      insert into lot_view_marks (lot_id, visitor, day) values (${lotId}, ${visitor}, ${day})
      on conflict do nothing returning lot_id
    )
    update lots set view_count = view_count + 1 where id in (select lot_id from mark) returning id`);
  return counted.rows.length > 0;
}
