import { expect, type Page } from '@playwright/test';

export interface ListedLot {
  id: number;
  title: string;
  farmName: string;
}

/** Listed lots sold for pickup with bales to spare, from different farms first (read from the API). */
export async function lotsForTheList(page: Page, count: number): Promise<ListedLot[]> {
  const res = await page.request.get('/api/lots?pageSize=48');
  expect(res.ok()).toBe(true);
  const found: ListedLot[] = [];
  for (const { id } of ((await res.json()) as { items: { id: number }[] }).items) {
    const lot = await (await page.request.get(`/api/lots/${id}`)).json();
    if (!lot.pickupAllowed || lot.balesAvailable < 200) continue;
    found.push({ id, title: lot.title, farmName: lot.farm.name });
    if (found.length >= 12) break;
  }
  const seen = new Set<string>();
  const firstPerFarm = found.filter((l) => !seen.has(l.farmName) && seen.add(l.farmName));
  const chosen = [...firstPerFarm, ...found.filter((l) => !firstPerFarm.includes(l))].slice(0, count);
  expect(chosen, `${count} listed lots sold for pickup`).toHaveLength(count);
  return chosen;
}

/** Puts each lot on the hay list from its lot page, at the buy panel's starting quantity. */
export async function putOnHayList(page: Page, lots: readonly ListedLot[]): Promise<void> {
  for (const lot of lots) {
    await page.goto(`/hay/${lot.id}`);
    const panel = page.getByRole('region', { name: 'Buy a load' });
    await panel.getByLabel('Pickup at the farm').check();
    await expect(panel.getByText('Total')).toBeVisible();
    await panel.getByRole('button', { name: 'Put on my hay list' }).click();
    await expect(panel.getByRole('status')).toContainText('On your hay list');
  }
}
