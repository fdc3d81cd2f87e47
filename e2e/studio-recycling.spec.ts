import { expect, test } from '@playwright/test';
import { signIn } from './helpers/accounts';
import { createBoard, createDesign } from './helpers/boards';

/*
 * The page hands the arrays of views it no longer shows back to the studio's compute worker, which
 * writes the next edits over them (fresh memory is slow in a worker). A handed-back array is empty on
 * the page, so a view that still read one would draw NaN: after edits, in both modes and with a
 * companion, every drawing of the bar view stays whole.
 */
test('the studio hands the arrays of replaced views back to its worker, and every view keeps drawing', async ({ browser }) => {
  test.setTimeout(120_000);
  const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
  await page.addInitScript(() => {
    const post = Worker.prototype.postMessage;
    const counts = { recycled: 0, bytes: 0 };
    (window as unknown as { recycling: typeof counts }).recycling = counts;
    Worker.prototype.postMessage = function (this: Worker, message: unknown, ...rest: unknown[]) {
      if (message && typeof message === 'object' && 'recycle' in message) {
        counts.recycled++;
        for (const b of (message as { recycle: ArrayBuffer[] }).recycle) counts.bytes += b.byteLength;
      }
      return (post as (...args: unknown[]) => void).call(this, message, ...rest);
    };
  });
  await signIn(page, 'maren@example.test');
  await createBoard(page, `Recycling ${Date.now()}`);
  const designId = await createDesign(page, 'Written over', 'example');
  await page.goto(`/studio/${designId}`);
  await expect(page.getByTestId('connection-status')).toHaveAttribute('data-status', 'live');

  const svg = page.getByTestId('profile-svg');
  const whole = async () => {
    const drawn = await svg.evaluate((el) => [...el.querySelectorAll('polyline, polygon, path, circle, line')].map((e) => e.outerHTML).join('\n'));
    expect(drawn).not.toMatch(/NaN|Infinity/);
    return drawn;
  };
  let before = await whole();
  for (const lobes of ['20', '22', '18', '26']) {
    await page.getByTestId('field-rosette.layers[0].lobes').fill(lobes);
    await expect.poll(whole).not.toBe(before);
    before = await whole();
  }
  const recycling = await page.evaluate(() => (window as unknown as { recycling: { recycled: number; bytes: number } }).recycling);
  expect(recycling.recycled).toBeGreaterThan(0);
  expect(recycling.bytes).toBeGreaterThan(100_000); // a bar's arrays, not nothing

  await page.getByTestId('profile-mode-whole').click();
  await whole();
  await page.getByTestId('profile-companion').click();
  await page.getByTestId('companion-opposite').click();
  await expect(page.getByTestId('profile-opposite')).toBeVisible();
  await page.getByTestId('field-rosette.layers[0].lobes').fill('24');
  await expect.poll(whole).not.toBe(before);
  await page.getByTestId('profile-mode-detail').click();
  await whole();
  await expect(page.getByTestId('profile-warnings')).toBeVisible();
});
