import fs from 'node:fs';
import { expect, test } from '@playwright/test';
import { createBoard, memberPage } from './helpers/community';
import { checkScreen } from './helpers/screen-check';

const stamp = Date.now().toString(36);

test.describe.configure({ mode: 'serial' });

test('a member edits a rosette, adds a rubber, exports and re-imports the rack, and makes a new design from a rosette', async ({ browser }) => {
  test.setTimeout(300_000);
  const { page, context } = await memberPage(browser, 'odile@example.test');
  const board = `Odile's trials ${stamp}`;
  await createBoard(page, board);

  // The rack is in the main menu.
  await page.getByTestId('nav-rack').click();
  await expect(page).toHaveURL(/\/rack$/);
  const rows = page.getByTestId('rack-rosette');
  await expect(rows.first()).toBeVisible();
  const before = await rows.count();
  await checkScreen(page, 'rack');

  // Filter by tag: only the measured one has neither "sine" nor "weave".
  await page.getByTestId('rack-tag-filter').getByText('weave', { exact: true }).click();
  await expect(rows).toHaveCount(1);
  await expect(rows.first().getByTestId('rack-rosette-name')).toHaveText('Guild barleycorn');
  await page.getByTestId('rack-tag-filter').getByText('weave', { exact: true }).click();
  await expect(rows).toHaveCount(before);

  // The measured rosette's editor draws the curve through its readings.
  const measured = rows.filter({ hasText: 'Guild lathe 18 (read)' });
  await measured.getByTestId('rack-rosette-more').click();
  await page.getByTestId('rack-rosette-edit').click();
  await expect(page.getByTestId('rosette-live-drawing').locator('circle.reading').first()).toBeVisible();
  await checkScreen(page, 'rack-rosette-measured');
  await page.getByRole('button', { name: 'Cancel' }).click();

  // Edit a rosette: the drawing follows the lobes as they are typed; the new name is listed.
  const sine = rows.filter({ hasText: 'Guild sine 24' });
  await sine.getByTestId('rack-rosette-more').click();
  await page.getByTestId('rack-rosette-edit').click();
  const edge = page.getByTestId('rosette-live-drawing').locator('path.edge');
  // The editor filled and drawn before the edit (a value typed before the rosette arrives is written over).
  await expect(page.getByTestId('rosette-lobes-0')).toHaveValue('24');
  await expect(edge).toHaveAttribute('d', /\d/);
  const drawnBefore = await edge.getAttribute('d');
  await page.getByTestId('rosette-lobes-0').fill('9');
  await expect(edge).not.toHaveAttribute('d', drawnBefore!);
  await page.getByTestId('rosette-name').fill(`Guild sine 9 ${stamp}`);
  await page.getByTestId('rosette-tags').fill('sine, bold');
  await checkScreen(page, 'rack-rosette-edit');
  await page.getByTestId('rosette-save').click();
  await expect(rows.filter({ hasText: `Guild sine 9 ${stamp}` })).toHaveCount(1);
  await expect(rows.filter({ hasText: `Guild sine 9 ${stamp}` })).toContainText('9 × sine');

  // Add a rubber of 1.5875 mm radius (1/16 in); the shop saves and keeps it.
  const shop = page.getByTestId('shop-editor');
  const rubbers = shop.getByTestId('shop-rubbers');
  const rubberCount = await rubbers.locator('[data-testid^="shop-rubber-size-"]').count();
  await shop.getByTestId('shop-add-rubbers').click();
  await shop.getByTestId(`shop-rubber-size-${rubberCount}`).fill('1.5875');
  await shop.getByTestId(`shop-rubber-size-${rubberCount}`).blur();
  await expect(rubbers).toContainText('1.59 mm');
  await shop.getByTestId('shop-save').click();
  await expect(shop.getByTestId('shop-save')).toBeDisabled();
  await page.reload();
  await expect(page.getByTestId(`shop-rubber-size-${rubberCount}`)).toHaveValue('1.5875');

  // Export the rack as a file.
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('rack-export').click()]);
  const path = `.tmp/rack-export-${stamp}.json`;
  await download.saveAs(path);
  const file = JSON.parse(fs.readFileSync(path, 'utf8'));
  expect(file.format).toBe('barwright.rack/1');
  expect(file.rosettes.map((r: { name: string }) => r.name)).toContain(`Guild sine 9 ${stamp}`);
  expect(file.shop.rubbers).toHaveLength(rubberCount + 1);

  // A broken file is refused field by field and nothing changes.
  const broken = structuredClone(file);
  broken.rosettes[0].rosette.baseRadius = -5;
  broken.shop.travels[0].leverRatio = 40;
  await page.getByTestId('rack-import-file').setInputFiles({ name: 'broken-rack.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(broken)) });
  await page.getByTestId('confirm-accept').click();
  const problems = page.getByTestId('rack-import-problems');
  await expect(problems).toContainText('Rosette 1, base radius');
  await expect(problems).toContainText('Shop, travel setting 1, lever ratio must be at most 10');
  await checkScreen(page, 'rack-import-refused');
  await expect(rows).toHaveCount(before);

  // The exported file, one rosette renamed, comes back whole.
  const renamed = structuredClone(file);
  const barleycorn = renamed.rosettes.findIndex((r: { name: string }) => r.name === 'Guild barleycorn');
  renamed.rosettes[barleycorn].name = `Reimported ${stamp}`;
  await page.getByTestId('rack-import-file').setInputFiles({ name: 'rack.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(renamed)) });
  await page.getByTestId('confirm-accept').click();
  await expect(rows.filter({ hasText: `Reimported ${stamp}` })).toHaveCount(1);
  await expect(rows).toHaveCount(before);
  await expect(problems).toHaveCount(0);
  await expect(page.getByTestId(`shop-rubber-size-${rubberCount}`)).toHaveValue('1.5875');

  // A new design from a rosette, on a chosen board, opens in the studio with that rosette.
  await rows.filter({ hasText: `Guild sine 9 ${stamp}` }).getByTestId('rack-rosette-design').click();
  await page.getByTestId('from-rosette-board').click();
  await page.getByRole('option', { name: board }).click();
  await page.getByTestId('from-rosette-title').fill(`From the rack ${stamp}`);
  await page.getByTestId('from-rosette-create').click();
  await page.waitForURL(/\/studio\/[0-9a-f-]{36}$/);
  await expect(page.getByTestId('studio-title')).toHaveText(`From the rack ${stamp}`);

  // The studio keeps a design's rosette in the rack and leads to the measured import under the rack.
  await page.getByTestId('studio-save-rosette').click();
  await page.getByTestId('save-rosette-input').fill(`Kept from the studio ${stamp}`);
  await page.getByTestId('save-rosette-save').click();
  await page.getByTestId('studio-measured-link').click();
  await expect(page).toHaveURL(/\/rack\/measured/);
  await checkScreen(page, 'rack-measured');
  await page.goto('/rack');
  await expect(rows.filter({ hasText: `Kept from the studio ${stamp}` })).toContainText('9 × sine');

  // Duplicate, then delete the copy (after confirming).
  await rows.filter({ hasText: `Kept from the studio ${stamp}` }).getByTestId('rack-rosette-more').click();
  await page.getByTestId('rack-rosette-duplicate').click();
  const copy = rows.filter({ hasText: `Kept from the studio ${stamp} (copy)` });
  await expect(copy).toHaveCount(1);
  await copy.getByTestId('rack-rosette-more').click();
  await page.getByTestId('rack-rosette-delete').click();
  await page.getByTestId('confirm-accept').click();
  await expect(copy).toHaveCount(0);

  // Delete the kept one too: the rack holds as many rosettes as it did (the sweep journey counts them).
  const kept = rows.filter({ hasText: `Kept from the studio ${stamp}` });
  await kept.getByTestId('rack-rosette-more').click();
  await page.getByTestId('rack-rosette-delete').click();
  await page.getByTestId('confirm-accept').click();
  await expect(kept).toHaveCount(0);
  await expect(rows).toHaveCount(before);
  await context.close();
});
