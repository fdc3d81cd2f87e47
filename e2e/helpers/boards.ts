import { expect, type Page } from '@playwright/test';

/** Creates a board from the boards page; returns its id (from the URL it lands on). */
export async function createBoard(page: Page, name: string): Promise<string> {
  await page.goto('/boards');
  await page.getByTestId('board-create-name').fill(name);
  await page.getByTestId('board-create-submit').click();
  await expect(page.getByTestId('board-name')).toHaveText(name);
  return new URL(page.url()).pathname.split('/').pop()!;
}

/** On the board page: invites `email` with `role` and waits for the open invitation to be listed. */
export async function invite(page: Page, email: string, role: 'editor' | 'viewer'): Promise<void> {
  await page.getByTestId('invite-email').fill(email);
  await page.getByTestId('invite-role').click();
  await page.getByTestId(`invite-role-${role}`).click();
  await page.getByTestId('invite-submit').click();
  await expect(page.getByTestId('invitation-row').filter({ hasText: email })).toBeVisible();
}

/** As the signed-in invitee: opens the newest invitation mail to `email` in the local mailbox and accepts it. */
export async function acceptInvitationByMail(page: Page, email: string, boardName: string): Promise<void> {
  await page.goto('/mailbox');
  const message = page.getByTestId('mailbox-message').filter({ hasText: boardName }).filter({ hasText: email }).first();
  await expect(message).toBeVisible();
  await message.click();
  await page.getByTestId('mailbox-open-link').click();
  await expect(page.getByTestId('board-name')).toHaveText(boardName);
}

/** On the board page: creates a design from a preset and waits for the studio to load it. Returns its id. */
export async function createDesign(page: Page, title: string, preset = 'example'): Promise<string> {
  await page.getByTestId('design-new').click();
  await page.getByTestId('new-design-title').fill(title);
  await page.getByTestId('new-design-preset').click();
  await page.getByTestId(`new-design-preset-${preset}`).click();
  await page.getByTestId('new-design-create').click();
  await expect(page.getByTestId('studio-title')).toHaveText(title);
  return new URL(page.url()).pathname.split('/').pop()!;
}
