import { expect, test } from './support/test';
import type { LotDetail } from '@shared/contracts/lots';
import { simplePdf } from '../tests/support/simple-pdf';
import { BUYER, GROWER, threeRoles, usd } from './support/accounts';
import { callApi } from './support/app-api';
import { waitForMail } from './support/mail-catcher';
import { deliveredPickupOrder } from './support/orders';
import { platformBalanceCents } from './support/stripe-fake';

test.describe.configure({ timeout: 300_000 });

test('a buyer files a claim with a retest; the admin judges it beside the listing and refunds part; all three roles see the refund and the grower’s payout shrinks by it', async ({ browser }) => {
  const { grower, buyer, admin } = await threeRoles(browser);
  const order = await deliveredPickupOrder(buyer, grower);
  const lot = await callApi<LotDetail>(buyer, 'GET', `/api/lots/${order.lines[0]!.lot.id}`);
  const listed = lot.analysis!;

  // The buyer reports the problem on the order page with the other lab's retest, on a dry-matter basis:
  // CP 4 units lower, ADF 4 and NDF 5 higher, each past the between-lab tolerance (±2, ±2, ±2.8; Hay & Forage Grower, Meyer).
  const retest = { dm: listed.dryMatterPct, cp: listed.crudeProteinPct - 4, adf: listed.adfPct + 4, ndf: listed.ndfPct + 5 };
  await buyer.goto(`/orders/${order.id}`);
  const claims = buyer.getByRole('region', { name: 'Quality claims' });
  await claims.getByLabel('What is wrong?').fill('Stemmy, leaf-shattered bales; our retest shows far less protein than listed.');
  await claims.getByLabel('I have a retest from a lab').check();
  await claims.getByLabel('Lab name').fill('Invented Ridge Forage Lab');
  await claims.getByLabel('Report date').fill(order.deliveredAt!.slice(0, 10));
  await claims.getByLabel('Values on').selectOption('dm');
  await claims.getByLabel(/^Dry matter/).fill(String(retest.dm));
  await claims.getByLabel(/^Crude protein \(CP\)/).fill(retest.cp.toFixed(1));
  await claims.getByLabel(/^Acid detergent fibre \(ADF\)/).fill(retest.adf.toFixed(1));
  await claims.getByLabel(/^Neutral detergent fibre \(NDF\)/).fill(retest.ndf.toFixed(1));
  await claims.getByLabel('Retest report (PDF, optional)').setInputFiles({ name: 'retest.pdf', mimeType: 'application/pdf', buffer: await simplePdf(['Invented Ridge Forage Lab - retest', `Crude protein ${retest.cp.toFixed(1)} % DM`]) });
  await claims.getByRole('button', { name: 'Send the claim' }).click();
  const filed = claims.getByRole('article', { name: /^Claim \d+$/ });
  await expect(filed.getByTestId('claim-status')).toHaveText('waiting for an admin');
  await expect(filed.getByRole('link', { name: 'retest PDF' })).toBeVisible();
  await expect(buyer.getByTestId('order-status')).toHaveText('problem reported');
  const claimId = Number(/\d+/.exec((await filed.getAttribute('aria-label'))!)![0]);

  // The admin sees the retest beside the listing through the forage engine and refunds a tenth of the hay.
  const refund = Math.round(order.goodsCents / 10 / 100) * 100;
  const balanceBefore = await platformBalanceCents();
  await admin.goto('/admin/claims');
  const claim = admin.getByRole('region', { name: `Claim ${claimId}` });
  const judged = claim.getByRole('table', { name: `Retest beside the listing, claim ${claimId}` });
  for (const nutrient of ['Crude protein (CP)', 'Acid detergent fibre (ADF)', 'Neutral detergent fibre (NDF)']) {
    await expect(judged.getByRole('row', { name: new RegExp(`^${nutrient.replace(/[()]/g, '\\$&')}`) })).toContainText('beyond tolerance');
  }
  await claim.getByRole('radio', { name: /Partial refund/ }).check();
  await claim.getByLabel('Partial refund in dollars').fill(String(refund / 100));
  await claim.getByLabel('Note to both sides').fill('The retest is outside tolerance on CP, ADF and NDF; a tenth of the hay back.');
  await claim.getByRole('button', { name: 'Decide…' }).click();
  const confirm = admin.getByRole('alertdialog');
  await expect(confirm.getByRole('heading')).toHaveText(`Refund ${usd(refund)}?`);
  await confirm.getByRole('button', { name: 'Yes, decide' }).click();
  await expect(claim).toContainText(`${usd(refund)} refunded`);

  // The money went back through the payment provider exactly once.
  expect(balanceBefore - (await platformBalanceCents())).toBe(refund);

  // The buyer and the grower see the refund on the order and the decision on the claim.
  for (const page of [buyer, grower]) {
    await page.goto(`/orders/${order.id}`);
    await expect(page.getByTestId('refunded')).toHaveText(usd(refund));
    await expect(page.getByTestId('order-status')).toHaveText('complete');
    await expect(page.getByTestId('claim-decision')).toContainText(`${usd(refund)} refunded`);
  }

  // The grower's payout for the order is the hay and freight less the refund (the platform fee stays with the platform).
  await admin.goto('/admin/payouts');
  const due = admin.getByRole('region', { name: `Due to ${order.farm.name}` });
  const row = due.getByRole('row').filter({ has: admin.getByRole('cell', { name: String(order.id), exact: true }) });
  await expect(row.getByRole('cell').nth(5)).toHaveText(usd(refund));
  await expect(row.getByRole('cell').last()).toHaveText(usd(order.goodsCents + order.freightCents - refund));

  // Both sides were e-mailed the decision.
  await waitForMail(BUYER.email, `Claim decided: order ${order.id}`);
  await waitForMail(GROWER.email, `Claim decided: order ${order.id}`);
});
