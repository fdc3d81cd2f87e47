import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import exifr from 'exifr';
import sharp from 'sharp';
import { eq } from 'drizzle-orm';
import { PHOTO_MAX_BYTES } from '@barwright/contracts';
import { photos } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, useTestServer, type TestServer } from '../testing/test-app';
import { member, publishedBar, upload, xsrfOf, type Member } from '../community/community-testing';
import { HTML_PAYLOAD, jpegWithGps, pngDeclaring, smallGif, smallPng, smallWebp } from './test-images';

const drivers = await availableDrivers();
const FIELDS = { kind: 'trial', caption: 'First pass in acrylic', material: 'cast acrylic', date: '2026-03-14' };

describe.each(drivers)('shop log on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let maren: Member;
  let tobias: Member;
  let entryId: string;
  let designId: string;
  const entryPhotos = () => `/api/entries/${entryId}/photos`;

  // Under a dot folder on purpose: serving must not trip over a data directory like `.tmp/…`.
  fs.mkdirSync(path.join(os.tmpdir(), '.bw-dot'), { recursive: true });
  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), '.bw-dot', 'uploads-'));
  const ctx = useTestServer(driver, { uploadsDir, communityLimits: { photosPerDay: 4 } });
  afterAll(() => fs.rmSync(uploadsDir, { recursive: true, force: true }));
  beforeEach(async () => {
    ({ database, server } = ctx);
    maren = await member(database, server, 'maren');
    tobias = await member(database, server, 'tobias');
    ({ entryId, designId } = await publishedBar(maren, 'Sine 24'));
  });

  it('re-encodes an accepted JPEG upright without any metadata, GPS included', async () => {
    const original = await jpegWithGps();
    expect(await exifr.gps(original)).toMatchObject({ latitude: expect.closeTo(51.477, 2) }); // the fixture does carry GPS
    const res = await upload(tobias.client, entryPhotos(), { data: original, name: 'IMG_0001.JPG' }, FIELDS);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ entryId, kind: 'trial', caption: 'First pass in acrylic', material: 'cast acrylic', date: '2026-03-14', mime: 'image/jpeg', width: 48, height: 64, uploader: { displayName: 'tobias' } });

    const served = await new Client(server.app).agent.get(res.body.url).buffer(true);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    expect(await exifr.parse(served.body, true).catch(() => undefined)).toBeFalsy();
    expect(await exifr.gps(served.body).catch(() => undefined)).toBeFalsy();
    expect((await sharp(served.body).metadata()).exif).toBeUndefined();

    const thumb = await new Client(server.app).agent.get(res.body.thumbUrl).buffer(true);
    expect(thumb.headers['content-type']).toBe('image/jpeg');
    expect(await exifr.gps(thumb.body).catch(() => undefined)).toBeFalsy();

    const [row] = await database.db.select().from(photos).where(eq(photos.id, res.body.id));
    expect(row.fileName).toMatch(/^[0-9a-f-]{36}\.jpg$/);
    const stored = fs.readFileSync(path.join(uploadsDir, 'photos', row.fileName));
    expect(await exifr.gps(stored).catch(() => undefined)).toBeFalsy();
    expect(stored.includes(Buffer.from('Workshop camera'))).toBe(false);
    expect((await new Client(server.app).get(entryPhotos())).body.map((p: { id: string }) => p.id)).toEqual([res.body.id]);
  });

  it('takes PNG and WebP, and decides the type by content, not by name or header', async () => {
    expect((await upload(tobias.client, entryPhotos(), { data: await smallPng(), name: 'cut.jpg' }, FIELDS)).body.mime).toBe('image/png');
    expect((await upload(tobias.client, entryPhotos(), { data: await smallWebp(), name: 'cut.png' }, FIELDS)).body.mime).toBe('image/webp');
    const gif = await upload(tobias.client, entryPhotos(), { data: await smallGif(), name: 'cut.jpg' }, FIELDS);
    expect(gif.status).toBe(415);
    expect(gif.body.error.message).toMatch(/image\/gif/);
    const token = await xsrfOf(tobias.client);
    const html = await tobias.client.agent
      .post(entryPhotos())
      .set('X-XSRF-TOKEN', token)
      .field(FIELDS)
      .attach('photo', Buffer.from(HTML_PAYLOAD), { filename: 'cut.jpg', contentType: 'image/jpeg' });
    expect(html.status).toBe(415);
  });

  it('re-encodes a polyglot (a real JPEG with HTML appended) so nothing of the HTML survives', async () => {
    const polyglot = Buffer.concat([await jpegWithGps(), Buffer.from(HTML_PAYLOAD)]);
    const res = await upload(tobias.client, entryPhotos(), { data: polyglot, name: 'cut.jpg' }, FIELDS);
    expect(res.status).toBe(201);
    const served = await new Client(server.app).agent.get(res.body.url).buffer(true);
    expect(served.body.includes(Buffer.from('<script'))).toBe(false);
    expect(served.body.includes(Buffer.from('<html'))).toBe(false);
    // A JPEG signature followed by HTML only is no image at all.
    const fake = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00]), Buffer.from(HTML_PAYLOAD)]);
    const refused = await upload(tobias.client, entryPhotos(), { data: fake, name: 'cut.jpg' }, FIELDS);
    expect(refused.status).toBe(422);
    expect(refused.body.error.code).toBe('unreadable_image');
  });

  it('refuses a file over 10 MB and a small PNG that declares 400 megapixels', async () => {
    const storedBefore = fs.readdirSync(path.join(uploadsDir, 'photos'), { withFileTypes: true }).length;
    const big = Buffer.concat([await jpegWithGps(), Buffer.alloc(PHOTO_MAX_BYTES)]);
    const tooLarge = await upload(tobias.client, entryPhotos(), { data: big, name: 'big.jpg' }, FIELDS);
    expect(tooLarge.status).toBe(413);
    expect(tooLarge.body.error.message).toMatch(/10 MB/);
    const flood = pngDeclaring(20_000, 20_000);
    expect(flood.length).toBeLessThan(1000);
    const res = await upload(tobias.client, entryPhotos(), { data: flood, name: 'flood.png' }, FIELDS);
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: 'too_many_pixels', message: expect.stringMatching(/20000 × 20000 pixels; the limit is 40 megapixels/) });
    expect(fs.readdirSync(path.join(uploadsDir, 'photos')).length).toBe(storedBefore);
  });

  it('checks the fields, the target and the day’s allowance', async () => {
    const bad = await upload(tobias.client, entryPhotos(), { data: await smallPng(), name: 'a.png' }, { ...FIELDS, kind: 'final', date: '2999-01-01', caption: 'x'.repeat(301) });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['caption', 'date', 'kind']);
    expect((await upload(tobias.client, entryPhotos(), undefined, FIELDS)).body.error.fields.photo).toBe('is required');
    expect((await upload(new Client(server.app), entryPhotos(), { data: await smallPng(), name: 'a.png' }, FIELDS)).status).toBe(401);
    expect((await upload(tobias.client, `/api/designs/${designId}/photos`, { data: await smallPng(), name: 'a.png' }, FIELDS)).status).toBe(404);
    for (let i = 0; i < 4; i++) expect((await upload(tobias.client, entryPhotos(), { data: await smallPng(), name: 'a.png' }, FIELDS)).status).toBe(201);
    const fifth = await upload(tobias.client, entryPhotos(), { data: await smallPng(), name: 'a.png' }, FIELDS);
    expect(fifth.status).toBe(429);
  });

  it('keeps a board design’s photos to the board, and lets the uploader delete', async () => {
    const res = await upload(maren.client, `/api/designs/${designId}/photos`, { data: await smallPng(), name: 'keeper.png' }, { ...FIELDS, kind: 'keeper' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ designId, entryId: null, kind: 'keeper' });
    expect((await maren.client.get(`/api/designs/${designId}/photos`)).body).toHaveLength(1);
    expect((await tobias.client.get(`/api/designs/${designId}/photos`)).status).toBe(404);
    expect((await tobias.client.get(res.body.url)).status).toBe(404);
    expect((await new Client(server.app).get(res.body.thumbUrl)).status).toBe(404);
    expect((await maren.client.agent.get(res.body.thumbUrl)).status).toBe(200);
    const entryPhoto = await upload(tobias.client, entryPhotos(), { data: await smallPng(), name: 'a.png' }, FIELDS);
    expect((await maren.client.send('delete', entryPhoto.body.url)).status).toBe(403);
    expect((await tobias.client.send('delete', entryPhoto.body.url)).status).toBe(204);
    expect((await new Client(server.app).get(entryPhoto.body.url)).status).toBe(404);
  });
});
