import type { Page } from '@playwright/test';

export const SCREEN_DIR = '.tmp/screens';

/** Full-page screenshots at desktop (1280 px) and phone (360 px) widths, for a person to look at. */
export async function shoot(page: Page, name: string): Promise<void> {
  const original = page.viewportSize() ?? { width: 1280, height: 800 };
  for (const width of [1280, 360]) {
    await page.setViewportSize({ width, height: width === 360 ? 740 : 800 });
    await page.waitForTimeout(150);
    await page.screenshot({ path: `${SCREEN_DIR}/${name}-${width}.png`, fullPage: true });
  }
  await page.setViewportSize(original);
}
