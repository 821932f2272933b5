import { expect, test, type Page } from './support/test';
import { makeJpeg, makeNoisyJpeg, makePdf } from '../tests/support/upload-fixtures';
import { waitForMail } from './support/mail-catcher';
import { ADMIN, BUYER, GROWER, signInAs as signIn } from './support/accounts';

/** The stored photo a variant URL belongs to (`/media/photos/<photo>/<width>.webp`). */
const photoOf = (src: string | null) => /photos\/([^/]+)\//.exec(src ?? '')?.[1] ?? `no photo in ${src}`;

async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: /Account menu/ }).click();
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await expect(page.getByRole('link', { name: 'Sign in' })).toBeVisible();
}

/**
 * A day relative to today (ISO, UTC). The server checks sample age and harvest dates against its own
 * clock, so the journey's dates move with the calendar instead of going stale.
 */
const daysAgo = (days: number) => new Date(Date.now() - days * 86_400_000).toISOString().slice(0, 10);

const saveAndContinue = (page: Page) => page.getByRole('button', { name: 'Save and continue' }).click();

test('a grower lists a tested lot, an admin approves it, and buyers find it in the catalogue', async ({ page }) => {
  test.setTimeout(360_000); // four roles, throttled photo uploads and two e-mails: over 4 min on a loaded 2-core machine
  const field = `Creek Bend ${Date.now().toString(36)}`;
  const title = `Alfalfa, 2nd cutting — ${field}`;
  const photos = [
    { name: 'stack-north.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(2400, 1800, 1) },
    { name: 'bale-ends.jpg', mimeType: 'image/jpeg', buffer: await makeNoisyJpeg(2200, 1700, 2) },
  ];

  // A buyer saves a search for this field before the lot exists, asking to be alerted.
  await signIn(page, BUYER);
  await page.goto(`/hay?q=${encodeURIComponent(field)}`);
  await page.getByLabel('Name this search').fill(`Hay from ${field}`);
  await page.getByRole('button', { name: 'Save and alert me' }).click();
  await expect(page.getByRole('status').filter({ hasText: /saved/i })).toBeVisible();
  await signOut(page);

  await signIn(page, GROWER);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My lots' }).click();
  await expect(page.getByRole('heading', { name: 'My lots' })).toBeVisible();
  await page.getByRole('link', { name: 'New lot' }).click();

  // Step 1: the lot.
  await page.getByLabel('Field name').fill(field);
  await page.getByLabel('Cutting').fill('2');
  await page.getByLabel('Harvest started').fill(daysAgo(60));
  await page.getByLabel('Harvest ended').fill(daysAgo(59));
  await page.getByLabel('Moisture at baling').fill('15');
  await expect(page.getByRole('region', { name: 'Cautions' })).toContainText('Buyers of alfalfa ask about blister beetles');
  // Growing conditions: a drought-stressed crop can carry nitrate (UC ANR; NC State Extension), so the grower is asked to test it.
  await expect(page.getByRole('region', { name: 'Cautions' })).not.toContainText('Test this hay for nitrate');
  await page.getByRole('checkbox', { name: 'The crop was drought-stressed' }).check();
  await expect(page.getByRole('region', { name: 'Cautions' })).toContainText('You report this hay was drought-stressed, which can raise its nitrate.');
  await saveAndContinue(page);

  // The draft now has an address of its own and resumes at the quantity step.
  await expect(page).toHaveURL(/\/selling\/lots\/\d+$/);
  const lotId = Number(page.url().split('/').pop());
  await page.getByLabel('Bale count').fill('500');
  await page.getByLabel('Average bale weight').fill('60');
  await expect(page.getByText('15.00 tons')).toBeVisible();
  await saveAndContinue(page);

  // Step 3: sampling, checked live against the protocol.
  await page.getByLabel('Sample date').fill(daysAgo(30));
  await page.getByLabel('Who sampled').fill('Extension agent (invented)');
  await expect(page.getByText('Sampled to protocol.')).toBeVisible();
  await page.getByLabel('Cores taken').fill('12');
  await expect(page.getByText(/Only 12 cores were taken/)).toBeVisible();
  await page.getByLabel('Cores taken').fill('20');
  await saveAndContinue(page);

  // Step 4: the lab analysis, with a live preview from the engine and the report PDF.
  await page.getByLabel('Lab name').fill('High Plains Forage Testing (invented)');
  await page.getByLabel('Report number').fill('HP-2231');
  await page.getByLabel('Report date').fill(daysAgo(25));
  // The values come from the downloadable CSV template, filled in as a grower would in a spreadsheet.
  const template = await (await page.request.get('/api/selling/analysis-template.csv')).text();
  const filled = template
    .replace('dryMatterPct,', 'dryMatterPct,88')
    .replace('crudeProteinPct,', 'crudeProteinPct,20')
    .replace('adfPct,', 'adfPct,30')
    .replace('ndfPct,', 'ndfPct,40');
  await page.getByLabel('Import values from CSV').setInputFiles({ name: 'values.csv', mimeType: 'text/csv', buffer: Buffer.from(filled) });
  await expect(page.getByLabel('Dry matter (DM)')).toHaveValue('88');
  await expect(page.getByLabel('NDF', { exact: true })).toHaveValue('40');
  // RFV of ADF 30 / NDF 40 (Rohweder et al. 1978): (88.9 − 0.779·30)·(120/40)/1.29 ≈ 152.
  await expect(page.locator('[data-figure="rfv"]')).toHaveText('152');
  // No nitrate result is entered for this drought-stressed hay: the form prompts for one beside the field.
  await expect(page.getByRole('note').filter({ hasText: 'can carry nitrate' })).toContainText('ask their veterinarian');
  await page.getByLabel('Lab report PDF').setInputFiles({ name: 'hp-2231.pdf', mimeType: 'application/pdf', buffer: await makePdf('Report HP-2231') });
  await saveAndContinue(page);

  // Step 5: two photos, each with its own progress bar. Uploads are slowed down so progress can be seen.
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 20, downloadThroughput: -1, uploadThroughput: 1_500_000 });
  await page.evaluate(() => {
    const seen: string[] = ((window as unknown as { progressSeen: string[] }).progressSeen = []);
    new MutationObserver((records) => {
      for (const r of records) {
        const el = r.target as Element;
        if (el.getAttribute('role') === 'progressbar') seen.push(el.getAttribute('aria-valuenow') ?? '');
      }
    }).observe(document.body, { subtree: true, attributes: true, attributeFilter: ['aria-valuenow'] });
  });
  await page.getByLabel('Choose photos').setInputFiles(photos);
  for (const p of photos) {
    const bar = page.getByRole('progressbar', { name: `Upload of ${p.name}` });
    await expect(bar).toBeVisible();
    await expect(bar).toHaveAttribute('aria-valuenow', '100', { timeout: 30_000 });
  }
  const seen = await page.evaluate(() => (window as unknown as { progressSeen: string[] }).progressSeen.map(Number));
  expect(seen.some((v) => v > 0 && v < 100)).toBe(true);
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
  const items = page.getByRole('list', { name: 'Photos of this lot' }).getByRole('listitem');
  await expect(items).toHaveCount(2);
  // Which photo is the cover, by the stored photo its thumbnail shows, before and after the click.
  const coverItem = items.filter({ has: page.getByText('Cover', { exact: true }) });
  const otherItem = items.filter({ has: page.getByRole('button', { name: 'Make cover' }) });
  await expect(coverItem).toHaveCount(1);
  const firstCover = photoOf(await coverItem.getByRole('img').getAttribute('src'));
  const newCover = photoOf(await otherItem.getByRole('img').getAttribute('src'));
  expect(newCover).not.toBe(firstCover);
  await otherItem.getByRole('button', { name: 'Make cover' }).click();
  await expect(coverItem.getByRole('img')).toHaveAttribute('src', new RegExp(`photos/${newCover}/`));
  await expect(otherItem.getByRole('img')).toHaveAttribute('src', new RegExp(`photos/${firstCover}/`));
  await saveAndContinue(page);

  // Step 6: price and delivery.
  await page.getByLabel('Price per ton (as fed)').fill('265');
  await page.getByLabel('Freight per loaded mile').fill('3.50');
  await saveAndContinue(page);

  // Step 7: review and submit.
  // The grower sees the cautions in grower's terms; buyers' own wording folds out beneath.
  await page.getByText('What buyers will be told').click();
  await expect(page.getByRole('group').filter({ hasText: 'What buyers will be told' })).toContainText('Blister beetles in alfalfa');
  await page.getByRole('button', { name: 'Submit for review' }).click();
  await expect(page).toHaveURL(/\/selling\?submitted=/);
  await expect(page.getByRole('listitem').filter({ hasText: title }).getByText('With the reviewer')).toBeVisible();
  await signOut(page);

  // The admin checks the report against the values and approves.
  await signIn(page, ADMIN);
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review desk' }).click();
  await page.getByRole('link', { name: title }).click();
  await expect(page.locator('iframe[title="Lab report PDF"]')).toHaveAttribute('src', `/api/uploads/lots/${lotId}/report`);
  const pdf = await page.request.get(`/api/uploads/lots/${lotId}/report`);
  expect(pdf.headers()['content-type']).toBe('application/pdf');
  // Each value is compared with the one read from the PDF; the admin ticks what they checked and confirms.
  await expect(page.getByRole('table', { name: 'Entered values beside the PDF' })).toBeVisible();
  await page.getByRole('checkbox', { name: 'Checked Crude protein (CP)' }).check();
  await page.getByRole('button', { name: 'Approve and list' }).click();
  await expect(page.getByRole('alertdialog')).toContainText('List this lot for buyers?');
  await page.getByRole('button', { name: 'Yes, approve and list' }).click();
  await expect(page.getByRole('status')).toContainText('This lot is listed');
  await signOut(page);

  // The grower hears of the approval, and the buyer's saved search alerts them: both read from the mail catcher.
  const listedMail = await waitForMail(GROWER.email, title);
  expect(listedMail.text).toContain(`/hay/${lotId}`);
  const alert = await waitForMail(BUYER.email, title);
  expect(alert.text).toContain(`/hay/${lotId}`);
  expect(alert.text).toMatch(/RFV:? 152\b/);

  // Anyone now finds it in the catalogue, with what the grower typed in, the chosen cover and WebP photo variants.
  await page.goto(`/hay?q=${encodeURIComponent(field)}`);
  await page.getByRole('link', { name: title }).first().click();
  await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Lab analysis' })).toBeVisible();
  // Entered on a dry-matter basis at 88 % DM; as fed = DM value × 0.88 (common practice).
  const nutrient = (abbr: string) => page.getByRole('row', { name: new RegExp(`\\(${abbr}\\)`) }).getByRole('cell');
  await expect(nutrient('CP')).toHaveText(['20.0%', '17.6%']);
  await expect(nutrient('ADF')).toHaveText(['30.0%', '26.4%']);
  await expect(nutrient('NDF')).toHaveText(['40.0%', '35.2%']);
  await expect(page.getByRole('term').filter({ hasText: /^\s*RFV/ })).toHaveText(/RFV\s*152\b/);
  // $265 a ton as fed is $265 / 0.88 = $301 a ton of dry matter.
  await expect(page.getByText(/\$265\s+per ton as-fed/)).toBeVisible();
  await expect(page.getByText(/\$301 per ton of dry matter/)).toBeVisible();
  await expect(page.getByText(/\$3\.50 per loaded mile/)).toBeVisible();
  await expect(page.getByText(/500 of 500 bales ≈ 15\.0 tons/)).toBeVisible();
  // Buyers are told what the grower reported and to ask for a nitrate result and their veterinarian.
  const nitrate = page.getByRole('listitem').filter({ hasText: 'No nitrate result for a hay that can carry it' });
  await expect(nitrate).toContainText('The grower reports this hay was drought-stressed');
  await expect(nitrate).toContainText('veterinarian');
  const photo = page.locator('figure img').first();
  await expect(photo).toHaveAttribute('src', new RegExp(`/media/photos/${newCover}/.+\\.webp$`));
  const image = await page.request.get((await photo.getAttribute('src'))!);
  expect(image.headers()['content-type']).toBe('image/webp');
  await expect(page.locator('figure img').first()).toHaveAttribute('srcset', /320w.*800w.*1600w/);
});

