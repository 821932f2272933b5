import { test as base, type Browser, type Page } from '@playwright/test';

export * from '@playwright/test';

/**
 * Playwright's `test`, with pages that wait after every full page load (goto, reload) until the app has
 * hydrated the server-rendered page (`<html data-interactive>`, set by the root component). Typing into a
 * field before hydration would put text in the DOM that its form never sees, as a person typing that
 * early would find too.
 */
export const test = base.extend({
  page: async ({ page }, use) => {
    await use(waitingForTheApp(page));
  },
});

/** A page in a fresh browser context (its own cookies), with the same waiting. */
export async function freshPage(browser: Browser): Promise<Page> {
  return waitingForTheApp(await (await browser.newContext()).newPage());
}

/** Resolves once the app on this page is interactive. */
export async function whenInteractive(page: Page): Promise<void> {
  await page.locator('html[data-interactive]').waitFor({ state: 'attached' });
}

function waitingForTheApp(page: Page): Page {
  const goto = page.goto.bind(page);
  const reload = page.reload.bind(page);
  const settle = async <R extends Awaited<ReturnType<Page['goto']>>>(response: R): Promise<R> => {
    // Only app pages hydrate; a PDF, image or API answer has nothing to wait for.
    if (response?.headers()['content-type']?.startsWith('text/html')) await whenInteractive(page);
    return response;
  };
  page.goto = async (...args) => settle(await goto(...args));
  page.reload = async (...args) => settle(await reload(...args));
  return page;
}
