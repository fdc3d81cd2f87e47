import { expect, test } from '@playwright/test';
import { apiSend } from './helpers/api';
import { acceptInvitationByMail, createBoard, invite } from './helpers/boards';
import { memberPage } from './helpers/community';
import { checkScreen } from './helpers/screen-check';
import { shoot } from './helpers/screens';

const stamp = Date.now().toString(36);

test.describe.configure({ mode: 'serial' });

test('a member opens a vote over three designs; a second member answers pairs in another browser; the ranking updates live for the first', async ({ browser }) => {
  test.setTimeout(300_000);
  const odile = await memberPage(browser, 'odile@example.test');
  const tobias = await memberPage(browser, 'tobias@example.test');

  // Odile's board with three designs (made through the API: the studio is not what this journey is about).
  const board = `Guild vote ${stamp}`;
  const boardId = await createBoard(odile.page, board);
  const titles = ['Plain sine', 'Barleycorn', 'Basket weave'];
  const presets = ['blank', 'barleycorn', 'basket-weave'];
  for (let i = 0; i < 3; i++) await apiSend(odile.page, 'post', `/api/boards/${boardId}/designs`, { title: `${titles[i]} ${stamp}`, preset: presets[i] });
  await odile.page.reload();
  await invite(odile.page, 'tobias@example.test', 'viewer');
  await acceptInvitationByMail(tobias.page, 'tobias@example.test', board);

  // Odile opens the vote from the board page.
  await odile.page.getByTestId('vote-open').click();
  await expect(odile.page.getByTestId('vote-design')).toHaveCount(3);
  await odile.page.getByTestId('vote-question').fill(`Which would you cut for the spring show? ${stamp}`);
  // A plain screenshot: a snack bar behind the dialog's backdrop cannot be dismissed by the screen check.
  await shoot(odile.page, 'vote-open-dialog');
  await odile.page.getByTestId('vote-open-submit').click();
  await odile.page.waitForURL(/\/votes\/[0-9a-f-]{36}$/);
  const voteUrl = new URL(odile.page.url()).pathname;
  await expect(odile.page.getByTestId('vote-rank')).toHaveCount(3);
  await expect(odile.page.getByTestId('vote-live')).toBeVisible();
  await expect(odile.page.getByTestId('vote-comparisons').first()).toHaveText('0');

  // Tobias finds it on the board and answers every pair: a pick, a tie, a pick.
  await tobias.page.reload();
  await tobias.page.getByTestId('board-vote-link').filter({ hasText: stamp }).click();
  await expect(tobias.page).toHaveURL(voteUrl);
  await expect(tobias.page.getByTestId('vote-pair')).toBeVisible();
  await checkScreen(tobias.page, 'vote-pair');
  await tobias.page.getByTestId('vote-pick-a').click();

  // Odile sees the first answer arrive without reloading.
  await expect.poll(async () => (await odile.page.getByTestId('vote-comparisons').allTextContents()).map(Number).reduce((a, b) => a + b, 0)).toBe(2);

  await tobias.page.getByTestId('vote-pick-tie').click();
  await expect.poll(async () => (await odile.page.getByTestId('vote-comparisons').allTextContents()).map(Number).reduce((a, b) => a + b, 0)).toBe(4);
  await tobias.page.getByTestId('vote-pick-b').click();
  await expect(tobias.page.getByTestId('vote-done')).toBeVisible();
  await expect(tobias.page.getByRole('heading', { name: 'You have answered every pair' })).toBeVisible();
  await expect.poll(async () => (await odile.page.getByTestId('vote-comparisons').allTextContents()).map(Number).reduce((a, b) => a + b, 0)).toBe(6);
  await checkScreen(odile.page, 'vote-ranking');

  // Odile closes it; Tobias is told it is closed.
  await odile.page.getByTestId('vote-close').click();
  await odile.page.getByTestId('confirm-accept').click();
  await expect(odile.page.getByTestId('vote-state')).toHaveText('closed');
  await tobias.page.reload();
  await expect(tobias.page.getByRole('heading', { name: 'This vote is closed' })).toBeVisible();
  await odile.context.close();
  await tobias.context.close();
});