test('a new grower sets up the farm profile and a payout account before listing', async ({ page }) => {
  await page.goto('/sign-up');
  await page.getByRole('radio', { name: 'sell hay I grow' }).check();
  await page.getByLabel('Your name').fill('New Grower');
  await page.getByLabel('E-mail').fill(`grower.${Date.now()}@e2e.baleproof.example`);
  await page.getByLabel('Password').fill('a-long-enough-password');
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.getByRole('link', { name: 'Continue' }).click();

  await expect(page).toHaveURL(/\/selling$/);
  await expect(page.getByRole('note')).toContainText('set up your farm profile');
  await expect(page.getByRole('link', { name: 'New lot' })).toHaveCount(0);
  await page.getByRole('link', { name: 'set up your farm profile' }).click();

  await page.getByLabel('Farm name').fill('Sandhill Meadow Hay (invented)');
  await page.getByLabel('Address where hay is loaded').fill('4 Section Line Rd');
  await page.getByLabel('ZIP code').fill('00000');
  await page.getByLabel('Delivery radius').fill('90');
  await page.getByRole('button', { name: 'Save farm profile' }).click();
  await expect(page.getByRole('alert')).toContainText('ZIP code 00000 is not in our list');
  await page.getByLabel('ZIP code').fill('68901');
  await page.getByRole('button', { name: 'Save farm profile' }).click();
  await expect(page.getByRole('status')).toContainText('Hastings, NE');

  // Payouts go through the payment provider's onboarding (the local fake completes it at once).
  await page.getByRole('button', { name: 'Set up payouts' }).click();
  await expect(page).toHaveURL(/\/selling\/farm\?payouts=returned/);
  await expect(page.getByText('Your payout account is ready.')).toBeVisible();

  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My lots' }).click();
  await expect(page.getByRole('link', { name: 'New lot' })).toBeVisible();
});
