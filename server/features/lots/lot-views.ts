import { createHmac } from 'node:crypto';
import type { Request } from 'express';
import { sql } from 'drizzle-orm';
import type { ApiDeps } from '../../api-deps';
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

/**
 * Counts one view of a listed lot per visitor per day (UTC): the day's mark and the count change in one
 * statement. A lot not on sale gets no mark and no view.
 */
export async function countLotView(db: Db, lotId: number, visitor: string, now: Date): Promise<boolean> {
  const day = now.toISOString().slice(0, 10);
  const counted = await db.execute(sql`
    with mark as (
      insert into lot_view_marks (lot_id, visitor, day)
      select id, ${visitor}, ${day} from lots where id = ${lotId} and status = 'listed'
      on conflict do nothing returning lot_id
    )
    update lots set view_count = view_count + 1 where id in (select lot_id from mark) returning id`);
  return counted.rows.length > 0;
}

/** A lot page's path (`/hay/42`, any query) as the app routes it. */
const LOT_PAGE_PATH = /^\/hay\/([1-9]\d{0,9})(?:[?#]|$)/;

/**
 * Counts the view of a lot page served from the page cache: no render and no API call happen then, so the
 * count is taken here with the same rule (a visitor's key, once a day, robots not). Kept pages are only
 * anonymous visitors' pages. The page goes out first; a failed count is logged, never the visitor's problem.
 */
export function countKeptLotPageView({ db, clock, env, logger }: Pick<ApiDeps, 'db' | 'clock' | 'env' | 'logger'>) {
  return (req: Request): void => {
    const id = Number(LOT_PAGE_PATH.exec(req.originalUrl)?.[1]);
    const visitor = visitorKey(req, env.SESSION_SECRET);
    if (!visitor || !Number.isSafeInteger(id) || id > 2_147_483_647) return;
    countLotView(db, id, visitor, clock.now()).catch((err) => logger.warn({ err, lotId: id }, 'kept lot page: view not counted'));
  };
}
