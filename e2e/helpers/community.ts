import { deflateSync, crc32 } from 'node:zlib';
import { expect, type Browser, type BrowserContext, type Page } from '@playwright/test';
import { signIn } from './accounts';

/** A member signed in in a browser context of their own (their own cookies, their own bell). */
export async function memberPage(browser: Browser, email: string): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  await signIn(page, email);
  return { context, page };
}

/** Creates a board on the Boards page; leaves the page on the new board and returns its id. */
export async function createBoard(page: Page, name: string): Promise<string> {
  await page.goto('/boards');
  await page.getByTestId('board-create-name').fill(name);
  await page.getByTestId('board-create-submit').click();
  await expect(page.getByTestId('board-name')).toHaveText(name);
  return new URL(page.url()).pathname.split('/').pop()!;
}

/** Creates a design on the open board page from a preset; leaves the page in the studio and returns the design id. */
export async function createDesign(page: Page, title: string): Promise<string> {
  await page.getByTestId('design-new').click();
  await page.getByTestId('new-design-title').fill(title);
  await page.getByTestId('new-design-create').click();
  await page.waitForURL(/\/studio\/[0-9a-f-]{36}$/);
  await expect(page.getByTestId('studio-title')).toHaveText(title);
  return new URL(page.url()).pathname.split('/').pop()!;
}

export interface PublishFields {
  title: string;
  description?: string;
  tags?: string[];
}

/** Publishes a design from its board page (the row's Publish button); leaves the page on the entry and returns its id. */
export async function publishFromBoard(page: Page, boardId: string, designTitle: string, fields: PublishFields, screenshot?: (page: Page) => Promise<void>): Promise<string> {
  await page.goto(`/boards/${boardId}`);
  const row = page.getByTestId('design-row').filter({ hasText: designTitle });
  await row.getByTestId('design-publish').click();
  // The dialog moves focus to its first field once it has opened; typing before that can land in the title.
  await expect(page.getByTestId('publish-title')).toBeFocused();
  await page.getByTestId('publish-title').fill(fields.title);
  if (fields.description) await page.getByTestId('publish-description').fill(fields.description);
  for (const tag of fields.tags ?? []) {
    await page.getByTestId('publish-tag-input').fill(tag);
    await page.getByTestId('publish-tag-input').press('Enter');
  }
  if (screenshot) await screenshot(page);
  await page.getByTestId('publish-submit').click();
  await page.waitForURL(/\/entries\/[0-9a-f-]{36}$/);
  await expect(page.getByTestId('entry-title')).toHaveText(fields.title);
  return new URL(page.url()).pathname.split('/').pop()!;
}

/** The unread count the bell shows (the number kept for screen readers beside the badge). */
export async function bellCount(page: Page): Promise<number> {
  return Number(await page.getByTestId('notification-bell-count').textContent());
}

/** A small PNG (solid colour, `width` × `height`) made here, so the upload test needs no image file. */
export function pngImage(width: number, height: number, rgb: [number, number, number] = [180, 150, 90]): Buffer {
  const row = Buffer.alloc(1 + width * 3);
  for (let x = 0; x < width; x++) row.set(rgb, 1 + x * 3);
  const raw = Buffer.concat(Array.from({ length: height }, () => row));
  const chunk = (type: string, data: Buffer) => {
    const head = Buffer.alloc(8);
    head.writeUInt32BE(data.length, 0);
    head.write(type, 4, 'ascii');
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(Buffer.concat([Buffer.from(type, 'ascii'), data])) >>> 0, 0);
    return Buffer.concat([head, data, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 2, 0, 0, 0], 8); // 8-bit RGB, no interlace
  return Buffer.concat([Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]), chunk('IHDR', ihdr), chunk('IDAT', deflateSync(raw)), chunk('IEND', Buffer.alloc(0))]);
}
