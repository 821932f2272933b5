import { expect, test } from './support/test';
import { waitForMail } from './support/mail-catcher';

// Demo accounts from the seed (README lists them).
const accounts = [
  { role: 'grower', email: 'grower@demo.baleproof.example', password: 'demo-grower-pass', nav: 'My lots', home: /\/selling$/ },
  { role: 'buyer', email: 'buyer@demo.baleproof.example', password: 'demo-buyer-pass', nav: 'Herd planner', home: /\/orders$/ },
  { role: 'admin', email: 'admin@baleproof.example', password: 'admin-demo-pass', nav: 'Review desk', home: /\/admin$/ },
];

test.describe('signing in', () => {
  for (const account of accounts) {
    test(`the demo ${account.role} signs in through the form and sees their navigation`, async ({ page }) => {
      await page.goto('/sign-in');
      await page.getByLabel('E-mail').fill(account.email);
      await page.getByLabel('Password').fill(account.password);
      await page.getByRole('button', { name: 'Sign in' }).click();
      // Each role lands on its own home: buyers on their orders, growers on their lots, admins on the review desk.
      await expect(page).toHaveURL(account.home);
      await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: account.nav })).toBeVisible();
      await page.getByRole('button', { name: /Account menu/ }).click();
      await page.getByRole('menuitem', { name: 'Sign out' }).click();
      await expect(page.getByRole('banner').getByRole('link', { name: 'Sign in', exact: true })).toBeVisible();
    });
  }

  test('a wrong password shows a clear error and stays on the form', async ({ page }) => {
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill('buyer@demo.baleproof.example');
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert')).toContainText('E-mail or password is wrong.');
    await expect(page).toHaveURL(/\/sign-in/);
  });

  test('a new buyer signs up, is signed in, and confirms the address from the e-mail', async ({ page }) => {
    const email = `new.${Date.now()}@e2e.baleproof.example`;
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('New Buyer');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('a-long-enough-password');
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect(page.getByRole('status').filter({ hasText: `We sent a message to ${email}` })).toBeVisible();
    await page.getByRole('link', { name: 'Continue' }).click();
    await expect(page).toHaveURL(/\/hay/);
    await expect(page.getByRole('button', { name: /Account menu for New Buyer/ })).toBeVisible();
    await expect(page.getByText('E-mail not confirmed yet.')).toBeVisible();
    await page.getByRole('button', { name: 'Send the link again' }).click();
    await expect(page.getByRole('status').filter({ hasText: `We sent a new link to ${email}.` })).toBeVisible();

    const mail = await waitForMail(email, 'Confirm your e-mail address');
    const link = /(\/confirm-email\?token=\S+)/.exec(mail.text)![1]!;
    await page.goto(link);
    await expect(page.getByRole('status').filter({ hasText: `Thank you: ${email} is confirmed.` })).toBeVisible();
    await page.goto('/hay');
    await expect(page.getByRole('heading', { name: 'Saved searches' })).toBeVisible();
    await expect(page.getByText('E-mail not confirmed yet.')).toHaveCount(0);
  });

  test('signing up with a registered address looks the same and signs nobody in', async ({ page }) => {
    await page.goto('/sign-up');
    await page.getByLabel('Your name').fill('Someone Else');
    await page.getByLabel('E-mail').fill('buyer@demo.baleproof.example');
    await page.getByLabel('Password').fill('a-long-enough-password');
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect(page.getByRole('status').filter({ hasText: 'We sent a message to buyer@demo.baleproof.example' })).toBeVisible();
    await expect(page.getByRole('alert')).toHaveCount(0);
    await expect(page.getByRole('button', { name: /Account menu/ })).toHaveCount(0);
  });
});
