import { createHash } from 'node:crypto';
import type { Page } from '@playwright/test';
import { BUYER, listedLotIds, signInAs } from './support/accounts';
import { expect, test } from './support/test';

/**
 * Every page carries a Content-Security-Policy whose script-src has no 'unsafe-inline': each inline script
 * the browser would run, and each inline event handler, is allowed by its sha256 hash alone (CSP Level 3
 * §8.3 hash sources; HTML Living Standard §4.12.1.1 for which script types run). The page's scripts are
 * found by the browser's own HTML parser (DOMParser), not by the server's code. The journeys' pages also
 * fail on any CSP violation the browser reports (e2e/support/test.ts), so a blocked script that would stop
 * hydration is caught wherever it happens.
 */
const RUNNABLE = ['', 'text/javascript', 'application/javascript', 'module'];

async function inlineCode(page: Page, html: string): Promise<{ scripts: string[]; handlers: string[]; dataBlocks: number }> {
  return page.evaluate(
    ([source, runnable]) => {
      const doc = new DOMParser().parseFromString(source as string, 'text/html');
      const inline = [...doc.querySelectorAll('script:not([src])')];
      const runs = (s: Element) => (runnable as string[]).includes((s.getAttribute('type') ?? '').trim().toLowerCase());
      const handlers = [...doc.querySelectorAll('*')].flatMap((el) => [...el.attributes].filter((a) => /^on/i.test(a.name)).map((a) => a.value));
      return { scripts: inline.filter(runs).map((s) => s.textContent ?? ''), handlers, dataBlocks: inline.filter((s) => !runs(s)).length };
    },
    [html, RUNNABLE] as const,
  );
}

const hashSource = (code: string) => `'sha256-${createHash('sha256').update(code, 'utf8').digest('base64')}'`;

function directive(policy: string, name: string): string[] {
  const found = policy.split(';').map((d) => d.trim().split(/\s+/)).find(([n]) => n === name);
  return found ? found.slice(1) : [];
}

async function expectHashedPolicy(page: Page, path: string): Promise<void> {
  const response = await page.request.get(path);
  expect(response.status(), path).toBe(200);
  const policy = response.headers()['content-security-policy'] ?? '';
  const scriptSrc = directive(policy, 'script-src');
  expect(scriptSrc, `${path} script-src`).toContain("'self'");
  expect(scriptSrc).not.toContain("'unsafe-inline'");
  expect(scriptSrc).not.toContain("'unsafe-eval'");
  const { scripts, handlers, dataBlocks } = await inlineCode(page, await response.text());
  // Angular's event-replay contract at least, and the transfer state as a JSON data block (not run, not hashed).
  expect(scripts.length, `${path} inline scripts`).toBeGreaterThan(0);
  expect(dataBlocks).toBeGreaterThan(0);
  for (const code of [...scripts, ...handlers]) expect(scriptSrc, `${path}: ${code.slice(0, 60)}`).toContain(hashSource(code));
  expect(directive(policy, 'object-src')).toEqual(["'none'"]);
  expect(directive(policy, 'base-uri')).toEqual(["'self'"]);
  expect(directive(policy, 'frame-ancestors')).toEqual(["'none'"]);
  expect(directive(policy, 'form-action')).toEqual(["'self'"]);
  expect(directive(policy, 'connect-src')).toEqual(["'self'"]);
}

test.describe('content security policy', () => {
  test('the catalogue, a lot page and the sign-in page allow only their own inline scripts, by hash; the same for a kept page', async ({ page }) => {
    const [lotId] = await listedLotIds(page, 1);
    for (const path of ['/hay', `/hay/${lotId}`, '/sign-in']) {
      await expectHashedPolicy(page, path);
      // The second anonymous visit is served from the page cache and keeps its policy.
      await expectHashedPolicy(page, path);
    }
  });

  test('a signed-in page allows only its own inline scripts, by hash, and hydrates without a violation', async ({ page }) => {
    await signInAs(page, BUYER);
    // A signed-in visitor's page is rendered for them alone (never kept).
    await expectHashedPolicy(page, '/hay');
    await page.goto('/orders');
    await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
  });

  test('pages hydrate with no CSP violation: catalogue, lot page, sign-in', async ({ page }) => {
    const [lotId] = await listedLotIds(page, 1);
    for (const path of ['/hay', `/hay/${lotId}`, '/sign-in']) {
      await page.goto(path);
      await expect(page.locator('html[data-interactive]')).toBeAttached();
    }
    // The violation check itself runs after every journey (e2e/support/test.ts).
  });
});
