import { errors, type Page } from '@playwright/test';

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
  // What comes on the screen is laid out at its true size (an unseen view keeps a guessed one), so the
  // page may grow: the window follows until two frames leave the page's height as it was. A page that
  // grows with the window itself (a part as tall as the window, then the footer) overhangs it by the
  // same amount each time: that is its whole height.
  let height = size.height;
  let overhang = -1;
  for (let round = 0; round < 6; round++) {
    const tall = Math.min(16_000, await settledHeight(page));
    if (tall <= height || tall - height === overhang) break;
    overhang = tall - height;
    height = tall;
    await page.setViewportSize({ width: size.width, height });
  }
  try {
    if (height > size.height) {
      // The plates now on the screen draw their pictures (each says which request it shows); 60 s, as the sweep allows its plates.
      await page
        .waitForFunction(
          () => [...document.querySelectorAll('canvas[data-requested]')].every((c) => c.getAttribute('data-drawn') === c.getAttribute('data-requested')),
          undefined,
          { timeout: 60_000 },
        )
        .catch(async (error: unknown) => {
          const undrawn = await page.evaluate(() =>
            [...document.querySelectorAll('canvas[data-requested]')]
              .filter((c) => c.getAttribute('data-drawn') !== c.getAttribute('data-requested'))
              .map((c) => c.getAttribute('data-testid') ?? c.className),
          );
          throw new Error(`${path}: plates not drawn in 60 s: ${undrawn.join(', ')}`, { cause: error });
        });
      await page.waitForTimeout(100);
    }
    await capture(page, path);
  } finally {
    if (height > size.height) {
      await page.setViewportSize(size);
      await page.evaluate((y) => window.scrollTo(0, y), scrollY);
    }
  }
}

/** The page's height once two frames have passed (layout and the observers' callbacks have run). */
function settledHeight(page: Page): Promise<number> {
  return page.evaluate(
    () =>
      new Promise<number>((done) =>
        requestAnimationFrame(() => requestAnimationFrame(() => done(document.documentElement.scrollHeight))),
      ),
  );
}

/**
 * The capture itself, given its own time: once in CI a full-page capture never returned (the log stops
 * at "fonts loaded") and took the whole test's time with it. The pictures are for a person to look at,
 * not what a test asserts, so a capture that does not come in 30 s is tried once more and then left out
 * with a line in the log, and the test goes on to what it checks.
 */
async function capture(page: Page, path: string): Promise<void> {
  for (let attempt = 1; ; attempt++) {
    try {
      await page.screenshot({ path, fullPage: true, timeout: CAPTURE_MS });
      return;
    } catch (error) {
      if (!(error instanceof errors.TimeoutError) || page.isClosed()) throw error;
      console.warn(`${path}: capture ${attempt} did not come in ${CAPTURE_MS / 1000} s (${String(error).split('\n')[0]})`);
      if (attempt === 2) return;
    }
  }
}

const CAPTURE_MS = 30_000;
