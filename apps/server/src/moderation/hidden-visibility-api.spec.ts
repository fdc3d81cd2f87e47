import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { io as connect, type Socket } from 'socket.io-client';
import { setDesignField } from '@barwright/contracts/design-doc';
import { NOTIFY_SOCKET_PATH, type NotifyServerEvents } from '@barwright/contracts';
import { showcaseItems } from '../../../../db/schema';
import type { AppLocals } from '../app';
import { BoardAccessEvents } from '../boards/board-access';
import { availableDrivers, openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, startTestServer, type TestServer } from '../testing/test-app';
import { collabClient } from '../testing/collab-client';
import { editDesign, publishedBar, sessionCookieOf, type Member } from '../community/community-testing';
import { CollabGateway } from '../realtime/collab-gateway';
import { NotifyGateway } from '../notifications/notify-gateway';
import { commentOn, itemPath, person, photoOn } from './moderation-testing';

const drivers = await availableDrivers();

/**
 * Where a hidden item could leak, checked one by one: listing, search, direct id, revisions,
 * thumbnails, exports, lineage, the showcase, notifications, photo files, the realtime document
 * of a remix; and that restoring brings all of it back as it was.
 */
describe.each(drivers)('hidden items on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let httpServer: http.Server;
  let collab: CollabGateway;
  let notify: NotifyGateway;
  let baseUrl: string;
  let maren: Member;
  let ilse: Member;
  let rita: Member;
  let tobias: Member;
  let visitor: Client;
  let original: string;
  let basket: string;
  let remix: { designId: string; entryId: string };
  const closers: (() => void)[] = [];
  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-hidden-'));

  beforeAll(async () => {
    database = await openTestDatabase(driver);
    const accessEvents = new BoardAccessEvents();
    server = await startTestServer(database, { uploadsDir, accessEvents, rateLimits: { signInPerAddress: 1000 } });
    httpServer = http.createServer(server.app);
    const locals = server.app.locals as AppLocals;
    collab = new CollabGateway({ db: database.db, sessionParser: locals.sessionParser, accessEvents, log: () => {} });
    collab.attach(httpServer);
    notify = new NotifyGateway({ db: database.db, sessionParser: locals.sessionParser, events: locals.notificationEvents, log: () => {} });
    notify.attach(httpServer);
    await new Promise<void>((r) => httpServer.listen(0, '127.0.0.1', r));
    baseUrl = `http://127.0.0.1:${(httpServer.address() as AddressInfo).port}`;
  });
  afterAll(async () => {
    notify.close();
    await collab.close();
    httpServer.closeAllConnections();
    await new Promise((r) => httpServer.close(r));
    await server.close();
    await database.close();
    fs.rmSync(uploadsDir, { recursive: true, force: true });
  });
  beforeEach(async () => {
    await database.reset();
    maren = await person(database, server, 'maren');
    ilse = await person(database, server, 'ilse');
    rita = await person(database, server, 'rita');
    tobias = await person(database, server, 'tobias', 'moderator');
    visitor = new Client(server.app);
    original = (await publishedBar(maren, 'Sine 24', { tags: ['barleycorn'], description: 'Cut with quillwork care.' })).entryId;
    basket = (await publishedBar(maren, 'Basket weave 18')).entryId;
    // A remix made before anything is hidden, changed and published from Ilse's board.
    const made = await ilse.client.post(`/api/entries/${original}/remix`, { boardId: ilse.boardId });
    await editDesign(database, made.body.designId, (d) => void (d.rosette.layers[0].lobes = 36));
    const published = await ilse.client.post(`/api/designs/${made.body.designId}/publish`, { title: 'Sine 36' });
    remix = { designId: made.body.designId, entryId: published.body.entryId };
    await database.db.insert(showcaseItems).values([
      { entryId: original, note: 'The guild’s barleycorn', position: 0 },
      { entryId: basket, note: 'A clean weave', position: 1 },
    ]);
  });
  afterEach(() => {
    for (const close of closers.splice(0)) close();
  });

  const hide = async (kind: 'entry' | 'comment' | 'photo', id: string, reason: string) => expect((await tobias.client.post(`${itemPath(kind, id)}/hide`, { reason })).status).toBe(200);
  const restore = async (kind: 'entry' | 'comment' | 'photo', id: string) => expect((await tobias.client.post(`${itemPath(kind, id)}/restore`, {})).status).toBe(200);
  const exploreIds = async (client: Client, query = '') => (await client.get(`/api/entries${query}`)).body.items.map((e: { id: string }) => e.id);
  const showcaseIds = async (client: Client) => (await client.get('/api/showcase')).body.map((i: { entry: { id: string } }) => i.entry.id);
  const entryRoutes = (id: string) => [
    `/api/entries/${id}`, `/api/entries/${id}/revisions/1`, `/api/entries/${id}/thumbnail.svg`, `/api/entries/${id}/revisions/1/thumbnail.svg`,
    `/api/entries/${id}/export?format=svg`, `/api/entries/${id}/export?format=gcode`, `/api/entries/${id}/comments`, `/api/entries/${id}/photos`,
    `/api/entries/${id}/lineage`, `/api/entries/${id}/remixes`, `/api/entries/${id}/changes`,
  ];

  it('a hidden entry answers 404 to members and visitors on every route, and leaves Explore, search and the showcase', async () => {
    await hide('entry', original, 'Unsafe: a 0.5 mm pass in A2.');
    for (const client of [visitor, rita.client]) {
      for (const route of entryRoutes(original)) expect((await client.get(route)).status, route).toBe(404);
      expect(await exploreIds(client)).toEqual(expect.not.arrayContaining([original]));
      expect((await client.get('/api/entries?q=quillwork')).body.total).toBe(0);
      expect(await exploreIds(client, '?tags=barleycorn')).toEqual([]);
      expect(await showcaseIds(client)).toEqual([basket]);
      expect((await client.get('/api/showcase')).body[0].position).toBe(0);
    }
    // Its author reads the reason; moderators see it labelled.
    expect((await maren.client.get(`/api/entries/${original}`)).body).toMatchObject({ hidden: true, hiddenReason: 'Unsafe: a 0.5 mm pass in A2.' });
    expect((await maren.client.get(`/api/entries/${original}/thumbnail.svg`)).status).toBe(200);
    expect((await tobias.client.get(`/api/entries/${original}`)).body).toMatchObject({ hidden: true });
    expect((await tobias.client.get('/api/moderation/showcase')).body.map((i: { hidden: boolean }) => i.hidden)).toEqual([true, false]);
  });

  it('a hidden parent drops out of its remix’s lineage and page (no title, no thumbnail), and cannot be remixed anew', async () => {
    await hide('entry', original, 'Unsafe set-up.');
    const lineage = (await rita.client.get(`/api/entries/${remix.entryId}/lineage`)).body;
    expect(lineage.ancestors).toEqual([{ id: original, available: false }]);
    expect(JSON.stringify(lineage)).not.toMatch(new RegExp(`${original}/thumbnail|Sine 24`));
    expect((await rita.client.get(`/api/entries/${remix.entryId}`)).body.parent).toEqual({ entryId: original, revision: 1, title: null, available: false });
    expect((await rita.client.get(`/api/entries/${remix.entryId}/changes`)).body.parent.title).toBeNull();
    expect((await rita.client.post(`/api/entries/${original}/remix`, { boardId: rita.boardId })).status).toBe(404);
    expect((await maren.client.post(`/api/entries/${original}/remix`, { boardId: maren.boardId })).body.error.code).toBe('entry_hidden');
  });

  it('a remix made before the hiding keeps working for its board: the design, its realtime document, republishing', async () => {
    await hide('entry', original, 'Unsafe set-up.');
    expect((await ilse.client.get(`/api/designs/${remix.designId}`)).body.rosette.layers[0].lobes).toBe(36);
    const a = collabClient(baseUrl, remix.designId, sessionCookieOf(ilse.client));
    closers.push(a.destroy);
    await a.synced();
    setDesignField(a.doc, ['rosette', 'layers', 0, 'lobes'], 40);
    await expect.poll(async () => ((await ilse.client.get(`/api/designs/${remix.designId}`)).body.rosette.layers[0].lobes), { timeout: 5000 }).toBe(40);
    const republished = await ilse.client.post(`/api/designs/${remix.designId}/publish`, { title: 'Sine 40' });
    expect(republished.body).toMatchObject({ entryId: remix.entryId, created: false, revision: 2 });
  });

  it('a hidden remix leaves its parent’s remixes, count and lineage, and comes back on restore', async () => {
    await hide('entry', remix.entryId, 'Not the member’s own work.');
    expect((await rita.client.get(`/api/entries/${original}`)).body.remixCount).toBe(0);
    expect((await rita.client.get(`/api/entries/${original}/remixes`)).body).toEqual([]);
    expect((await rita.client.get(`/api/entries/${original}/lineage`)).body.descendants).toEqual([]);
    expect(await exploreIds(rita.client, '?sort=remixed')).toEqual(expect.not.arrayContaining([remix.entryId]));
    await restore('entry', remix.entryId);
    expect((await rita.client.get(`/api/entries/${original}`)).body.remixCount).toBe(1);
    expect((await rita.client.get(`/api/entries/${original}/lineage`)).body.descendants).toMatchObject([{ id: remix.entryId, available: true, thumbnailUrl: `/api/entries/${remix.entryId}/thumbnail.svg` }]);
  });

  it('restoring an entry brings everything back as it was, the showcase place included', async () => {
    await hide('entry', original, 'Unsafe set-up.');
    await restore('entry', original);
    for (const route of entryRoutes(original)) expect((await visitor.get(route)).status, route).toBe(200);
    expect((await visitor.get(`/api/entries/${original}`)).body).toMatchObject({ hidden: false, hiddenReason: null });
    expect((await visitor.get('/api/entries?q=quillwork')).body.total).toBe(1);
    expect(await showcaseIds(visitor)).toEqual([original, basket]);
    expect((await rita.client.get(`/api/entries/${remix.entryId}/lineage`)).body.ancestors).toMatchObject([{ id: original, available: true, title: 'Sine 24' }]);
  });

  it('a hidden comment leaves its entry author’s notifications (the bell counts down live) and comes back on restore', async () => {
    const spam = await commentOn(rita, original, 'Cheap rosettes at example.test');
    await commentOn(ilse, original, 'Lovely barleycorn');
    const before = (await maren.client.get('/api/notifications')).body;
    expect(before.items.map((n: { kind: string }) => n.kind)).toEqual(['comment', 'comment', 'remix']);
    const socket: Socket<NotifyServerEvents> = connect(baseUrl, { path: NOTIFY_SOCKET_PATH, transports: ['websocket'], extraHeaders: { cookie: sessionCookieOf(maren.client) }, reconnection: false, forceNew: true });
    closers.push(() => socket.disconnect());
    const counts: number[] = [];
    socket.on('notification:unread', (n) => counts.push(n));
    await expect.poll(() => counts).toEqual([3]);
    await hide('comment', spam, 'Advertising.');
    await expect.poll(() => counts).toEqual([3, 2]);
    const after = (await maren.client.get('/api/notifications')).body;
    expect(after.unread).toBe(2);
    expect(after.items).toHaveLength(2);
    expect(after.items.map((n: { actor: { id: string } }) => n.actor.id)).not.toContain(rita.id);
    await restore('comment', spam);
    await expect.poll(() => counts).toEqual([3, 2, 3]);
    expect((await maren.client.get('/api/notifications')).body.items).toHaveLength(3);
  });

  it('a hidden photo leaves the shop log and its files for all but its uploader and the moderators', async () => {
    const photo = await photoOn(ilse, original, 'Somebody else’s bar');
    await hide('photo', photo, 'Not the member’s own work.');
    for (const client of [visitor, rita.client, maren.client]) {
      expect((await client.get(`/api/entries/${original}/photos`)).body).toEqual([]);
      expect((await client.get(`/api/photos/${photo}`)).status).toBe(404);
      expect((await client.get(`/api/photos/${photo}/thumb`)).status).toBe(404);
    }
    expect((await visitor.get(`/api/entries/${original}`)).body.photoCount).toBe(0);
    for (const client of [ilse.client, tobias.client]) {
      expect((await client.get(`/api/entries/${original}/photos`)).body).toMatchObject([{ id: photo, hidden: true, hiddenReason: 'Not the member’s own work.' }]);
      expect((await client.get(`/api/photos/${photo}`)).status).toBe(200);
    }
    await restore('photo', photo);
    const back = (await visitor.get(`/api/entries/${original}/photos`)).body;
    expect(back).toMatchObject([{ id: photo, caption: 'Somebody else’s bar' }]);
    expect(back[0].hidden).toBeUndefined();
    expect((await visitor.get(`/api/photos/${photo}/thumb`)).status).toBe(200);
  });
});
