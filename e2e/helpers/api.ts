import { expect, type Page } from '@playwright/test';

/** The XSRF token the page's cookies hold (what Angular echoes in X-XSRF-TOKEN). */
export async function xsrfToken(page: Page): Promise<string> {
  const cookies = await page.context().cookies();
  return decodeURIComponent(cookies.find((c) => c.name === 'XSRF-TOKEN')?.value ?? '');
}

/** An unsafe API call as the page's signed-in user, with the XSRF header, for setting up data; fails the test unless it succeeds. */
export async function apiSend(page: Page, method: 'post' | 'put' | 'patch' | 'delete', path: string, data?: unknown): Promise<unknown> {
  const res = await page.request[method](path, { data, headers: { 'X-XSRF-TOKEN': await xsrfToken(page) } });
  expect(res.ok(), `${method.toUpperCase()} ${path}: ${res.status()} ${await res.text()}`).toBe(true);
  return res.status() === 204 ? undefined : res.json();
}

/** The id of the published bar with this exact title (searching Explore). */
export async function entryIdByTitle(page: Page, title: string): Promise<string> {
  const res = await page.request.get(`/api/entries?q=${encodeURIComponent(title)}&pageSize=60`);
  const found = ((await res.json()) as { items: { id: string; title: string }[] }).items.find((e) => e.title === title);
  expect(found, `no published bar titled ${title}`).toBeTruthy();
  return found!.id;
}
