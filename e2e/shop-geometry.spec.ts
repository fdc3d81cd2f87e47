import { expect, test, type Page } from '@playwright/test';
import { signIn } from './helpers/accounts';
import { createBoard, createDesign } from './helpers/boards';
import { shoot, wholePage } from './helpers/screens';

/** Opens one parameter panel of the studio by its id (rosette, rubber, cutter, study, plan). */
async function openPanel(page: Page, id: string): Promise<void> {
  const panel = page.getByTestId(`panel-${id}`);
  if ((await panel.getAttribute('class'))?.includes('mat-expanded')) return;
  await panel.getByRole('button').first().click();
}

/** Picks an option of a studio choice field. */
async function choose(page: Page, field: string, option: string): Promise<void> {
  await page.getByTestId(`field-${field}`).click();
  await page.getByRole('listbox').getByTestId(`option-${option}`).click();
}

test('a maker sets the cutter off the centre line on a rocking headstock, sees the before and after, the opposite blank and a measured table as read', async ({ browser }) => {
  test.setTimeout(120_000);
  const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
  await signIn(page, 'maren@example.test');
  await createBoard(page, `Shop geometry ${Date.now()}`);
  const designId = await createDesign(page, 'Off-centre 24-lobe bar', 'example');
  await page.goto(`/studio/${designId}`);
  await expect(page.getByTestId('connection-status')).toHaveAttribute('data-status', 'live');

  // Nothing set: no before and after, and the rule is the first reminder of the cut plan.
  await expect(page.getByTestId('profile-svg')).toBeVisible();
  await expect(page.getByTestId('profile-placement')).toHaveCount(0);
  await expect(page.getByTestId('plan-reminders').locator('li').first()).toContainText('never the cross slide');

  // Rocking 150 mm from the axis, the cutter 0.5 mm off the centre line.
  await openPanel(page, 'rubber');
  await choose(page, 'motion.pivot.kind', 'rocking');
  await expect(page.getByTestId('field-motion.pivot.distance')).toHaveValue('150');
  await openPanel(page, 'cutter');
  await page.getByTestId('field-cutter.offset').fill('0.5');
  await expect(page.getByTestId('profile-placement')).toContainText('0.5 mm off the centre line, rocking 150 mm from its axis: amplitude +0.33 %');
  await expect(page.getByTestId('profile-nominal')).toBeVisible();
  await expect(page.getByTestId('plan-reminders').locator('li').first()).toContainText('The profile models the cutter 0.5 mm off the centre line');
  await page.getByTestId('profile-svg').scrollIntoViewIfNeeded();
  await shoot(page, 'studio-cutter-placement');

  // The shown and opposite pair of the cut.
  await page.getByTestId('profile-companion').click();
  await page.getByRole('listbox').getByTestId('companion-opposite').click();
  await expect(page.getByTestId('profile-opposite')).toBeVisible();
  await expect(page.getByTestId('companion-note')).toContainText('above it the upper envelope');
  await page.getByTestId('profile-svg').scrollIntoViewIfNeeded();
  await shoot(page, 'studio-shown-and-opposite');

  // A measured layer: a new table is kept as read, and the panel says so; scaled on request.
  await openPanel(page, 'rosette');
  await choose(page, 'rosette.layers[0].wave.shape', 'measured');
  await expect(page.getByTestId('measured-scale-note')).toContainText('Kept as read: the radius rises and falls by the readings’ own 1.5 mm');
  await choose(page, 'rosette.layers[0].wave.scale', 'to-amplitude');
  await expect(page.getByTestId('measured-scale-note')).toContainText('Scaled: the readings’ shape is stretched to the layer’s amplitude, 1.5 mm');
  await page.getByTestId('measured-scale-note').scrollIntoViewIfNeeded();
  await shoot(page, 'studio-measured-scale');
  // On a phone the panels sit under their own tab.
  await page.setViewportSize({ width: 360, height: 740 });
  await page.getByTestId('pane-parameters').click();
  await page.evaluate(() => window.scrollTo(0, 0));
  await wholePage(page, '.tmp/screens/studio-shop-geometry-parameters-360.png');
});
