import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { entries } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, useTestServer, type TestServer } from '../testing/test-app';
import { publishedBar, type Member } from '../community/community-testing';
import { commentOn, itemPath, person, photoOn, report } from './moderation-testing';

const drivers = await availableDrivers();

describe.each(drivers)('reports on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let maren: Member;
  let ilse: Member;
  let rita: Member;
  let tobias: Member;
  let entryId: string;
  let commentId: string;

  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-reports-'));
  const ctx = useTestServer(driver, { uploadsDir, moderationLimits: { reportsPerHour: 4 } });
  afterAll(() => fs.rmSync(uploadsDir, { recursive: true, force: true }));
  beforeEach(async () => {
    ({ database, server } = ctx);
    maren = await person(database, server, 'maren');
    ilse = await person(database, server, 'ilse');
    rita = await person(database, server, 'rita');
    tobias = await person(database, server, 'tobias', 'moderator');
    entryId = (await publishedBar(maren, 'Sine 24')).entryId;
    commentId = await commentOn(ilse, entryId, 'Buy cheap rosettes at example.test');
  });

  it('takes a report of an entry, a comment or a photo from any member', async () => {
    const photoId = await photoOn(ilse, entryId);
    const res = await report(rita, 'comment', commentId, 'spam');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ target: { kind: 'comment', id: commentId }, reason: 'spam', details: '', status: 'open' });
    expect((await report(rita, 'entry', entryId, 'unsafe', 'Suggests 0.02 in a pass in A2.')).status).toBe(201);
    expect((await report(rita, 'photo', photoId, 'not_their_work')).status).toBe(201);
    expect((await report({ client: new Client(server.app) }, 'entry', entryId)).status).toBe(401);
  });

  it('needs words for "other", and names the fields it refuses', async () => {
    const other = await report(rita, 'comment', commentId, 'other');
    expect(other.status).toBe(400);
    expect(other.body.error.fields.details).toMatch(/required when the reason is other/);
    const bad = await rita.client.post('/api/reports', { target: { kind: 'board', id: 'x' }, reason: 'boring' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['reason', 'target.id', 'target.kind']);
    expect((await report(rita, 'comment', commentId, 'other', 'Off-topic advertising')).status).toBe(201);
  });

  it('keeps one open report per member per item (409), and takes a new one once the first is closed', async () => {
    expect((await report(rita, 'comment', commentId)).status).toBe(201);
    const again = await report(rita, 'comment', commentId, 'offensive');
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('already_reported');
    expect((await report(maren, 'comment', commentId)).status).toBe(201); // another member: a second report of the same item
    expect((await tobias.client.post(`${itemPath('comment', commentId)}/dismiss`, { note: 'Looks like a fair link' })).status).toBe(200);
    expect((await report(rita, 'comment', commentId)).status).toBe(201);
  });

  it('refuses one’s own content (403), unknown and hidden items (404), and what is hidden already (409 for moderators)', async () => {
    const own = await report(ilse, 'comment', commentId);
    expect(own.status).toBe(403);
    expect(own.body.error.message).toMatch(/your own comment/);
    expect((await report(rita, 'entry', '00000000-0000-4000-8000-000000000000')).status).toBe(404);
    expect((await report(rita, 'photo', commentId)).status).toBe(404); // right id, wrong kind
    await database.db.update(entries).set({ hiddenAt: new Date(), hiddenReason: 'unsafe' }).where(eq(entries.id, entryId));
    expect((await report(rita, 'entry', entryId)).status).toBe(404);
    expect((await report(rita, 'comment', commentId)).status).toBe(404); // a comment on a hidden entry is out of reach too
    expect((await report(tobias, 'entry', entryId)).body.error.code).toBe('already_hidden');
  });

  it('limits the reports one member files in an hour (429), per member', async () => {
    const bars = [];
    for (const title of ['One', 'Two', 'Three', 'Four', 'Five']) bars.push((await publishedBar(maren, title)).entryId);
    for (const id of bars.slice(0, 4)) expect((await report(rita, 'entry', id)).status).toBe(201);
    const fifth = await report(rita, 'entry', bars[4]);
    expect(fifth.status).toBe(429);
    expect(fifth.body.error).toMatchObject({ code: 'rate_limited', message: expect.stringMatching(/4 reports in the last hour/) });
    expect((await report(ilse, 'entry', bars[4])).status).toBe(201);
  });
});
