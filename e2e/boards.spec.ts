import { expect, test } from '@playwright/test';
import { signIn } from './helpers/accounts';
import { acceptInvitationByMail, createBoard, createDesign, invite } from './helpers/boards';
import { shoot } from './helpers/screens';

test('an owner makes a board, invites by mail, changes a role, bins and restores a design; a member leaves', async ({ browser }) => {
  const owner = await (await browser.newContext()).newPage();
  const member = await (await browser.newContext()).newPage();
  const boardName = `Guild bars ${Date.now()}`;

  await signIn(owner, 'maren@example.test');
  await owner.goto('/boards');
  await expect(owner.getByTestId('nav-boards')).toBeVisible();
  await shoot(owner, 'boards-empty');

  // A name is required; the field says so.
  await owner.getByTestId('board-create-submit').click();
  await expect(owner.getByText('Board name is required')).toBeVisible();

  const boardId = await createBoard(owner, boardName);
  await invite(owner, 'ibrahim@example.test', 'viewer');
  await shoot(owner, 'board-owner');

  await signIn(member, 'ibrahim@example.test');
  await acceptInvitationByMail(member, 'ibrahim@example.test', boardName);
  await expect(member.getByTestId('board-role')).toHaveText('Viewer');
  await expect(member.getByTestId('design-new')).toHaveCount(0);

  // The owner makes him an editor; he can now create designs.
  await owner.reload();
  const row = owner.getByTestId('member-row').filter({ hasText: 'Ibrahim' });
  await row.getByTestId('member-role-select').click();
  await owner.getByTestId('member-role-editor').click();
  await expect(row.getByTestId('member-role-select')).toContainText('Editor');
  await member.reload();
  await expect(member.getByTestId('board-role')).toHaveText('Editor');

  // Designs: create from a preset, duplicate, delete (confirmed), restore from the bin.
  await owner.goto(`/boards/${boardId}`);
  await createDesign(owner, 'Barleycorn trial', 'barleycorn');
  await owner.getByTestId('studio-board-link').click();
  const design = owner.getByTestId('design-row').filter({ hasText: 'Barleycorn trial' });
  await design.getByTestId('design-more').click();
  await owner.getByTestId('design-duplicate').click();
  await expect(owner.getByTestId('design-row')).toHaveCount(2);
  await owner.getByTestId('design-row').filter({ hasText: '(copy)' }).getByTestId('design-more').click();
  await owner.getByTestId('design-delete').click();
  await owner.getByTestId('confirm-accept').click();
  await expect(owner.getByTestId('design-row')).toHaveCount(1);
  await expect(owner.getByTestId('bin-row')).toContainText('kept 30 more days');
  await shoot(owner, 'board-bin');
  await owner.getByTestId('bin-restore').click();
  await expect(owner.getByTestId('design-row')).toHaveCount(2);
  await expect(owner.getByTestId('designs-bin')).toHaveCount(0);

  // A second invitation, withdrawn.
  await invite(owner, 'saskia@example.test', 'editor');
  await owner.getByTestId('invitation-row').filter({ hasText: 'saskia' }).getByTestId('invitation-revoke').click();
  await expect(owner.getByTestId('invitation-row')).toHaveCount(0);

  // Rename, archive, show archived, bring back.
  await owner.getByTestId('board-rename').click();
  await owner.getByTestId('board-rename-input').fill(`${boardName} (renamed)`);
  await owner.getByTestId('board-rename-save').click();
  await expect(owner.getByTestId('board-name')).toHaveText(`${boardName} (renamed)`);
  await owner.getByTestId('board-archive').click();
  await owner.getByTestId('confirm-accept').click();
  await expect(owner.getByTestId('board-archived')).toBeVisible();
  await owner.goto('/boards');
  await expect(owner.getByTestId('board-card').filter({ hasText: boardName })).toHaveCount(0);
  await owner.getByTestId('boards-show-archived').click();
  await expect(owner.getByTestId('board-card').filter({ hasText: boardName })).toBeVisible();
  await shoot(owner, 'boards-list');
  await owner.getByTestId('board-card-link').filter({ hasText: boardName }).click();
  await owner.getByTestId('board-archive').click();
  await expect(owner.getByTestId('board-archived')).toHaveCount(0);

  // The member sees it under "shared with me", then leaves.
  await member.goto('/boards');
  await expect(member.getByTestId('boards-shared').getByTestId('board-card')).toContainText(boardName);
  await shoot(member, 'boards-shared');
  await member.getByTestId('boards-shared').getByTestId('board-card-link').first().click();
  await member.getByTestId('board-leave').click();
  await member.getByTestId('confirm-accept').click();
  await expect(member).toHaveURL(/\/boards$/);
  await expect(member.getByTestId('boards-shared-empty')).toBeVisible();
});

test('an invitation link sends a signed-out visitor to sign in and back', async ({ page }) => {
  await page.goto('/boards/invitations/accept?token=not-a-real-token-but-long-enough');
  await expect(page).toHaveURL(/\/account\/sign-in\?next=/);
  await page.getByTestId('sign-in-email').fill('saskia@example.test');
  await page.getByTestId('sign-in-password').fill('marsh-lathe-demo-2026');
  await page.getByTestId('sign-in-submit').click();
  await expect(page.getByTestId('invitation-failed')).toBeVisible();
  await shoot(page, 'invitation-failed');
});
