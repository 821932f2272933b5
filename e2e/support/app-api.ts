import { expect, type Page } from '@playwright/test';

type Body = Record<string, unknown>;

/** The CSRF token the app's pages set (its cookie name ends in XSRF-TOKEN), fetched once if missing. */
export async function csrfToken(page: Page): Promise<string> {
  const find = async () => (await page.context().cookies()).find((c) => c.name.endsWith('XSRF-TOKEN'))?.value;
  let token = await find();
  if (!token) {
    await page.request.get('/api/auth/me');
    token = await find();
  }
  if (!token) throw new Error('the app set no XSRF-TOKEN cookie');
  return decodeURIComponent(token);
}

/**
 * Calls the API as the page's signed-in user, sending the CSRF header the Angular app sends, and fails
 * with the API's answer unless it succeeds. For setting up a journey's starting point through the app's
 * own API; the steps a journey is about go through the pages.
 */
export async function callApi<T = Body>(page: Page, method: 'GET' | 'POST' | 'PUT', path: string, body?: Body): Promise<T> {
  const headers: Record<string, string> = method === 'GET' ? {} : { 'X-XSRF-TOKEN': await csrfToken(page) };
  const res = await page.request.fetch(path, { method, headers, ...(body ? { data: body } : {}) });
  expect(res.ok(), `${method} ${path} answered ${res.status()}: ${await res.text()}`).toBe(true);
  return (await res.json()) as T;
}
