import { expect, test, type Page } from '@playwright/test';
import { signIn } from './helpers/accounts';

/** Every CSP report the page gives: console lines and `securitypolicyviolation` events (caught throws included). */
async function watchCsp(page: Page): Promise<string[]> {
  const reports: string[] = [];
  page.on('console', (m) => {
    if (/Content Security Policy|unsafe-eval/i.test(m.text())) reports.push(`console: ${m.text()}`);
  });
  await page.exposeFunction('reportCspViolation', (line: string) => reports.push(line));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => {
      (window as unknown as { reportCspViolation: (l: string) => void }).reportCspViolation(`event: ${e.violatedDirective} ${e.blockedURI} ${e.sourceFile}:${e.lineNumber}`);
    });
  });
  return reports;
}

test('pages run under the strict CSP without a single violation (no eval probe, no inline script)', async ({ page }) => {
  const reports = await watchCsp(page);
  await page.goto('/');
  await expect(page.getByTestId('nav-sign-in').or(page.getByTestId('nav-menu'))).toBeVisible();
  await page.goto('/explore');
  await page.goto('/account/sign-in');
  // A form validated by the contracts' zod schemas, as every form is.
  await page.getByTestId('sign-in-email').fill('not an address');
  await page.getByTestId('sign-in-password').click();
  // Signed in, a board page parses API answers through the same schemas.
  await signIn(page, 'maren@example.test');
  await page.goto('/boards');
  await page.waitForLoadState('networkidle');
  expect(reports).toEqual([]);
});
