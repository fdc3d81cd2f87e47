import { expect, test, type Page } from '@playwright/test';
import { apiSend } from './helpers/api';
import { acceptInvitationByMail, createBoard, invite } from './helpers/boards';
import { memberPage } from './helpers/community';
import { checkScreen } from './helpers/screen-check';
import { shoot } from './helpers/screens';

const stamp = Date.now().toString(36);

test.describe.configure({ mode: 'serial' });

/** The sum of the ranking's comparison counts on the vote page. */
const comparisons = async (page: Page) => (await page.getByTestId('vote-comparisons').allTextContents()).map(Number).reduce((a, b) => a + b, 0);

test('a member sweeps 3 rosettes × 2 rubbers × 2 travels, filters out detail loss, compares two, shortlists three to a board and opens a vote; a second member answers; the ranking updates live', async ({ browser }) => {
  test.setTimeout(600_000);
  const odile = await memberPage(browser, 'odile@example.test');
  const tobias = await memberPage(browser, 'tobias@example.test');
  const board = `Sweep picks ${stamp}`;
  const boardId = await createBoard(odile.page, board);
  await invite(odile.page, 'tobias@example.test', 'viewer');

  // From the rack to the sweep: Odile's three rosettes, her first rubber, travel and end mill to start with.
  await odile.page.goto('/rack');
  await odile.page.getByTestId('rack-sweep-link').click();
  await expect(odile.page).toHaveURL(/\/rack\/sweep$/);
  await expect(odile.page.getByTestId('sweep-count')).toHaveText('3 rosettes × 1 rubber × 1 travel × 1 cutter = 3 bars');
  await odile.page.getByTestId('sweep-rubber').nth(1).click();
  await odile.page.getByTestId('sweep-travel').nth(1).click();
  await expect(odile.page.getByTestId('sweep-count')).toHaveText('3 rosettes × 2 rubbers × 2 travels × 1 cutter = 12 bars');
  await checkScreen(odile.page, 'sweep-choices');

  // Run: the results stream into the grid until all twelve are in.
  await odile.page.getByTestId('sweep-run').click();
  const progress = odile.page.getByTestId('sweep-progress');
  await expect(progress).toHaveAttribute('data-total', '12');
  await expect(progress).toHaveAttribute('data-state', 'done', { timeout: 60_000 });
  await expect(progress).toHaveAttribute('data-done', '12');
  await expect(odile.page.getByTestId('sweep-shown-count')).toHaveText('Showing 12 of 12');
  await expect(odile.page.getByTestId('sweep-card').first()).toBeVisible();
  // Every thumbnail in view is drawn (under load they come a few seconds after the figures).
  for (const thumb of await odile.page.getByTestId('sweep-thumb').all()) await expect(thumb).toHaveAttribute('data-drawn', 'true', { timeout: 60_000 });
  const lossCards = await odile.page.locator('[data-testid="sweep-card"][data-loss="yes"]').count();
  expect(lossCards, 'some of these bars lose detail, or the filter has nothing to show').toBeGreaterThan(0);
  await checkScreen(odile.page, 'sweep-grid');

  await expect(odile.page.getByTestId('sweep-card').first()).toContainText('Round 1 · Short');

  // Filter out detail loss above 1 mm (every one of these bars loses some with the matched 3/16 in follower).
  await odile.page.getByTestId('sweep-filter-loss').click();
  await expect(odile.page.getByTestId('sweep-shown-count')).toHaveText(/^Showing \d of 12$/);
  await expect(odile.page.locator('[data-testid="sweep-card"][data-loss="yes"]')).toHaveCount(0);
  await odile.page.getByTestId('sweep-filter-loss-limit').fill('1');
  await odile.page.getByTestId('sweep-filter-loss-limit').press('Enter');
  await odile.page.getByTestId('sweep-filter-loss-limit').blur();
  await expect(odile.page.getByTestId('sweep-shown-count')).not.toHaveText('Showing 0 of 12');
  for (const loss of await odile.page.getByTestId('sweep-card-loss').allTextContents()) {
    const mm = loss === 'no' ? 0 : Number(loss.match(/yes, ([\d.]+) mm/)![1]);
    expect(mm).toBeLessThanOrEqual(1);
  }
  const kept = Number((await odile.page.getByTestId('sweep-shown-count').textContent())!.match(/Showing (\d+)/)![1]);
  expect(kept).toBeGreaterThanOrEqual(2);

  // Compare two of them side by side.
  const cards = odile.page.getByTestId('sweep-card');
  await cards.nth(0).getByTestId('sweep-compare-pick').click();
  await cards.nth(1).getByTestId('sweep-compare-pick').click();
  await odile.page.getByTestId('sweep-compare').click();
  await expect(odile.page.getByTestId('compare-dialog')).toBeVisible();
  await expect(odile.page.getByTestId('compare-column')).toHaveCount(2);
  // Each plate drawn before the picture (as the compare journey waits for them); a plate is drawn once on the screen.
  for (const plate of await odile.page.getByTestId('compare-study-lit').all()) {
    await plate.scrollIntoViewIfNeeded();
    await expect(plate).not.toHaveAttribute('data-drawn', '0', { timeout: 60_000 });
  }
  await shoot(odile.page, 'sweep-compare');
  await odile.page.getByTestId('compare-close').click();

  // Shown and opposite of one card: the pair's passes are said.
  await cards.nth(0).getByTestId('sweep-opposite').click();
  await expect(odile.page.getByTestId('opposite-passes')).toBeVisible({ timeout: 90_000 });
  await expect(odile.page.getByTestId('opposite-profile-opposite')).toBeVisible();
  await shoot(odile.page, 'sweep-opposite');
  await odile.page.getByTestId('opposite-close').click();

  // Shortlist three (the filter off again if fewer than three are left) and send them to the board.
  if (kept < 3) await odile.page.getByTestId('sweep-filter-loss').click();
  for (const i of [0, 1, 2]) await cards.nth(i).getByTestId('sweep-star').click();
  await expect(odile.page.getByTestId('sweep-shortlist-item')).toHaveCount(3);
  await checkScreen(odile.page, 'sweep-shortlist');
  await odile.page.getByTestId('sweep-send').click();
  await odile.page.getByTestId('shortlist-board').click();
  await odile.page.getByRole('option', { name: board }).click();
  await odile.page.getByTestId('shortlist-send').click();
  await expect(odile.page.getByTestId('shortlist-sent')).toContainText('3 bar designs are on');
  await shoot(odile.page, 'sweep-sent');

  // Save the sweep and reopen it: choices and stars come back and the results are recomputed.
  await odile.page.keyboard.press('Escape');
  await odile.page.getByTestId('sweep-name').fill(`Guild sweep ${stamp}`);
  await odile.page.getByTestId('sweep-save').click();
  await expect(odile.page).toHaveURL(/\/rack\/sweep\/[0-9a-f-]{36}$/);
  await odile.page.reload();
  await expect(odile.page.getByTestId('sweep-count')).toHaveText('3 rosettes × 2 rubbers × 2 travels × 1 cutter = 12 bars');
  await expect(odile.page.getByTestId('sweep-progress')).toHaveAttribute('data-state', 'done', { timeout: 60_000 });
  await expect(odile.page.getByTestId('sweep-shortlist-item')).toHaveCount(3);

  // On the board, the three designs; Odile opens a vote over them.
  await odile.page.goto(`/boards/${boardId}`);
  await odile.page.getByTestId('vote-open').click();
  await expect(odile.page.getByTestId('vote-design')).toHaveCount(3);
  await odile.page.getByTestId('vote-question').fill(`Which of the sweep's bars would you cut? ${stamp}`);
  await odile.page.getByTestId('vote-open-submit').click();
  await odile.page.waitForURL(/\/votes\/[0-9a-f-]{36}$/);
  const voteUrl = new URL(odile.page.url()).pathname;
  await expect(odile.page.getByTestId('vote-rank')).toHaveCount(3);
  await expect(odile.page.getByTestId('vote-live')).toBeVisible();

  // Tobias, in his own browser, joins the board and answers the pairs; Odile's ranking moves without a reload.
  await acceptInvitationByMail(tobias.page, 'tobias@example.test', board);
  await tobias.page.getByTestId('board-vote-link').filter({ hasText: stamp }).click();
  await expect(tobias.page).toHaveURL(voteUrl);
  await tobias.page.getByTestId('vote-pick-a').click();
  await expect.poll(() => comparisons(odile.page)).toBe(2);
  await tobias.page.getByTestId('vote-pick-tie').click();
  await expect.poll(() => comparisons(odile.page)).toBe(4);
  await tobias.page.getByTestId('vote-pick-b').click();
  await expect(tobias.page.getByTestId('vote-done')).toBeVisible();
  await expect.poll(() => comparisons(odile.page)).toBe(6);
  await odile.context.close();
  await tobias.context.close();
});

