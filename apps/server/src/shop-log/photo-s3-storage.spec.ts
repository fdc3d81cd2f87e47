import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import exifr from 'exifr';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { eq } from 'drizzle-orm';
import { photos } from '../../../../db/schema';
import { loadConfig } from '../config';
import { openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, startTestServer, type TestServer } from '../testing/test-app';
import { startFakeS3 } from '../testing/fake-s3';
import { member, publishedBar, upload, type Member } from '../community/community-testing';
import { S3PhotoStorage } from './photo-s3-storage';
import { HTML_PAYLOAD, jpegWithGps, smallGif, smallPng } from './test-images';

const FIELDS = { kind: 'trial', caption: 'Second pass', material: 'O1 tool steel', date: '2026-03-14' };

/** Two app instances on one database, each with its own client of one bucket (as two processes would be). */
describe('photos in an S3-compatible bucket (s3rver), shared by two instances', () => {
  let s3: Awaited<ReturnType<typeof startFakeS3>>;
  let database: TestDatabase;
  let a: TestServer;
  let b: TestServer;
  let storages: S3PhotoStorage[];
  let maren: Member;
  let entryId: string;
  const bucketKeys = async () => {
    const client = new S3Client({ endpoint: s3.settings.url, region: s3.settings.region, forcePathStyle: true, credentials: { accessKeyId: s3.settings.accessKeyId!, secretAccessKey: s3.settings.secretAccessKey! } });
    const listed = await client.send(new ListObjectsV2Command({ Bucket: s3.settings.bucket }));
    client.destroy();
    return (listed.Contents ?? []).map((o) => o.Key!).sort();
  };

  beforeAll(async () => {
    s3 = await startFakeS3();
    database = await openTestDatabase('pglite');
    storages = [new S3PhotoStorage(s3.settings), new S3PhotoStorage(s3.settings)];
    a = await startTestServer(database, { photoStorage: storages[0] });
    b = await startTestServer(database, { photoStorage: storages[1] });
  });
  afterAll(async () => {
    for (const s of storages ?? []) s.close();
    await a?.close();
    await b?.close();
    await database?.close();
    await s3?.close();
  });
  beforeEach(async () => {
    await database.reset();
    maren = await member(database, a, 'maren');
    ({ entryId } = await publishedBar(maren, 'Sine 24'));
  });

  it('serves through B a photo uploaded through A, re-encoded and nosniff; deleting through B empties the bucket', async () => {
    const res = await upload(maren.client, `/api/entries/${entryId}/photos`, { data: await jpegWithGps(), name: 'IMG_0001.JPG' }, FIELDS);
    expect(res.status).toBe(201);
    const stored = await bucketKeys();
    expect(stored).toHaveLength(2);
    expect(stored.every((k) => /^photos\/[0-9a-f-]{36}(-thumb)?\.jpg$/.test(k))).toBe(true);

    for (const url of [res.body.url, res.body.thumbUrl]) {
      const served = await new Client(b.app).agent.get(url).buffer(true);
      expect(served.status).toBe(200);
      expect(served.headers).toMatchObject({ 'content-type': 'image/jpeg', 'x-content-type-options': 'nosniff', 'content-security-policy': "default-src 'none'" });
      expect(await exifr.gps(served.body).catch(() => undefined)).toBeFalsy();
      const again = await new Client(a.app).agent.get(url).set('If-None-Match', served.headers.etag).buffer(true);
      expect(again.status).toBe(304);
    }
    const fromA = await new Client(a.app).agent.get(res.body.url).buffer(true);
    expect(Buffer.compare(fromA.body, (await new Client(b.app).agent.get(res.body.url).buffer(true)).body)).toBe(0);

    const marenOnB = new Client(b.app);
    await marenOnB.signIn(maren.email);
    expect((await marenOnB.send('delete', res.body.url)).status).toBe(204);
    expect(await bucketKeys()).toEqual([]);
    expect((await new Client(a.app).get(res.body.url)).status).toBe(404);
  });

  it('keeps the content checks: a GIF and HTML named .jpg are refused and nothing reaches the bucket', async () => {
    const gif = await upload(maren.client, `/api/entries/${entryId}/photos`, { data: await smallGif(), name: 'cut.jpg' }, FIELDS);
    expect(gif.status).toBe(415);
    const html = await upload(maren.client, `/api/entries/${entryId}/photos`, { data: Buffer.from(HTML_PAYLOAD), name: 'cut.jpg' }, FIELDS);
    expect(html.status).toBe(415);
    expect(await bucketKeys()).toEqual([]);
  });

  it('answers 404, not 500, when the object is missing from the bucket', async () => {
    const res = await upload(maren.client, `/api/entries/${entryId}/photos`, { data: await smallPng(), name: 'a.png' }, FIELDS);
    const [row] = await database.db.select().from(photos).where(eq(photos.id, res.body.id));
    await storages[0].remove(row.fileName);
    expect((await new Client(b.app).get(res.body.url)).status).toBe(404);
    expect((await new Client(b.app).agent.get(res.body.thumbUrl)).status).toBe(200);
  });

  it('refuses to start on a bucket it cannot reach, and takes S3_URL and S3_BUCKET together', async () => {
    const missing = new S3PhotoStorage({ ...s3.settings, bucket: 'no-such-bucket' });
    await expect(missing.verify()).rejects.toThrow(/S3_URL, S3_BUCKET: bucket "no-such-bucket"/);
    missing.close();
    await storages[1].verify();
    expect(() => loadConfig({ S3_URL: 'http://127.0.0.1:9000' })).toThrow(/S3_BUCKET: is required when S3_URL is set/);
    expect(() => loadConfig({ S3_URL: 'http://127.0.0.1:9000', S3_BUCKET: 'photos', S3_ACCESS_KEY_ID: 'k' })).toThrow(/S3_SECRET_ACCESS_KEY/);
    expect(loadConfig({ S3_URL: 'http://127.0.0.1:9000', S3_BUCKET: 'photos' }).s3).toMatchObject({ bucket: 'photos', region: 'us-east-1', pathStyle: true });
    expect(loadConfig({}).s3).toBeUndefined();
  });
});
