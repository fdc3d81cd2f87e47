import { expect, test, type Page } from '@playwright/test';
import { signIn } from './helpers/accounts';
import { createBoard, createDesign } from './helpers/boards';
import { shoot } from './helpers/screens';

/** Opens one parameter panel of the studio by its id (rosette, rubber, cutter, study, plan). */
async function openPanel(page: Page, id: string): Promise<void> {
  const panel = page.getByTestId(`panel-${id}`);
  if ((await panel.getAttribute('class'))?.includes('mat-expanded')) return;
  await panel.getByRole('button').first().click();
}

test('a maker reads the tightest crest as a sharp corner and flips the engraved line for a machine that runs the other way', async ({ browser }) => {
  test.setTimeout(120_000);
  const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
  await signIn(page, 'maren@example.test');
  await createBoard(page, `Engraving direction ${Date.now()}`);
  const designId = await createDesign(page, 'Mirror or not', 'example');
  await page.goto(`/studio/${designId}`);
  await expect(page.getByTestId('connection-status')).toHaveAttribute('data-status', 'live');

  // The example's path crest (about 0.68 mm) is tighter than its 3/16 in cutter: the bar's crest is a sharp corner.
  await expect(page.locator('#profile-caption')).toContainText("the bar's crests come to a sharp corner");
  await expect(page.locator('#profile-caption')).not.toContainText('Infinity');
  // One warning per kind.
  const warnings = await page.getByTestId('profile-warnings').locator('li').allTextContents();
  expect(new Set(warnings.map((w) => w.split(' ').slice(0, 4).join(' '))).size).toBe(warnings.length);

  // The line study says it is the mirror of the bar, until the maker flips it.
  await expect(page.getByTestId('study-summary')).toContainText('Each line is the mirror of the bar');
  await openPanel(page, 'study');
  await page.getByTestId('field-study.direction').click();
  await page.getByRole('listbox').getByTestId('option-as-bar').click();
  await expect(page.getByTestId('study-summary')).toContainText('Each line runs the same way as the bar');
  await page.getByTestId('field-study.direction').scrollIntoViewIfNeeded();
  await shoot(page, 'studio-engraving-direction');
});