test('a sweep past 5 000 bars is refused with the message saying how to narrow it', async ({ browser }) => {
  test.setTimeout(240_000);
  const maren = await memberPage(browser, 'maren@example.test');
  // A bigger shop than the demo's: ten rubbers and ten travel settings (Maren's 30-odd rosettes × 10 × 10 × 2 end mills: over 6 000).
  const rubbers = Array.from({ length: 10 }, (_, i) => ({ shape: 'round', radius: 0.5 * (i + 1) }));
  const travels = Array.from({ length: 10 }, (_, i) => ({ travelPerRev: 50 + 10 * i, leverRatio: 1 }));
  const cutters = [{ diameter: 3, flutes: 2 }, { diameter: 4.7625, flutes: 2 }];
  await apiSend(maren.page, 'put', '/api/rack/shop', { units: 'mm', rubbers, travels, cutters, followers: [{ radius: 1.5 }], vCutters: [] });
  await maren.page.goto('/rack/sweep');
  await expect(maren.page.getByTestId('sweep-count')).toHaveText(/^3\d rosettes × 1 rubber × 1 travel × 1 cutter = 3\d bars$/);
  for (const id of ['sweep-rubber', 'sweep-travel', 'sweep-cutter']) {
    const boxes = maren.page.getByTestId(id);
    for (let i = 1; i < (await boxes.count()); i++) await boxes.nth(i).click();
  }
  await expect(maren.page.getByTestId('sweep-count')).toHaveText(/^3\d rosettes × 10 rubbers × 10 travels × 2 cutters = \d+ bars$/);
  await expect(maren.page.getByTestId('sweep-run')).toBeDisabled();
  await expect(maren.page.getByTestId('sweep-refusal')).toContainText('a sweep takes at most 5 000; narrow it by choosing rosettes by tag or by hand');
  await maren.context.close();
});
