import { eq } from 'drizzle-orm';
import express from 'express';
import request from 'supertest';
import { CatalogueCache } from '../catalogue-cache/catalogue-cache';
import { cachedPages } from '../catalogue-cache/page-cache';
import { countKeptLotPageView } from './lot-views';
import { PRUNE_VIEW_MARKS, PRUNE_VIEW_MARKS_CRON, registerViewMarkPrune, scheduleViewMarkPrune } from './view-mark-prune';
import { lots, lotViewMarks } from '../../db/schema';
import { createGrower, createLot } from '../../../tests/support/fixtures';
import { signedInUser } from '../../../tests/support/grower-lot';
import { startTestApi, type TestApi } from '../../../tests/support/test-api';
import { TEST_NOW } from '../../../tests/support/test-clock';
import { plusDays } from '@shared/time/days';

// Browser and crawler user-agent strings as browsers and crawlers send them (their published formats).
const FIREFOX = 'Mozilla/5.0 (X11; Linux x86_64; rv:128.0) Gecko/20100101 Firefox/128.0';
const SAFARI = 'Mozilla/5.0 (iPhone; CPU iPhone OS 17_5 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.5 Mobile/15E148 Safari/604.1';
const CRAWLER = 'Mozilla/5.0 (compatible; Googlebot/2.1; +http://www.google.com/bot.html)';

describe('lot view count', () => {
  let t: TestApi;
  let lotId: number;
  beforeAll(async () => {
    t = await startTestApi();
    const grower = await createGrower(t.deps.db);
    lotId = (await createLot(t.deps.db, grower.farm.id, { title: 'Counted lot' })).id;
  });
  afterAll(async () => {
    t.clock.set(TEST_NOW);
    await t.close();
  });

  const views = async () => (await t.deps.db.select({ n: lots.viewCount }).from(lots).where(eq(lots.id, lotId)))[0]!.n;
  const visit = (agent: string, from?: string) => {
    const req = request(t.api).get(`/lots/${lotId}`).set('User-Agent', agent);
    return from ? req.set('X-Forwarded-For', from) : req;
  };

  it('counts a visitor once a day however often they reload, and never a crawler or a script', async () => {
    const start = await views();
    for (let i = 0; i < 5; i += 1) expect((await visit(FIREFOX)).status).toBe(200);
    expect(await views()).toBe(start + 1);
    // Another browser is another visitor; crawlers and requests without a browser are not counted.
    await visit(SAFARI);
    await visit(SAFARI);
    await visit(CRAWLER);
    await request(t.api).get(`/lots/${lotId}`);
    await visit('curl/8.5.0');
    expect(await views()).toBe(start + 2);
    // The same browser from another address (an RFC 5737 documentation address) is another visitor.
    await visit(FIREFOX, '203.0.113.7');
    await visit(FIREFOX, '203.0.113.7');
    expect(await views()).toBe(start + 3);
    // A signed-in buyer counts once a day too, whatever browser they use.
    const buyer = await signedInUser(t, 'buyer');
    await buyer.agent.raw.get(`/lots/${lotId}`).set('User-Agent', FIREFOX);
    await buyer.agent.raw.get(`/lots/${lotId}`).set('User-Agent', SAFARI);
    expect(await views()).toBe(start + 4);
    // The next day the same visitor counts again.
    t.clock.set(plusDays(new Date(TEST_NOW), 1));
    await visit(FIREFOX);
    await visit(FIREFOX);
    expect(await views()).toBe(start + 5);
  });

  it('counts parallel first visits of one visitor once (the day mark is unique in PostgreSQL)', async () => {
    t.clock.set(plusDays(new Date(TEST_NOW), 5));
    const start = await views();
    const answers = await Promise.all(Array.from({ length: 12 }, () => visit(FIREFOX)));
    expect(answers.every((r) => r.status === 200)).toBe(true);
    expect(await views()).toBe(start + 1);
  });

  it('counts a visitor served a kept lot page (no render, no API call) by the same once-a-day rule', async () => {
    t.clock.set(new Date(Date.parse(TEST_NOW) + 9 * 86_400_000));
    const grower = await createGrower(t.deps.db);
    const paused = (await createLot(t.deps.db, grower.farm.id, { title: 'Not listed', status: 'in_review' })).id;
    const cache = new CatalogueCache(60_000);
    cache.setListening(true);
    // The renderer stands in for Angular's: it renders any lot page once; later visitors get the kept copy.
    const pages = express();
    pages.use(
      cachedPages(
        async () => new Response('<!doctype html><html><body><app-root>Lot</app-root></body></html>', { status: 200, headers: { 'content-type': 'text/html' } }),
        async (response, res) => void res.status(response.status).send(Buffer.from(await response.arrayBuffer())),
        cache,
        countKeptLotPageView(t.deps),
      ),
    );
    const page = (path: string, agent: string) => request(pages).get(path).set('User-Agent', agent);
    const start = await views();
    // The first visit renders (the renderer's API call counts that one); the hits after it are kept copies.
    await page(`/hay/${lotId}`, SAFARI);
    for (let i = 0; i < 3; i += 1) expect((await page(`/hay/${lotId}`, FIREFOX)).status).toBe(200);
    await page(`/hay/${lotId}`, CRAWLER);
    await page(`/hay/${lotId}?sort=price`, FIREFOX);
    await waitForCounting();
    expect(await views()).toBe(start + 1);
    // A lot that is not on sale is not counted, whatever page the visitor was served.
    await page(`/hay/${paused}`, SAFARI);
    await page(`/hay/${paused}`, FIREFOX);
    await waitForCounting();
    expect((await t.deps.db.select({ n: lots.viewCount }).from(lots).where(eq(lots.id, paused)))[0]!.n).toBe(0);
  });

  it('drops view marks of days before yesterday in a daily job, keeping the counts and still counting a visit once today', async () => {
    registerViewMarkPrune(t.deps);
    await scheduleViewMarkPrune(t.deps);
    expect((await t.deps.jobs.schedules()).filter((s) => s.name === PRUNE_VIEW_MARKS.name)).toEqual([{ name: PRUNE_VIEW_MARKS.name, cron: PRUNE_VIEW_MARKS_CRON }]);
    const today = new Date(Date.parse(TEST_NOW) + 20 * 86_400_000);
    const day = (offset: number) => new Date(today.getTime() + offset * 86_400_000).toISOString().slice(0, 10);
    t.clock.set(new Date(today.getTime() - 86_400_000));
    await visit(FIREFOX);
    t.clock.set(today);
    await visit(FIREFOX);
    const before = await views();
    await t.deps.db.insert(lotViewMarks).values([{ lotId, visitor: 'v:old-visitor', day: day(-30) }, { lotId, visitor: 'v:old-visitor', day: day(-2) }]);

    await t.deps.jobs.enqueue(PRUNE_VIEW_MARKS, {});
    expect((await t.drainJobs()).failed).toBe(0);
    const left = (await t.deps.db.select({ day: lotViewMarks.day }).from(lotViewMarks).where(eq(lotViewMarks.lotId, lotId))).map((m) => m.day).sort();
    expect(left.every((d) => d >= day(-1))).toBe(true);
    expect(left).toEqual(expect.arrayContaining([day(-1), day(0)]));
    expect(await views()).toBe(before);
    // Today's mark is kept, so the same visitor is still counted once today.
    await visit(FIREFOX);
    expect(await views()).toBe(before);
  });
});


/** A kept page is sent before its view is counted; give the count a moment to land. */
const waitForCounting = () => new Promise((resolve) => setTimeout(resolve, 300));
