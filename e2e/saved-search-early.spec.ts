import { expect, test } from './support/test';
import { BUYER, signInAs } from './support/accounts';

// The catalogue's layout stays as the server sent it until touched (it hydrates on interaction). A buyer who names
// a search and presses "Save and alert me" before it wakes must not lose the search: the server's form would go
// natively (GET /hay?name=…), dropping the filters from the address. Here the code that wakes the catalogue is
// held back two seconds, so the press always comes first.
test('a search saved before the catalogue wakes is saved, with its name and filters', async ({ page }) => {
  await signInAs(page, BUYER);
  let holdBack = false;
  await page.route(/\/chunk-[\w-]+\.js$/, async (route) => {
    if (holdBack) await new Promise((r) => setTimeout(r, 2_000));
    await route.continue();
  });
  const field = `Willow Flat ${Date.now().toString(36)}`;
  await page.goto(`/hay?q=${encodeURIComponent(field)}`);
  holdBack = true;

  await page.getByLabel('Name this search').fill(`Hay from ${field}`);
  await page.getByRole('button', { name: 'Save and alert me' }).click();
  await expect(page.getByRole('status').filter({ hasText: `Saved “Hay from ${field}”` })).toBeVisible();
  expect(new URL(page.url()).searchParams.get('q')).toBe(field);
  expect(new URL(page.url()).searchParams.has('name')).toBe(false);

  const { items: saved } = (await (await page.request.get('/api/saved-searches')).json()) as { items: { name: string; query: Record<string, string> }[] };
  expect(saved.find((s) => s.name === `Hay from ${field}`)?.query).toEqual({ q: field });
});
