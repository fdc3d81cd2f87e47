import { expect, test, type Browser, type Page } from '@playwright/test';
import { memberPage } from './helpers/community';
import { checkScreen } from './helpers/screen-check';

// Every screen as a visitor, a member, a moderator and an admin of the demo club: screenshots at
// 1280 and 360 px in .tmp/screens, nothing wider than the page at 360 px, and no serious or critical
// accessibility violation on the paper or the dark ground.

const MEMBER = 'maren@example.test';
const MODERATOR = 'tobias@example.test';
const ADMIN = 'odile@example.test';

interface DemoIds {
  entryId: string;
  boardId: string;
  designId: string;
}

/** A published bar, and one of the member's boards with a design on it (demo data). */
async function demoIds(page: Page): Promise<DemoIds> {
  const entries = (await (await page.request.get('/api/entries?pageSize=1')).json()) as { items: { id: string }[] };
  const boards = (await (await page.request.get('/api/boards')).json()) as { mine: { id: string; designCount: number }[] };
  const board = boards.mine.find((b) => b.designCount > 0) ?? boards.mine[0];
  const detail = (await (await page.request.get(`/api/boards/${board.id}`)).json()) as { designs: { id: string; deletedAt: string | null }[] };
  return { entryId: entries.items[0].id, boardId: board.id, designId: detail.designs.find((d) => !d.deletedAt)!.id };
}

async function visit(page: Page, path: string, name: string, ready: (page: Page) => Promise<void> = async () => undefined): Promise<void> {
  await page.goto(path);
  await expect(page.locator('main')).toBeVisible();
  await ready(page);
  await checkScreen(page, name);
}

async function signedIn(browser: Browser, email: string) {
  return memberPage(browser, email);
}

test.describe.configure({ timeout: 240_000 });

test('every screen a visitor reaches', async ({ page }) => {
  await page.setViewportSize({ width: 1280, height: 800 });
  await visit(page, '/', 'every-home-visitor', (p) => expect(p.getByTestId('showcase')).toBeVisible());
  // What Barwright is for, above the fold of a 1280 × 800 screen.
  const pitch = await page.locator('#home-title').boundingBox();
  console.log(`home pitch for a visitor at y ${Math.round(pitch!.y)} px`);
  expect.soft(pitch!.y + pitch!.height).toBeLessThan(800);
  // The dark ground as the footer's toggle sets it: the logo's tile keeps its steel.
  await page.getByTestId('ground-toggle').click();
  await page.screenshot({ path: '.tmp/screens/every-home-visitor-dark-1280.png' });
  await page.getByTestId('ground-toggle').click();
  await visit(page, '/explore', 'every-explore-grid', (p) => expect(p.getByTestId('explore-grid')).toBeVisible());
  await visit(page, '/explore?view=table', 'every-explore-table', (p) => expect(p.getByTestId('explore-table')).toBeVisible());
  // At 1280 px the table fits its column: every heading, Comments and Published included, in sight.
  const fit = await page.locator('bw-explore-table .scroller').evaluate((el) => ({ table: el.scrollWidth, box: el.clientWidth }));
  console.log(`explore table at 1280 px: ${fit.table} px in a ${fit.box} px box`);
  expect.soft(fit.table).toBeLessThanOrEqual(fit.box);
  // Browsing by phase schedule: the demo's one moiré, named in its row.
  await page.goto('/explore?view=table&schedule=sine');
  await expect(page.getByTestId('explore-row')).toHaveCount(1);
  await expect(page.getByTestId('explore-row-schedule')).toHaveText('Moiré');
  const { items } = (await (await page.request.get('/api/entries?pageSize=1')).json()) as { items: { id: string }[] };
  await visit(page, `/entries/${items[0].id}`, 'every-entry-visitor', (p) => expect(p.getByTestId('entry-title')).toBeVisible());
  await visit(page, '/account/sign-in', 'every-sign-in');
  await visit(page, '/account/sign-up', 'every-sign-up');
  await visit(page, '/account/forgot-password', 'every-forgot-password');
  // A reset mail, so the local mailbox has a message to show (a long link in it, too).
  await page.getByTestId('forgot-email').fill(MEMBER);
  await page.getByTestId('forgot-submit').click();
  await expect(page.getByTestId('forgot-done')).toBeVisible();
  await visit(page, '/mailbox', 'every-mailbox', (p) => expect(p.getByTestId('mailbox-message').first()).toBeVisible());
  await page.getByTestId('mailbox-message').first().click();
  await checkScreen(page, 'every-mailbox-message');
  await visit(page, '/no-such-page', 'every-not-found');
});

test('every screen a member reaches', async ({ browser }) => {
  const { context, page } = await signedIn(browser, MEMBER);
  const ids = await demoIds(page);
  await visit(page, '/', 'every-home-member', (p) => expect(p.getByTestId('home-welcome')).toBeVisible());
  await visit(page, '/boards', 'every-boards', (p) => expect(p.getByTestId('board-card').first()).toBeVisible());
  await visit(page, `/boards/${ids.boardId}`, 'every-board', (p) => expect(p.getByTestId('board-name')).toBeVisible());
  await page.getByTestId('design-new').click();
  await expect(page.getByTestId('new-design-title')).toBeVisible();
  await checkScreen(page, 'every-new-design-dialog');
  await page.keyboard.press('Escape');
  await visit(page, `/studio/${ids.designId}`, 'every-studio', (p) => expect(p.getByTestId('studio-title')).toBeVisible());
  await visit(page, `/entries/${ids.entryId}`, 'every-entry-member', (p) => expect(p.getByTestId('entry-title')).toBeVisible());
  await visit(page, '/notifications', 'every-notifications');
  await visit(page, '/account/profile', 'every-profile');
  await visit(page, '/rosettes/measured', 'every-measured-rosette');
  await context.close();
});

test('every screen a moderator reaches', async ({ browser }) => {
  const { context, page } = await signedIn(browser, MODERATOR);
  await visit(page, '/', 'every-home-moderator', (p) => expect(p.getByTestId('showcase')).toBeVisible());
  for (const desk of ['reports', 'hidden', 'showcase', 'audit']) await visit(page, `/moderation/${desk}`, `every-moderation-${desk}`);
  await context.close();
});

test('every screen an admin reaches', async ({ browser }) => {
  const { context, page } = await signedIn(browser, ADMIN);
  await visit(page, '/admin/people', 'every-people');
  await visit(page, '/boards', 'every-boards-admin');
  await context.close();
});
