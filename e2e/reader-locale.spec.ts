import { expect, test } from './support/test';
import { listedLotIds } from './support/accounts';

/**
 * Dates and money follow the reader's language (Accept-Language on the server, navigator.languages in the
 * browser). The expected text comes from the runtime's own Intl formatting (ECMA-402 with CLDR data), not
 * from the app's formatters: a Canadian French reader sees "1 juin 2026" and "400 $ US", never
 * "2026-06-01" or "$400".
 */
const spaced = (s: string) => s.replace(/\s+/gu, ' ');

for (const locale of ['fr-CA', 'en-GB']) {
  test.describe(`a reader in ${locale}`, () => {
    test.use({ locale });

    test('sees a lot’s harvest dates and price in their own formats', async ({ page }) => {
      const [id] = await listedLotIds(page, 1);
      const lot = (await (await page.request.get(`/api/lots/${id}`)).json()) as { harvestStartedOn: string; harvestEndedOn: string; priceCentsPerTon: number };
      const day = (iso: string) => new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' }).format(new Date(`${iso}T00:00:00Z`));
      const perTon = new Intl.NumberFormat(locale, { style: 'currency', currency: 'USD', minimumFractionDigits: 0, maximumFractionDigits: 0 }).format(lot.priceCentsPerTon / 100);

      await page.goto(`/hay/${id}`);
      const facts = page.getByRole('region', { name: 'The lot' });
      const text = spaced(await facts.innerText());
      expect(text).toContain(`${spaced(day(lot.harvestStartedOn))} to ${spaced(day(lot.harvestEndedOn))}`);
      expect(text).not.toContain(lot.harvestStartedOn);
      expect(spaced(await page.locator('main').innerText())).toContain(spaced(perTon));
    });
  });
}
