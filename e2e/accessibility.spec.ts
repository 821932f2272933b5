import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from './support/test';
import { ADMIN, BUYER, GROWER, listedLotIds, signInAs } from './support/accounts';
import { demoOrderWithMessage, type DemoOrder } from './support/demo-order';

/**
 * axe-core as an outside judge of every main page: no violation rated serious or critical (WCAG 2.1 A/AA rules).
 * Run at desktop and phone widths, since the phone top bar is laid out differently.
 */
async function expectNoSeriousViolations(page: Page, path: string): Promise<void> {
  // Every page judged here exists: it must answer 200, not the catch-all's 404 behind a page that still shows.
  const response = await page.goto(path, { waitUntil: 'load' });
  expect(response?.status(), path).toBe(200);
  await expect(page.locator('main h1').first()).toBeVisible();
  const result = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  const serious = result.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(' | ')}`);
  expect(serious, path).toEqual([]);
}

/** A page to judge; `order` pages need the shared demo order (made on first use). */
const PAGES: { who: string; account?: { email: string; password: string }; order?: true; path: (ids: number[], order: DemoOrder) => string }[] = [
  { who: 'visitor', path: () => '/' },
  { who: 'visitor', path: () => '/hay' },
  { who: 'visitor', path: ([a]) => `/hay/${a}` },
  { who: 'visitor', path: ([a, b]) => `/hay/compare?ids=${a},${b}` },
  { who: 'visitor', path: () => '/planner' },
  { who: 'visitor', path: () => '/cart' },
  { who: 'visitor', path: () => '/sign-in' },
  { who: 'visitor', path: () => '/sign-up' },
  { who: 'visitor', path: () => '/confirm-email?token=not-a-token' },
  { who: 'buyer', account: BUYER, path: ([a]) => `/hay/${a}` },
  { who: 'grower', account: GROWER, path: () => '/selling' },
  { who: 'grower', account: GROWER, path: () => '/selling/lots/new' },
  { who: 'grower', account: GROWER, path: () => '/selling/farm' },
  { who: 'admin', account: ADMIN, path: () => '/admin' },
  { who: 'buyer', account: BUYER, path: () => '/orders' },
  { who: 'buyer', account: BUYER, order: true, path: (_, o) => `/orders/${o.orderId}` },
  { who: 'buyer', account: BUYER, order: true, path: (_, o) => `/messages/${o.threadId}` },
  { who: 'grower', account: GROWER, path: () => '/orders' },
  { who: 'grower', account: GROWER, order: true, path: (_, o) => `/orders/${o.orderId}` },
  { who: 'grower', account: GROWER, path: () => '/selling/calendar' },
  { who: 'grower', account: GROWER, path: () => '/messages' },
  { who: 'admin', account: ADMIN, path: () => '/admin/claims' },
];

// Each page is judged on its own, so the pages spread over the workers.
test.describe.configure({ mode: 'parallel' });

for (const viewport of [{ width: 1366, height: 900 }, { width: 390, height: 844 }]) {
  test.describe(`axe-core at ${viewport.width} px`, () => {
    test.use({ viewport });
    for (const p of PAGES) {
      test(`${p.who}: ${p.path([1, 2], { orderId: 1, threadId: 1 }).replace(/\d+/g, ':id')}`, async ({ page, browser }) => {
        test.setTimeout(180_000);
        const ids = await listedLotIds(page, 2);
        const order = p.order ? await demoOrderWithMessage(browser) : { orderId: 0, threadId: 0 };
        if (p.account) await signInAs(page, p.account);
        await expectNoSeriousViolations(page, p.path(ids, order));
      });
    }
  });
}
