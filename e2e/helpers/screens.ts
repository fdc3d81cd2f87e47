import type { Page } from '@playwright/test';

export const SCREEN_DIR = '.tmp/screens';

/** Full-page screenshots at desktop (1280 px) and phone (360 px) widths, for a person to look at. */
export async function shoot(page: Page, name: string): Promise<void> {
  const original = page.viewportSize() ?? { width: 1280, height: 800 };
  for (const width of [1280, 360]) {
    await page.setViewportSize({ width, height: width === 360 ? 740 : 800 });
    await page.waitForTimeout(150);
    await wholePage(page, `${SCREEN_DIR}/${name}-${width}.png`);
  }
  await page.setViewportSize(original);
}

/**
 * A picture of the whole page as a person scrolling through it sees it. The window is made as tall as
 * the page for the picture: the studio draws a plate and lays out a view or panel only on the screen
 * (content-visibility, IntersectionObserver), so a full-page capture of a short window shows them blank.
 * The window's height is put back after.
 */
export async function wholePage(page: Page, path: string): Promise<void> {
  const size = page.viewportSize() ?? { width: 1280, height: 800 };
  const scrollY = await page.evaluate(() => window.scrollY);
  const tall = await page.evaluate(() => document.documentElement.scrollHeight);
  if (tall > size.height) {
    await page.setViewportSize({ width: size.width, height: Math.min(tall, 16_000) });
    // The plates now on the screen draw their pictures (each says which request it shows).
    await page
      .waitForFunction(() => [...document.querySelectorAll('canvas[data-requested]')].every((c) => c.getAttribute('data-drawn') === c.getAttribute('data-requested')), undefined, { timeout: 10_000 })
      .catch(() => undefined);
    await page.waitForTimeout(200);
  }
  await page.screenshot({ path, fullPage: true });
  if (tall > size.height) {
    await page.setViewportSize(size);
    await page.evaluate((y) => window.scrollTo(0, y), scrollY);
  }
}
