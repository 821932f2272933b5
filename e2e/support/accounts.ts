import { expect, type Browser, type Page } from '@playwright/test';
import { freshPage } from './test';

// Demo accounts from the seed (README lists them).
export const GROWER = { email: 'grower@demo.baleproof.example', password: 'demo-grower-pass' };
export const BUYER = { email: 'buyer@demo.baleproof.example', password: 'demo-buyer-pass' };
export const ADMIN = { email: 'admin@baleproof.example', password: 'admin-demo-pass' };

export async function signInAs(page: Page, account: { email: string; password: string }): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(account.email);
  await page.getByLabel('Password').fill(account.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).not.toHaveURL(/\/sign-in/);
}

/** Ids of the first listed lots, from the API. */
export async function listedLotIds(page: Page, count: number): Promise<number[]> {
  const res = await page.request.get(`/api/lots?pageSize=${count}`);
  expect(res.ok()).toBe(true);
  return ((await res.json()) as { items: { id: number }[] }).items.map((i) => i.id);
}

/** A grower, a buyer and an admin, each signed in on a page of their own (own cookies). */
export async function threeRoles(browser: Browser): Promise<{ grower: Page; buyer: Page; admin: Page }> {
  const [grower, buyer, admin] = [await freshPage(browser), await freshPage(browser), await freshPage(browser)];
  await signInAs(grower, GROWER);
  await signInAs(buyer, BUYER);
  await signInAs(admin, ADMIN);
  return { grower, buyer, admin };
}

/** US dollars as a US reader sees them, formatted by the runtime (not by the app's own money code). */
export const usd = (cents: number) => new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(cents / 100);
