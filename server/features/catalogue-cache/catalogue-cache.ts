import pg from 'pg';
import type { Logger } from '../../logger';
import type { KeptAnswer } from './kept-answer';
import { ShortCache } from './short-cache';

/**
 * Short-lived caches of what every visitor sees the same: catalogue search results and anonymous
 * server-rendered pages. Emptied whenever the database announces a catalogue change (the
 * `catalogue_changed` notice sent by triggers when a lot, analysis, sampling record, photo or farm
 * changes commits), so a change shows at once; the time limit only bounds a missed notice.
 */
export class CatalogueCache {
  /** Search answers (JSON bytes, ETag, compressed copies) by normalised query. */
  readonly searches: ShortCache<KeptAnswer>;
  /** Anonymous server-rendered pages by locale and URL. */
  readonly pages: ShortCache<KeptAnswer>;

  /**
   * A kept page past its time is still sent for up to `pageStaleMs` while a fresh one renders behind it, so no
   * visitor waits for a render of a page that was kept (a change still empties the cache at once).
   */
  constructor(ttlMs: number, now: () => number = Date.now, pageStaleMs = 60_000) {
    this.searches = new ShortCache(ttlMs, 1000, now);
    this.pages = new ShortCache(ttlMs, 300, now, pageStaleMs);
    this.setListening(false);
  }

  clear(): void {
    this.searches.clear();
    this.pages.clear();
  }

  /** Serve from the cache only while change notices arrive. */
  setListening(listening: boolean): void {
    this.clear();
    this.searches.enabled = listening;
    this.pages.enabled = listening;
  }
}

/**
 * Listens for `catalogue_changed` on its own connection and empties the cache on each notice. If the
 * connection drops, the cache is emptied (a notice may have been missed) and the listener reconnects.
 * Returns a function that stops listening.
 */
export function listenForCatalogueChanges(databaseUrl: string, cache: CatalogueCache, logger: Logger): () => Promise<void> {
  let client: pg.Client | null = null;
  let stopped = false;
  const connect = async (): Promise<void> => {
    if (stopped) return;
    const c = new pg.Client({ connectionString: databaseUrl });
    c.on('notification', () => cache.clear());
    c.on('error', (err) => {
      logger.warn({ err }, 'catalogue change listener lost its connection; reconnecting');
      cache.setListening(false);
      client = null;
      c.end().catch(() => undefined);
      setTimeout(() => void connect(), 1000).unref();
    });
    try {
      await c.connect();
      await c.query('LISTEN catalogue_changed');
      client = c;
      cache.setListening(true);
    } catch (err) {
      logger.warn({ err }, 'catalogue change listener could not connect; retrying');
      c.end().catch(() => undefined);
      setTimeout(() => void connect(), 1000).unref();
    }
  };
  void connect();
  return async () => {
    stopped = true;
    cache.setListening(false);
    await client?.end();
  };
}
