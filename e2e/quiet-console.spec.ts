import { expect, test, type Page } from '@playwright/test';
import { createBoard, createDesign, memberPage, publishFromBoard } from './helpers/community';

/** Everything the browser reports as an error: console errors (a failed request logs one) and answers of 400 or more. */
function listenForErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(`console: ${message.text()}`);
  });
  page.on('response', (response) => {
    if (response.status() >= 400) errors.push(`${response.status()} ${response.request().method()} ${new URL(response.url()).pathname}`);
  });
  return errors;
}

test('a visitor’s home page logs no error: being signed out is not one', async ({ page }) => {
  const errors = listenForErrors(page);
  const me = page.waitForResponse((r) => r.url().endsWith('/api/auth/me'));
  await page.goto('/');
  expect((await me).status()).toBe(200);
  await expect(page.getByTestId('home-sign-up')).toBeVisible();
  await page.waitForLoadState('networkidle');
  expect(errors).toEqual([]);
});

test('publishing a design for the first time logs no error: never published is not one', async ({ browser }) => {
  const { context, page } = await memberPage(browser, 'ibrahim@example.test');
  const errors = listenForErrors(page);
  const boardId = await createBoard(page, `Quiet console ${Date.now().toString(36)}`);
  await createDesign(page, 'First publish');
  const entry = page.waitForResponse((r) => /\/api\/designs\/[0-9a-f-]{36}\/entry$/.test(r.url()));
  await publishFromBoard(page, boardId, 'First publish', { title: `Quiet publish ${Date.now().toString(36)}` }, async () => {
    expect((await entry).status()).toBe(200);
  });
  await page.waitForLoadState('networkidle');
  expect(errors).toEqual([]);
  await context.close();
});
