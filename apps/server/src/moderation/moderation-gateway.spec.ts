import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { io as connect, type Socket } from 'socket.io-client';
import { MODERATION_NAMESPACE, NOTIFY_SOCKET_PATH, type ModerationServerEvents } from '@barwright/contracts';
import type { AppLocals } from '../app';
import { availableDrivers, openTestDatabase, type TestDatabase } from '../testing/test-database';
import { startTestServer, type TestServer } from '../testing/test-app';
import { publishedBar, sessionCookieOf, type Member } from '../community/community-testing';
import { NotifyGateway } from '../notifications/notify-gateway';
import { ModerationGateway } from './moderation-gateway';
import { commentOn, person, report } from './moderation-testing';

const drivers = await availableDrivers();

describe.each(drivers)('the desk socket on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let httpServer: http.Server;
  let notify: NotifyGateway;
  let gateway: ModerationGateway;
  let baseUrl: string;
  let maren: Member;
  let ilse: Member;
  let tobias: Member;
  let odile: Member;
  let comment: string;
  const sockets: Socket[] = [];

  beforeAll(async () => {
    database = await openTestDatabase(driver);
    // As main.ts wires it: a suspension closes the user's notification sockets; the desk socket listens to the moderation events.
    server = await startTestServer(database, { closeUserSockets: (userId) => notify?.disconnectUser(userId) });
    httpServer = http.createServer(server.app);
    const locals = server.app.locals as AppLocals;
    notify = new NotifyGateway({ db: database.db, sessionParser: locals.sessionParser, events: locals.notificationEvents, log: () => {} });
    notify.attach(httpServer);
    gateway = new ModerationGateway({ io: notify.io, db: database.db, sessionParser: locals.sessionParser, events: locals.moderationEvents, log: () => {} });
    await new Promise<void>((r) => httpServer.listen(0, '127.0.0.1', r));
    baseUrl = `http://127.0.0.1:${(httpServer.address() as AddressInfo).port}`;
  });
  afterAll(async () => {
    gateway.close();
    notify.close();
    await new Promise((r) => httpServer.close(r));
    await server.close();
    await database.close();
  });
  beforeEach(async () => {
    await database.reset();
    maren = await person(database, server, 'maren');
    ilse = await person(database, server, 'ilse');
    tobias = await person(database, server, 'tobias', 'moderator');
    odile = await person(database, server, 'odile', 'admin');
    const entryId = (await publishedBar(maren, 'Sine 24')).entryId;
    comment = await commentOn(ilse, entryId, 'Cheap rosettes at example.test');
  });
  afterEach(() => {
    for (const s of sockets.splice(0)) s.disconnect();
  });

  function deskSocket(m?: Member): Socket<ModerationServerEvents> {
    const socket = connect(baseUrl + MODERATION_NAMESPACE, { path: NOTIFY_SOCKET_PATH, transports: ['websocket'], extraHeaders: m ? { cookie: sessionCookieOf(m.client) } : {}, reconnection: false, forceNew: true });
    sockets.push(socket);
    return socket;
  }
  const refusal = (socket: Socket) => new Promise<string>((resolve) => socket.once('connect_error', (e) => resolve(e.message)));
  /** Every count the socket hears, in order. */
  const counts = (socket: Socket<ModerationServerEvents>) => {
    const heard: number[] = [];
    socket.on('moderation:queue', (n) => heard.push(n));
    return heard;
  };

  it('lets in moderators and admins only', async () => {
    expect(await refusal(deskSocket())).toBe('unauthorized');
    expect(await refusal(deskSocket(maren))).toBe('forbidden');
    const heard = counts(deskSocket(odile));
    await expect.poll(() => heard).toEqual([0]);
  });

  it('tells every open desk the open-report count as it changes', async () => {
    const heard = counts(deskSocket(tobias));
    await expect.poll(() => heard).toEqual([0]);
    await report(maren, 'comment', comment, 'spam');
    await expect.poll(() => heard).toEqual([0, 1]);
    await odile.client.post(`/api/moderation/items/comment/${comment}/hide`, { reason: 'Advertising.' });
    await expect.poll(() => heard).toEqual([0, 1, 0]);
  });

  it('ends the socket of a moderator at once when the role is removed or the account suspended', async () => {
    const socket = deskSocket(tobias);
    const heard = counts(socket);
    await expect.poll(() => heard).toEqual([0]);
    const ended = new Promise<string>((resolve) => socket.once('disconnect', resolve));
    expect((await odile.client.patch(`/api/admin/users/${tobias.id}`, { role: 'member' })).status).toBe(200);
    expect(await ended).toBe('io server disconnect');
    expect(await refusal(deskSocket(tobias))).toBe('forbidden');

    await odile.client.patch(`/api/admin/users/${tobias.id}`, { role: 'moderator' });
    const again = deskSocket(tobias);
    await expect.poll(() => again.connected).toBe(true);
    const suspended = new Promise<string>((resolve) => again.once('disconnect', resolve));
    await odile.client.patch(`/api/admin/users/${tobias.id}`, { suspended: true });
    expect(await suspended).toBe('io server disconnect');
  });
});
