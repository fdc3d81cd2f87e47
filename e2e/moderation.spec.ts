import { expect, test, type Page } from '@playwright/test';
import { entryIdByTitle } from './helpers/api';
import { memberPage } from './helpers/community';
import { SCREEN_DIR, shoot } from './helpers/screens';

const MOIRE = 'Dial moiré, thirty-six lobes';
const BASKET = 'Eighteen-lobe basket weave';
const SPAM = `Cheap rosettes, all sizes, at example.test/shop ${Date.now().toString(36)}`;
const HIDE_REASON = 'Advertising is not allowed in the guild’s comments.';

/** Full-page shots start from the top, with no passing snack bar over the page. */
async function shootFromTop(page: Page, name: string): Promise<void> {
  await calm(page);
  await page.evaluate(() => window.scrollTo(0, 0));
  await shoot(page, name);
}

/** A dialog is shot as the screen shows it (a full-page shot would stretch the backdrop), at both widths. */
async function shootDialog(page: Page, name: string): Promise<void> {
  await calm(page);
  for (const width of [1280, 360]) {
    await page.setViewportSize({ width, height: width === 360 ? 740 : 800 });
    await page.waitForTimeout(150);
    await page.screenshot({ path: `${SCREEN_DIR}/${name}-${width}.png` });
  }
  await page.setViewportSize({ width: 1280, height: 800 });
}

/** Closes any snack bar still showing. */
async function calm(page: Page): Promise<void> {
  const dismiss = page.locator('mat-snack-bar-container button');
  if (await dismiss.count()) await dismiss.first().click();
  await expect(page.locator('mat-snack-bar-container')).toHaveCount(0);
}

/** The entry ids the showcase list shows, in order. */
const curatedOrder = (page: Page) => page.getByTestId('curation-item').evaluateAll((items) => items.map((i) => i.getAttribute('data-entry-id')));

/** Features a bar from the curation page: find it, write the note, add it. */
async function feature(page: Page, title: string, note: string): Promise<void> {
  await page.getByTestId('feature-search').fill(title);
  await page.getByRole('option', { name: new RegExp(title) }).click();
  await page.getByTestId('feature-note').fill(note);
  await page.getByTestId('feature-submit').click();
  await expect(page.getByTestId('curation-item').filter({ hasText: title })).toBeVisible();
}

test.describe.configure({ mode: 'serial' });

