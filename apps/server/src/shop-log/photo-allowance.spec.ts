import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { photos } from '../../../../db/schema';
import { availableDrivers } from '../testing/test-database';
import { useTestServer } from '../testing/test-app';
import { member, publishedBar, upload } from '../community/community-testing';
import { smallPng } from './test-images';

const drivers = await availableDrivers();
const FIELDS = { kind: 'trial', caption: 'Second pass', material: 'boxwood', date: '2026-03-14' };
const PER_DAY = 3;

describe.each(drivers)('the daily photo allowance on %s', (driver) => {
  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-allowance-'));
  const ctx = useTestServer(driver, { uploadsDir, communityLimits: { photosPerDay: PER_DAY } });
  afterAll(() => fs.rmSync(uploadsDir, { recursive: true, force: true }));

  it('holds against uploads sent all at once: exactly the allowance is stored, the rest get 429 and leave no file', async () => {
    const maren = await member(ctx.database, ctx.server, 'maren');
    const tobias = await member(ctx.database, ctx.server, 'tobias');
    const { entryId } = await publishedBar(maren, 'Sine 24');
    const png = await smallPng();
    const answers = await Promise.all(Array.from({ length: 8 }, () => upload(tobias.client, `/api/entries/${entryId}/photos`, { data: png, name: 'cut.png' }, FIELDS)));
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses).toEqual([...Array(PER_DAY).fill(201), ...Array(8 - PER_DAY).fill(429)]);
    expect(answers.find((a) => a.status === 429)!.body.error.code).toBe('rate_limited');
    expect(await ctx.database.db.select().from(photos).where(eq(photos.uploaderId, tobias.id))).toHaveLength(PER_DAY);
    // Two files (full size and thumbnail) per stored photo, none for the refused ones.
    expect(fs.readdirSync(path.join(uploadsDir, 'photos'))).toHaveLength(2 * PER_DAY);
  });
});
