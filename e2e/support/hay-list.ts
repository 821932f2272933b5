import { expect, type Page } from '@playwright/test';

export interface ListedLot {
  id: number;
  title: string;
  farmName: string;
}

/** Up to `most` listed lots sold for pickup with bales to spare (read from the API). */
async function pickupLots(page: Page, most: number): Promise<ListedLot[]> {
  const res = await page.request.get('/api/lots?pageSize=48');
  expect(res.ok()).toBe(true);
  const found: ListedLot[] = [];
  for (const { id } of ((await res.json()) as { items: { id: number }[] }).items) {
    const lot = await (await page.request.get(`/api/lots/${id}`)).json();
    if (!lot.pickupAllowed || lot.balesAvailable < 200) continue;
    found.push({ id, title: lot.title, farmName: lot.farm.name });
    if (found.length >= most) break;
  }
  return found;
}

/** Listed lots sold for pickup with bales to spare, from different farms first. */
export async function lotsForTheList(page: Page, count: number): Promise<ListedLot[]> {
  const found = await pickupLots(page, 12);
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

/** Two lots of one grower and one lot of another: the list that makes two orders, one with two lines. */
export async function lotsFromTwoGrowers(page: Page): Promise<[ListedLot, ListedLot, ListedLot]> {
  const found = await pickupLots(page, 48);
  const pair = found.filter((l) => found.filter((m) => m.farmName === l.farmName).length >= 2);
  const first = pair[0];
  expect(first, 'a grower with two listed lots sold for pickup').toBeDefined();
  const second = pair.find((l) => l !== first && l.farmName === first!.farmName)!;
  const other = found.find((l) => l.farmName !== first!.farmName);
  expect(other, 'a lot of another grower').toBeDefined();
  return [first!, second, other!];
}