test('a moderator curates the showcase and hides a reported comment; members see the order, the author the reason, the log both', async ({ browser }) => {
  test.setTimeout(180_000);
  const tobias = await memberPage(browser, 'tobias@example.test'); // the moderator
  const saskia = await memberPage(browser, 'saskia@example.test'); // writes the comment
  const ibrahim = await memberPage(browser, 'ibrahim@example.test'); // reports it
  const moire = await entryIdByTitle(tobias.page, MOIRE);
  const basket = await entryIdByTitle(tobias.page, BASKET);

  // The moderator reaches the desk from the top bar, and features two bars with a note each.
  await tobias.page.goto('/');
  await tobias.page.getByTestId('nav-moderation').click();
  await expect(tobias.page.getByTestId('desk-tab-reports')).toHaveAttribute('aria-selected', 'true');
  await tobias.page.getByTestId('desk-tab-showcase').click();
  // The demo opens with the curator's earlier picks; take them out first (confirmed each time).
  await expect(tobias.page.getByTestId('curation-item').first()).toBeVisible();
  while ((await tobias.page.getByTestId('curation-item').count()) > 0) {
    const before = await tobias.page.getByTestId('curation-item').count();
    await tobias.page.getByTestId('curation-item').first().getByTestId('curation-remove').click();
    await tobias.page.getByTestId('confirm-accept').click();
    await expect(tobias.page.getByTestId('curation-item')).toHaveCount(before - 1);
  }
  await expect(tobias.page.getByTestId('curation-empty')).toBeVisible();
  await feature(tobias.page, MOIRE, 'Saskia’s dial pattern: the drift of the moiré is even across the whole plate.');
  await feature(tobias.page, BASKET, 'A basket weave that cuts clean in A2; the trial and the keeper match.');
  expect(await curatedOrder(tobias.page)).toEqual([moire, basket]);

  // Reorder by dragging the basket weave above the moiré…
  const handle = tobias.page.getByTestId('curation-item').nth(1).getByTestId('curation-handle');
  const first = await tobias.page.getByTestId('curation-item').nth(0).boundingBox();
  const box = (await handle.boundingBox())!;
  await tobias.page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await tobias.page.mouse.down();
  for (let step = 1; step <= 12; step++) await tobias.page.mouse.move(box.x + box.width / 2, box.y + box.height / 2 - ((box.y - first!.y + 20) * step) / 12);
  await tobias.page.mouse.up();
  await expect.poll(() => curatedOrder(tobias.page)).toEqual([basket, moire]);
  // …and by keyboard: down, then back up, with the move buttons.
  // The move buttons wait while the previous order is being saved: press only once they are enabled again.
  const moveDown = tobias.page.getByRole('button', { name: `Move ${BASKET} down` });
  await expect(moveDown).toBeEnabled();
  await moveDown.focus();
  await tobias.page.keyboard.press('Enter');
  await expect.poll(() => curatedOrder(tobias.page)).toEqual([moire, basket]);
  const moveUp = tobias.page.getByRole('button', { name: `Move ${BASKET} up` });
  await expect(moveUp).toBeEnabled();
  await moveUp.focus();
  await tobias.page.keyboard.press('Enter');
  await expect.poll(() => curatedOrder(tobias.page)).toEqual([basket, moire]);
  await expect(tobias.page.getByTestId('curation-note').first()).toContainText('cuts clean in A2');
  await shootFromTop(tobias.page, 'moderation-showcase');

  // Members and visitors: the home page opens on the showcase, in the chosen order, then new and top-rated bars.
  await ibrahim.page.goto('/');
  const shown = ibrahim.page.getByTestId('showcase-item');
  await expect(shown).toHaveCount(2);
  await expect(shown.nth(0)).toHaveAttribute('data-entry-id', basket);
  await expect(shown.nth(1)).toHaveAttribute('data-entry-id', moire);
  await expect(shown.nth(0).getByTestId('showcase-note')).toHaveText('A basket weave that cuts clean in A2; the trial and the keeper match.');
  await expect(ibrahim.page.getByTestId('home-newest').getByTestId('entry-card')).toHaveCount(4);
  await expect(ibrahim.page.getByTestId('home-top').getByTestId('entry-card').first()).toBeVisible();
  await shootFromTop(ibrahim.page, 'home-showcase-member');
  const visitor = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const visitorPage = await visitor.newPage();
  await visitorPage.goto('/');
  await expect(visitorPage.getByTestId('showcase-item').first()).toHaveAttribute('data-entry-id', basket);
  await expect(visitorPage.getByTestId('home-sign-up')).toBeVisible();
  await shootFromTop(visitorPage, 'home-showcase-visitor');

  // Saskia comments on the basket weave; Ibrahim reports the comment as spam.
  await saskia.page.goto(`/entries/${basket}`);
  await saskia.page.getByTestId('comment-new-body').fill(SPAM);
  await saskia.page.getByTestId('comment-new-submit').click();
  await expect(saskia.page.getByTestId('comment').filter({ hasText: SPAM })).toBeVisible();
  // Saskia heard that her moiré was featured, with the curator's note.
  await saskia.page.goto('/notifications');
  await expect(saskia.page.getByTestId('notification').filter({ hasText: `Tobias Greenhalgh featured your bar “${MOIRE}” in the showcase` })).toBeVisible();
  await saskia.page.goto(`/entries/${basket}`);
  await expect(saskia.page.getByTestId('comment').filter({ hasText: SPAM }).getByTestId('comment-report')).toHaveCount(0); // not one's own
  await ibrahim.page.goto(`/entries/${basket}`);
  const reported = ibrahim.page.getByTestId('comment').filter({ hasText: SPAM });
  await reported.getByTestId('comment-report').click();
  await ibrahim.page.getByTestId('report-send').click();
  await expect(ibrahim.page.getByRole('alert').filter({ hasText: 'Choose a reason' })).toBeVisible();
  await ibrahim.page.getByRole('radio', { name: /^Spam/ }).check();
  await ibrahim.page.getByTestId('report-details').fill('An advert for a shop, nothing about the bar.');
  await shootDialog(ibrahim.page, 'report-dialog');
  await ibrahim.page.getByTestId('report-send').click();
  await expect(ibrahim.page.getByText('The moderators will look at it.')).toBeVisible();
  await expect(ibrahim.page.getByRole('dialog')).toHaveCount(0);
  // A second report of the same comment is refused while the first is open.
  await reported.getByTestId('comment-report').click();
  await ibrahim.page.getByRole('radio', { name: /^Offensive/ }).check();
  await ibrahim.page.getByTestId('report-send').click();
  await expect(ibrahim.page.getByTestId('report-problem')).toContainText('You have reported this already');
  await ibrahim.page.keyboard.press('Escape');
  await expect(ibrahim.page.getByRole('dialog')).toHaveCount(0);

  // The moderator's top bar counts the open report live, without a reload.
  await expect(tobias.page.getByTestId('nav-badge')).toHaveText('1');
  // The moderator finds it on the desk, in context, and hides it with a reason for its author.
  await tobias.page.getByTestId('desk-tab-reports').click();
  const item = tobias.page.getByTestId('case').filter({ hasText: SPAM });
  await expect(item).toBeVisible();
  await expect(item.getByTestId('case-report')).toContainText('Spam');
  await expect(item.getByTestId('case-report')).toContainText('Ibrahim Coldwell · 1 report filed, 0 upheld');
  await shootFromTop(tobias.page, 'moderation-reports');
  await item.getByTestId('case-hide').click();
  await tobias.page.getByTestId('decision-confirm').click();
  await expect(tobias.page.getByText('The reason is required')).toBeVisible();
  await tobias.page.getByTestId('decision-words').fill(HIDE_REASON);
  await shootDialog(tobias.page, 'moderation-hide-dialog');
  await tobias.page.getByTestId('decision-confirm').click();
  await expect(item.getByTestId('case-hidden')).toBeVisible();
  await expect(tobias.page.getByTestId('nav-badge')).toHaveCount(0);
  await tobias.page.getByTestId('desk-tab-hidden').click();
  await expect(tobias.page.getByTestId('case').filter({ hasText: SPAM }).getByTestId('case-restore')).toBeVisible();
  // Cancel means cancel: the restore dialog closed with Cancel restores nothing.
  await tobias.page.getByTestId('case').filter({ hasText: SPAM }).getByTestId('case-restore').click();
  await tobias.page.getByTestId('decision-cancel').click();
  await expect(tobias.page.getByRole('dialog')).toHaveCount(0);
  await expect(tobias.page.getByTestId('case').filter({ hasText: SPAM }).getByTestId('case-hidden')).toBeVisible();
  await shootFromTop(tobias.page, 'moderation-hidden');

  // Gone for members and visitors; shown to its author with the reason.
  await ibrahim.page.reload();
  await expect(ibrahim.page.getByTestId('entry-title')).toHaveText(BASKET);
  await expect(ibrahim.page.getByTestId('entry-comments')).not.toContainText(SPAM);
  await visitorPage.goto(`/entries/${basket}`);
  await expect(visitorPage.getByTestId('entry-title')).toHaveText(BASKET);
  await expect(visitorPage.getByTestId('entry-comments')).not.toContainText(SPAM);
  await saskia.page.reload();
  const own = saskia.page.getByTestId('comment').filter({ hasText: SPAM });
  await expect(own.getByTestId('comment-hidden')).toContainText(HIDE_REASON);
  await shootFromTop(saskia.page, 'entry-hidden-comment-author');
  // …and she was told, in the app (the bell) as well as by e-mail.
  await saskia.page.goto('/notifications');
  await expect(saskia.page.getByTestId('notification').filter({ hasText: `The moderators hid your comment on “${BASKET}”. Reason: ${HIDE_REASON}` })).toBeVisible();
  await shootFromTop(saskia.page, 'notifications-moderation');

  // The audit log shows both: the featuring and the hiding, with who, what and why.
  await tobias.page.getByTestId('desk-tab-audit').click();
  const lines = tobias.page.getByTestId('audit-line');
  await expect(lines.filter({ hasText: `Tobias Greenhalgh hid comment on “${BASKET}” (by Saskia Penrose)` })).toContainText(HIDE_REASON);
  await expect(lines.filter({ hasText: `Tobias Greenhalgh featured “${BASKET}”` })).toHaveCount(1);
  await expect(lines.filter({ hasText: `Tobias Greenhalgh featured “${MOIRE}”` })).toHaveCount(1);
  // Each reorder says what moved: the drag and the arrow up moved the basket weave to the top, the arrow down back.
  await expect(lines.filter({ hasText: `Tobias Greenhalgh moved “${BASKET}” from place 2 to 1 in the showcase` })).toHaveCount(2);
  await expect(lines.filter({ hasText: `Tobias Greenhalgh moved “${BASKET}” from place 1 to 2 in the showcase` })).toHaveCount(1);
  await shootFromTop(tobias.page, 'moderation-audit');
  // One item's history, by its title: from a line, from the desk's case, and from the bar's own page.
  await lines.filter({ hasText: `featured “${BASKET}”` }).getByRole('button', { name: `Only lines about ${BASKET}` }).click();
  await expect(tobias.page.getByTestId('audit-item-title')).toHaveText(`the bar “${BASKET}”`);
  await expect(lines).toHaveCount(4); // featured, and moved three times
  await shootFromTop(tobias.page, 'moderation-audit-item');
  await tobias.page.getByTestId('audit-item-clear').click();
  await expect(tobias.page.getByTestId('audit-item')).toHaveCount(0);
  await tobias.page.getByTestId('desk-tab-hidden').click();
  await tobias.page.getByTestId('case').filter({ hasText: SPAM }).getByTestId('case-audit').click();
  await expect(tobias.page.getByTestId('audit-item-title')).toHaveText(`comment on “${BASKET}”`);
  await expect(lines).toHaveCount(1);
  await tobias.page.goto(`/entries/${moire}`);
  await tobias.page.getByTestId('moderator-menu').click();
  await tobias.page.getByTestId('moderator-menu-audit').click();
  await expect(tobias.page.getByTestId('audit-item-title')).toHaveText(`the bar “${MOIRE}”`);
  await expect(lines.filter({ hasText: `Tobias Greenhalgh featured “${MOIRE}”` })).toHaveCount(1);
  await tobias.page.getByTestId('desk-tab-audit').click();
  await tobias.page.getByTestId('audit-filter-action').click();
  await tobias.page.getByRole('option', { name: 'Hidden' }).click();
  await expect(tobias.page).toHaveURL(/action=item.hide/);
  await expect(lines).toHaveCount(1);
  await expect(tobias.page.getByTestId('audit-total')).toHaveText('1 entry match');

  // A member does not reach the desk, and sees no moderation menu on a bar.
  await ibrahim.page.goto(`/entries/${moire}`);
  await expect(ibrahim.page.getByTestId('entry-title')).toHaveText(MOIRE);
  await expect(ibrahim.page.getByTestId('moderator-menu')).toHaveCount(0);
  await ibrahim.page.goto('/moderation/reports');
  await expect(ibrahim.page).toHaveURL(/\/$/);
  expect((await ibrahim.page.request.get('/api/moderation/queue')).status()).toBe(403);

  for (const c of [tobias.context, saskia.context, ibrahim.context, visitor]) await c.close();
});

