import fs from 'node:fs';
import AxeBuilder from '@axe-core/playwright';
import { expect, type Page } from '@playwright/test';
import { SCREEN_DIR, wholePage } from './screens';

/** The two widths every screen is looked at: a desktop and a small phone. */
export const WIDTHS = [1280, 360] as const;
const HEIGHT: Record<(typeof WIDTHS)[number], number> = { 1280: 800, 360: 740 };

/** axe-core rules of WCAG 2.1 A and AA; only violations of these impacts fail a screen. */
const AXE_TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'];
const FAILING_IMPACTS = new Set(['serious', 'critical']);

export interface ScreenProblems {
  overflow: string[];
  accessibility: string[];
}

/**
 * Looks at the screen the page shows: screenshots at 1280 and 360 px, the main element's width at
 * 360 px (nothing may stick out sideways), and an axe-core scan on the paper and the dark ground.
 * Problems are returned (and asserted softly), so one run lists every screen's problems.
 */
export async function checkScreen(page: Page, name: string): Promise<ScreenProblems> {
  await settle(page);
  const problems: ScreenProblems = { overflow: [], accessibility: [] };
  for (const width of WIDTHS) {
    await page.setViewportSize({ width, height: HEIGHT[width] });
    await page.waitForTimeout(200);
    await wholePage(page, `${SCREEN_DIR}/${name}-${width}.png`);
    if (width === 360) problems.overflow = await sidewaysOverflow(page);
  }
  for (const ground of ['paper', 'dark'] as const) {
    await setGround(page, ground);
    problems.accessibility.push(...(await axeProblems(page, `${name} ${ground}`)).map((p) => `${ground}: ${p}`));
  }
  await setGround(page, 'paper');
  await page.setViewportSize({ width: 1280, height: HEIGHT[1280] });
  expect.soft(problems.overflow, `${name}: content wider than the main element at 360 px`).toEqual([]);
  expect.soft(problems.accessibility, `${name}: serious or critical accessibility violations`).toEqual([]);
  return problems;
}

/** Waits for the page's requests and lazy pictures, and closes a passing snack bar. */
async function settle(page: Page): Promise<void> {
  // Signed-in pages keep sockets open, so "network idle" may never come: wait for the progress bars and pictures instead.
  await page.waitForLoadState('load');
  await expect(page.locator('mat-progress-bar')).toHaveCount(0, { timeout: 15_000 }).catch(() => undefined);
  await page.waitForFunction(() => [...document.images].every((img) => img.complete), undefined, { timeout: 10_000 }).catch(() => undefined);
  const dismiss = page.locator('mat-snack-bar-container button');
  if (await dismiss.count()) await dismiss.first().click();
  await page.evaluate(() => window.scrollTo(0, 0));
}

/** Paper or dark ground, as the footer's toggle sets it (a class on the root element). */
async function setGround(page: Page, ground: 'paper' | 'dark'): Promise<void> {
  await page.evaluate((dark) => document.documentElement.classList.toggle('bw-dark', dark), ground === 'dark');
  await page.waitForTimeout(100);
}

/**
 * Empty when the main element holds its content (scrollWidth ≤ clientWidth); otherwise the widths
 * and the elements whose right edge passes the main element's, to say where to look.
 */
async function sidewaysOverflow(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const main = document.querySelector('main');
    if (!main) return ['no main element'];
    if (main.scrollWidth <= main.clientWidth) return [];
    const right = main.getBoundingClientRect().right;
    const culprits = [...main.querySelectorAll<HTMLElement>('*')]
      .filter((el) => el.getBoundingClientRect().right > right + 0.5 && el.getClientRects().length > 0)
      // the outermost ones only: their children follow them out
      .filter((el, _i, all) => !all.some((other) => other !== el && other.contains(el)))
      .slice(0, 6)
      .map((el) => {
        const cls = typeof el.className === 'string' && el.className ? `.${el.className.trim().split(/\s+/).slice(0, 2).join('.')}` : '';
        return `${el.tagName.toLowerCase()}${cls} right ${Math.round(el.getBoundingClientRect().right)} px`;
      });
    return [`main scrollWidth ${main.scrollWidth} > clientWidth ${main.clientWidth}`, ...culprits];
  });
}

/**
 * Serious and critical axe-core violations, one line each with the first elements concerned. Every
 * violation, minor and moderate too, is listed in .tmp/screens/axe.log for a person to read.
 */
async function axeProblems(page: Page, label: string): Promise<string[]> {
  const result = await new AxeBuilder({ page }).withTags(AXE_TAGS).analyze();
  const all = result.violations.map((v) => `${v.id} (${v.impact}, ${v.nodes.length})`).join(', ') || 'none';
  fs.appendFileSync(`${SCREEN_DIR}/axe.log`, `${label}: ${result.passes.length} rules passed; violations: ${all}\n`);
  return result.violations
    .filter((v) => FAILING_IMPACTS.has(v.impact ?? ''))
    .map((v) => `${v.id} (${v.impact}): ${v.nodes.slice(0, 3).map((n) => n.target.join(' ')).join(' | ')}`);
}
