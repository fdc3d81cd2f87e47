import { expect, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'marsh-lathe-demo-2026';

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/account/sign-in');
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
  await expect(page.getByTestId('account-menu')).toBeVisible();
}

export async function signOut(page: Page): Promise<void> {
  await page.getByTestId('account-menu').click();
  await page.getByTestId('account-menu-sign-out').click();
  await expect(page.getByTestId('nav-sign-in').or(page.getByTestId('nav-menu'))).toBeVisible();
}