test('an admin changes a role only after confirming with a reason, can undo it, and finds both in the audit log', async ({ browser }) => {
  test.setTimeout(120_000);
  const odile = await memberPage(browser, 'odile@example.test'); // the admin
  const page = odile.page;
  await page.goto('/admin/people');
  const row = page.getByTestId('people-row').filter({ hasText: 'ibrahim@example.test' });
  await expect(row).toHaveCount(1);
  // The intro names every role; the verification column says what it holds; no red button on every row.
  for (const role of ['Designs bars on their boards', 'Also works the moderation desk', 'Also manages people on this page']) await expect(page.getByTestId('people-roles')).toContainText(role);
  await expect(page.getByRole('columnheader', { name: 'E-mail verified' })).toBeVisible();
  await expect(row.getByTestId('people-verified')).toHaveText('Yes');
  await expect(page.getByTestId('people-suspend')).toHaveCount(0);
  await shootFromTop(page, 'people');

  // Choosing Admin asks first; cancelling leaves the role as it was.
  await row.getByTestId('people-role-select').click();
  await page.getByTestId('people-role-admin').click();
  await expect(page.getByRole('dialog')).toContainText('Make Ibrahim Coldwell an admin?');
  await page.getByTestId('account-change-cancel').click();
  await expect(row.getByTestId('people-role-select')).toContainText('Member');

  // Confirming needs a reason; then the change applies, and the snack bar offers to undo it.
  await row.getByTestId('people-role-select').click();
  await page.getByTestId('people-role-moderator').click();
  await page.getByTestId('account-change-confirm').click();
  await expect(page.getByText('The reason is required')).toBeVisible();
  await page.getByTestId('account-change-reason').fill('Helps with the reports queue on weekends');
  await shootDialog(page, 'people-role-dialog');
  await page.getByTestId('account-change-confirm').click();
  await expect(row.getByTestId('people-role-select')).toContainText('Moderator');
  // (The snack bar leaving and the next one arriving overlap: find each by its words.)
  const snack = page.locator('mat-snack-bar-container').filter({ hasText: 'Ibrahim Coldwell is now a moderator.' });
  await expect(snack).toBeVisible();
  await snack.getByRole('button', { name: 'Undo' }).click();
  await expect(row.getByTestId('people-role-select')).toContainText('Member');
  await expect(page.locator('mat-snack-bar-container').filter({ hasText: 'Undone: Ibrahim Coldwell is now a member.' })).toBeVisible();

  // Suspending lives in the row's menu, with its own confirmation and reason; here it is only opened.
  await calm(page); // the snack bar first: the open menu's backdrop would cover its button
  await row.getByTestId('people-more').click();
  await expect(page.getByTestId('people-suspend')).toBeVisible();
  await shootDialog(page, 'people-row-menu');
  // The menu leads to the account's history: the change with its reason, and the undo. (The narrow
  // shot redrew the table, which closed the menu: open it again.)
  await page.keyboard.press('Escape');
  await row.getByTestId('people-more').click();
  await page.getByTestId('people-history').click();
  await expect(page.getByTestId('audit-item-title')).toHaveText('the account of Ibrahim Coldwell');
  const lines = page.getByTestId('audit-line');
  await expect(lines).toHaveCount(2);
  await expect(lines.nth(0)).toContainText('Odile Farrant undid the role change of Ibrahim Coldwell: moderator → member');
  await expect(lines.nth(1)).toContainText('Odile Farrant changed the role of Ibrahim Coldwell: member → moderator');
  await expect(lines.nth(1).getByTestId('audit-reason')).toHaveText('“Helps with the reports queue on weekends”');
  await shootFromTop(page, 'audit-account');
  await odile.context.close();
});
