import { expect, test } from '@playwright/test';
import { signIn, signOut } from './helpers/accounts';
import { shoot } from './helpers/screens';

const password = 'tinplate-ember-gauge-2031';

test('a visitor signs up, verifies by mail, signs in; the admin makes them a moderator', async ({ page }) => {
  const email = `pell-${Date.now()}@example.test`;
  await page.goto('/');
  await shoot(page, 'home-visitor');

  // The icon font is served by us and actually loads under the CSP (icons would show as words otherwise).
  await expect.poll(() => page.evaluate(async () => {
    await document.fonts.ready;
    return [...document.fonts].some((f) => /material icons/i.test(f.family) && f.status === 'loaded');
  })).toBe(true);

  await page.goto('/account/sign-up');
  await page.getByTestId('sign-up-display-name').fill('Pell Marrow');
  await page.getByTestId('sign-up-email').fill(email);
  await page.getByTestId('sign-up-password').fill('short');
  await page.getByTestId('sign-up-email').click();
  await shoot(page, 'sign-up-errors');
  await page.getByTestId('sign-up-password').fill(password);
  await page.getByTestId('sign-up-submit').click();
  await expect(page.getByTestId('sign-up-done')).toBeVisible();
  await shoot(page, 'sign-up-done');

  await page.goto('/mailbox');
  const message = page.getByTestId('mailbox-message').filter({ hasText: /confirm/i }).first();
  await expect(message).toBeVisible();
  await message.click();
  await expect(page.getByTestId('mailbox-subject')).toContainText(/confirm/i);
  await shoot(page, 'mailbox');
  await page.getByTestId('mailbox-open-link').click();
  await expect(page.getByTestId('verify-done')).toBeVisible();
  await shoot(page, 'verify-done');

  await signIn(page, email, password);
  await expect(page.getByTestId('account-menu-name')).toContainText('Pell Marrow');
  await page.goto('/account/profile');
  await expect(page.getByTestId('profile-email-verified')).toBeVisible();
  await shoot(page, 'profile');
  await signOut(page);

  await signIn(page, 'odile@example.test');
  await page.goto('/admin/people');
  await page.getByTestId('people-filter').fill('pell');
  const row = page.getByTestId('people-row').filter({ hasText: email });
  await expect(row).toHaveCount(1);
  await shoot(page, 'people');
  await row.getByTestId('people-role-select').click();
  await page.getByRole('option', { name: /moderator/i }).click();
  await page.getByTestId('account-change-reason').fill('Helps with the reports queue');
  await page.getByTestId('account-change-confirm').click();
  await expect(row.getByTestId('people-role-select')).toContainText(/moderator/i);
  await signOut(page);

  await signIn(page, email, password);
  await page.goto('/account/profile');
  await expect(page.getByText(/moderator/i).first()).toBeVisible();
});

test('a wrong password is refused with a message, and a member cannot open the people page', async ({ page }) => {
  await page.goto('/account/sign-in');
  await page.getByTestId('sign-in-email').fill('maren@example.test');
  await page.getByTestId('sign-in-password').fill('not-her-password-at-all');
  await page.getByTestId('sign-in-submit').click();
  await expect(page.getByTestId('form-problem')).toBeVisible();
  await shoot(page, 'sign-in-refused');
  await signIn(page, 'maren@example.test');
  await page.goto('/admin/people');
  await expect(page.getByTestId('people-table')).toHaveCount(0);
});
