import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import type { ModerationCase, ModerationQueue } from '@barwright/contracts';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, useTestServer, type TestServer } from '../testing/test-app';
import { publishedBar, type Member } from '../community/community-testing';
import { commentOn, itemPath, person, photoOn, report } from './moderation-testing';

const drivers = await availableDrivers();

describe.each(drivers)('the moderation desk on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let maren: Member;
  let ilse: Member;
  let rita: Member;
  let sam: Member;
  let tobias: Member;
  let odile: Member;
  let entryId: string;
  let spam: string;
  let kind: string;
  const closedSockets: string[] = [];

  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-desk-'));
  const ctx = useTestServer(driver, { uploadsDir, closeUserSockets: (userId) => closedSockets.push(userId), rateLimits: { signInPerAddress: 1000 } });
  afterAll(() => fs.rmSync(uploadsDir, { recursive: true, force: true }));
  beforeEach(async () => {
    ({ database, server } = ctx);
    closedSockets.length = 0;
    maren = await person(database, server, 'maren');
    ilse = await person(database, server, 'ilse');
    rita = await person(database, server, 'rita');
    sam = await person(database, server, 'sam');
    tobias = await person(database, server, 'tobias', 'moderator');
    odile = await person(database, server, 'odile', 'admin');
    entryId = (await publishedBar(maren, 'Sine 24')).entryId;
    spam = await commentOn(ilse, entryId, 'Buy cheap rosettes at example.test');
    kind = await commentOn(ilse, entryId, 'Lovely crisp barleycorn.');
  });

  const queue = async (m: Member) => (await m.client.get('/api/moderation/queue')).body as ModerationQueue;
  const caseOf = async (m: Member, k: 'entry' | 'comment' | 'photo', id: string) => (await m.client.get(itemPath(k, id))).body as ModerationCase;
  const thread = async (client: Client) => (await client.get(`/api/entries/${entryId}/comments`)).body;

  it('groups open reports by item, the longest waiting first, with the item in context and each reporter’s count', async () => {
    await report(rita, 'comment', spam, 'spam');
    await report(sam, 'comment', spam, 'offensive');
    await report(rita, 'entry', entryId, 'unsafe', 'Suggests far too deep a pass in A2.');
    const q = await queue(tobias);
    expect(q.openReports).toBe(3);
    expect(q.cases.map((c) => c.item.target)).toEqual([{ kind: 'comment', id: spam }, { kind: 'entry', id: entryId }]);
    const [comment, entry] = q.cases;
    expect(comment.item).toMatchObject({ entryId, entryTitle: 'Sine 24', author: { id: ilse.id, role: 'member', suspended: false }, excerpt: 'Buy cheap rosettes at example.test', link: `/entries/${entryId}#comments`, hidden: false, gone: false });
    expect(comment.openReports.map((r) => [r.reason, r.reporter.displayName, r.reporter.reportsFiled])).toEqual([['spam', 'rita', 2], ['offensive', 'sam', 1]]);
    expect(comment.canAct).toEqual({ act: true, suspend: false, why: null });
    expect(entry.item).toMatchObject({ author: { id: maren.id }, thumbnailUrl: `/api/entries/${entryId}/thumbnail.svg` });
    expect(entry.openReports[0].details).toBe('Suggests far too deep a pass in A2.');
    expect((await caseOf(odile, 'comment', spam)).canAct).toEqual({ act: true, suspend: true, why: null });
  });

  it('dismisses or upholds every open report of an item, and keeps them as its history', async () => {
    await report(rita, 'comment', spam, 'spam');
    await report(rita, 'entry', entryId, 'not_their_work');
    const dismissed = await tobias.client.post(`${itemPath('entry', entryId)}/dismiss`, { note: 'Maren cut it herself; the photos show it.' });
    expect(dismissed.status).toBe(200);
    expect(dismissed.body.openReports).toEqual([]);
    expect(dismissed.body.earlierReports).toMatchObject([{ status: 'dismissed', reason: 'not_their_work' }]);
    expect(dismissed.body.actions).toMatchObject([{ action: 'report.dismiss', actor: { id: tobias.id }, reason: 'Maren cut it herself; the photos show it.', details: { reports: 1 } }]);
    expect((await tobias.client.post(`${itemPath('entry', entryId)}/dismiss`, {})).body.error.code).toBe('no_open_reports');
    expect((await queue(tobias)).cases.map((c) => c.item.target.id)).toEqual([spam]);

    const hidden = await tobias.client.post(`${itemPath('comment', spam)}/hide`, { reason: 'Advertising is not allowed here.' });
    expect(hidden.body.item).toMatchObject({ hidden: true, hiddenReason: 'Advertising is not allowed here.' });
    expect(hidden.body.earlierReports).toMatchObject([{ status: 'upheld', reporter: { displayName: 'rita', reportsFiled: 2, reportsUpheld: 1 } }]);
    expect(hidden.body.actions[0]).toMatchObject({ action: 'item.hide', target: { kind: 'comment', id: spam, label: 'comment on “Sine 24”' }, subject: { id: ilse.id } });
    expect(await queue(tobias)).toEqual({ cases: [], openReports: 0 });
  });

  it('hides a comment from everyone but its author (who reads the reason) and the moderators, and restores it as it was', async () => {
    await tobias.client.post(`${itemPath('comment', spam)}/hide`, { reason: 'Advertising is not allowed here.' });
    const forAuthor = await thread(ilse.client);
    expect(forAuthor.comments.find((c: { id: string }) => c.id === spam)).toMatchObject({ body: 'Buy cheap rosettes at example.test', hidden: true, hiddenReason: 'Advertising is not allowed here.', editableUntil: null });
    expect((await thread(tobias.client)).comments.find((c: { id: string }) => c.id === spam)).toMatchObject({ hidden: true });
    for (const client of [rita.client, maren.client, new Client(server.app)]) {
      const seen = await thread(client);
      expect(seen.comments.map((c: { id: string }) => c.id)).toEqual([kind]);
      expect(JSON.stringify(seen)).not.toContain('cheap rosettes');
      expect(seen.count).toBe(1);
    }
    expect((await rita.client.get(`/api/entries/${entryId}`)).body.commentCount).toBe(1);
    expect((await ilse.client.patch(`/api/comments/${spam}`, { body: 'Edited away' })).body.error.code).toBe('comment_hidden');
    expect((await rita.client.post(`/api/entries/${entryId}/comments`, { body: 'Reply', parentId: spam })).status).toBe(409);
    expect((await tobias.client.post(`${itemPath('comment', spam)}/hide`, { reason: 'again' })).body.error.code).toBe('already_hidden');
    expect((await tobias.client.post(`${itemPath('comment', spam)}/hide`, {})).body.error.fields.reason).toBe('is required');

    const restored = await tobias.client.post(`${itemPath('comment', spam)}/restore`, { note: 'The link is a club supplier after all.' });
    expect(restored.body.item).toMatchObject({ hidden: false, hiddenReason: null });
    const again = await thread(rita.client);
    expect(again.comments.map((c: { id: string }) => c.id)).toEqual([spam, kind]);
    expect(again.comments[0].hidden).toBeUndefined();
    expect((await rita.client.get(`/api/entries/${entryId}`)).body.commentCount).toBe(2);
    expect((await tobias.client.post(`${itemPath('comment', spam)}/restore`, {})).body.error.code).toBe('not_hidden');
  });

  it('lets nobody decide on their own content, and no moderator on an admin’s', async () => {
    const own = (await publishedBar(tobias, 'Tobias’s flat twelve')).entryId;
    await report(rita, 'entry', own, 'spam');
    const adminComment = await commentOn(odile, entryId, 'Guild notice: lathe booking opens Monday.');
    await report(rita, 'comment', adminComment, 'offensive');
    const mine = await caseOf(tobias, 'entry', own);
    expect(mine.canAct).toEqual({ act: false, suspend: false, why: expect.stringMatching(/your own content/) });
    for (const [action, body] of [['hide', { reason: 'x' }], ['dismiss', {}], ['restore', {}]] as const) {
      const res = await tobias.client.post(`${itemPath('entry', own)}/${action}`, body);
      expect(res.status).toBe(403);
      expect(res.body.error.message).toMatch(/your own content/);
    }
    expect((await caseOf(tobias, 'comment', adminComment)).canAct.why).toMatch(/admin’s content/);
    expect((await tobias.client.post(`${itemPath('comment', adminComment)}/hide`, { reason: 'x' })).status).toBe(403);
    expect((await odile.client.post(`${itemPath('comment', adminComment)}/dismiss`, {})).status).toBe(403); // her own
    const adam = await person(database, server, 'adam', 'admin');
    expect((await adam.client.post(`${itemPath('comment', adminComment)}/dismiss`, {})).status).toBe(200);
    expect((await odile.client.post(`${itemPath('entry', own)}/hide`, { reason: 'Spam' })).status).toBe(200); // an admin may decide on a moderator’s
  });

  it('lets an admin suspend the author through the People page’s code path: sessions end, sockets close, the log says why', async () => {
    await report(rita, 'comment', spam, 'spam');
    const res = await odile.client.post(`${itemPath('comment', spam)}/suspend-author`, { reason: 'Spam account; only advertising.' });
    expect(res.status).toBe(200);
    expect(res.body.item.author).toMatchObject({ id: ilse.id, suspended: true });
    expect(res.body.canAct.suspend).toBe(false);
    expect(res.body.openReports).toHaveLength(1); // the comment itself is still to be decided
    expect((await ilse.client.get('/api/auth/me')).body).toBeNull();
    expect(closedSockets).toEqual([ilse.id]);
    expect((await odile.client.post(`${itemPath('comment', spam)}/suspend-author`, { reason: 'again' })).body.error.code).toBe('already_suspended');
    const log = (await odile.client.get('/api/moderation/audit?action=user.suspend')).body.items;
    expect(log).toMatchObject([{ actor: { id: odile.id }, target: { kind: 'user', id: ilse.id, label: 'ilse' }, reason: 'Spam account; only advertising.', details: { item: { kind: 'comment', id: spam } } }]);
    const own = await commentOn(odile, entryId, 'Mine');
    expect((await odile.client.post(`${itemPath('comment', own)}/suspend-author`, { reason: 'x' })).status).toBe(403);
  });

  it('lists what is hidden now, photos and entries too, and closes the reports of what its author deleted', async () => {
    expect((await report(rita, 'comment', kind, 'other', 'Testing the desk')).status).toBe(201);
    await ilse.client.send('delete', `/api/comments/${kind}`);
    const photo = await photoOn(ilse, entryId, 'Somebody else’s bar');
    await tobias.client.post(`${itemPath('photo', photo)}/hide`, { reason: 'Not the member’s own work.' });
    await tobias.client.post(`${itemPath('entry', entryId)}/hide`, { reason: 'Unsafe depth of cut.' });
    const hidden = (await tobias.client.get('/api/moderation/hidden')).body as ModerationCase[];
    expect(hidden.map((c) => c.item.target)).toEqual([{ kind: 'entry', id: entryId }, { kind: 'photo', id: photo }]);
    expect(hidden[1].item).toMatchObject({ excerpt: 'Somebody else’s bar', thumbnailUrl: `/api/photos/${photo}/thumb`, hiddenReason: 'Not the member’s own work.' });
    expect((await tobias.client.get(hidden[1].item.thumbnailUrl!)).status).toBe(200);

    const gone = await caseOf(tobias, 'comment', kind);
    expect(gone.item.gone).toBe(true);
    expect((await tobias.client.post(`${itemPath('comment', kind)}/hide`, { reason: 'x' })).body.error.code).toBe('gone');
    expect((await tobias.client.post(`${itemPath('comment', kind)}/dismiss`, {})).status).toBe(200);
    expect((await tobias.client.get(itemPath('comment', '00000000-0000-4000-8000-000000000000'))).status).toBe(404);
    expect((await tobias.client.get('/api/moderation/items/board/' + entryId)).status).toBe(404);
  });
});
