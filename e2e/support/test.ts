import { test as base, expect, type Browser, type Page } from '@playwright/test';
import { stackUrl } from './stack';

export * from '@playwright/test';

/**
 * Playwright's `test`, on this worker's copy of the app, with pages that wait after every full page load (goto, reload) until the app has
 * hydrated the server-rendered page (`<html data-interactive>`, set by the root component). Typing into a
 * field before hydration would put text in the DOM that its form never sees, as a person typing that
 * early would find too. A page that starts its app only when used (the catalogue, shared/contracts/page-wake.ts)
 * is first shown a sign of use, the mouse moving over it, as a person would; journeys about what happens
 * before the app runs open their pages without this waiting (a context of their own).
 */
export const test = base.extend<{ cspViolations: string[] }>({
  // Each worker talks to its own copy of the app (e2e/support/stack.ts); every page, context and request
  // of a journey, including contexts opened by hand, takes its address from here.
  baseURL: async ({ baseURL }, use) => {
    await use(baseURL ? stackUrl(baseURL) : baseURL);
  },
  // Every journey fails if the browser reports a Content-Security-Policy violation on any of its pages: a
  // blocked inline script stops hydration, which a journey might otherwise only notice as a slow page.
  cspViolations: [
    async ({}, use) => {
      violations.length = 0;
      await use(violations);
      expect(violations, 'Content-Security-Policy violations').toEqual([]);
    },
    { auto: true },
  ],
  page: async ({ page }, use) => {
    await use(await waitingForTheApp(page));
  },
});

/** A page in a fresh browser context (its own cookies), with the same waiting. */
export async function freshPage(browser: Browser): Promise<Page> {
  return waitingForTheApp(await (await browser.newContext()).newPage());
}

/** CSP violations reported by the current journey's pages (the browser's console message, or the DOM event). */
const violations: string[] = [];

async function watchingForCspViolations(page: Page): Promise<void> {
  page.on('console', (message) => {
    if (/Content Security Policy/i.test(message.text())) violations.push(`${page.url()}: ${message.text()}`);
  });
  await page.addInitScript(() =>
    document.addEventListener('securitypolicyviolation', (e) => console.error(`Content Security Policy violation: ${e.violatedDirective} blocked ${e.blockedURI || 'inline'} (${e.sample})`)),
  );
}

/** Resolves once the app on this page is interactive. */
export async function whenInteractive(page: Page): Promise<void> {
  await page.locator('html[data-interactive]').waitFor({ state: 'attached' });
}

/** Moves the mouse over the page (a sign of use that clicks nothing), to a spot it was not on, so the browser reports a move. */
async function showSignOfUse(page: Page, at: { x: number }): Promise<void> {
  at.x = at.x === 1 ? 2 : 1;
  await page.mouse.move(at.x, 1);
}

async function waitingForTheApp(page: Page): Promise<Page> {
  await watchingForCspViolations(page);
  const goto = page.goto.bind(page);
  const reload = page.reload.bind(page);
  const mouse = { x: 0 };
  const settle = async <R extends Awaited<ReturnType<Page['goto']>>>(response: R): Promise<R> => {
    // Only app pages hydrate; a PDF, image or API answer has nothing to wait for.
    if (response?.headers()['content-type']?.startsWith('text/html')) {
      await showSignOfUse(page, mouse);
      await whenInteractive(page);
    }
    return response;
  };
  page.goto = async (...args) => settle(await goto(...args));
  page.reload = async (...args) => settle(await reload(...args));
  return page;
}
