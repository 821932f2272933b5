import { eq } from 'drizzle-orm';
import request from 'supertest';
import { lots } from '../../db/schema';
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
});
