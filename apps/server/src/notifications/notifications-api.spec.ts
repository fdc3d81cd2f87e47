import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { io as connect, type Socket } from 'socket.io-client';
import { NOTIFY_SOCKET_PATH, type Notification, type NotifyServerEvents } from '@barwright/contracts';
import type { AppLocals } from '../app';
import { availableDrivers, openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, startTestServer, type TestServer } from '../testing/test-app';
import { member, publishedBar, sessionCookieOf, type Member } from '../community/community-testing';
import { NotifyGateway } from './notify-gateway';
import { sendDueDigests } from './digests';
import { createMailer } from '../mail/mailer';

const drivers = await availableDrivers();
const SECRET = 'test-secret-test-secret-test-secret-0123'; // startTestServer's session secret
const tokenIn = (text: string) => text.match(/unsubscribe\?token=([A-Za-z0-9_.-]+)/)?.[1] ?? '';
const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe.each(drivers)('notifications on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let httpServer: http.Server;
  let gateway: NotifyGateway;
  let baseUrl: string;
  let maren: Member;
  let tobias: Member;
  let entryId: string;
  const sockets: Socket[] = [];

  /** A socket.io client in Node that sends a cookie at the handshake, as a browser would. */
  function socketFor(cookie?: string): Socket<NotifyServerEvents> {
    const socket = connect(baseUrl, { path: NOTIFY_SOCKET_PATH, transports: ['websocket'], extraHeaders: cookie ? { cookie } : {}, reconnection: false, forceNew: true });
    sockets.push(socket);
    return socket;
  }
  const next = <E extends keyof NotifyServerEvents>(socket: Socket<NotifyServerEvents>, event: E) =>
    new Promise<Parameters<NotifyServerEvents[E]>>((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error(`no ${event} within 5 s`)), 5000);
      socket.once(event as never, ((...args: Parameters<NotifyServerEvents[E]>) => {
        clearTimeout(timer);
        resolve(args);
      }) as never);
    });

  beforeAll(async () => {
    database = await openTestDatabase(driver);
    server = await startTestServer(database, { closeUserSockets: (userId) => gateway?.disconnectUser(userId) }); // as main.ts wires it
    httpServer = http.createServer(server.app);
    const locals = server.app.locals as AppLocals;
    gateway = new NotifyGateway({ db: database.db, sessionParser: locals.sessionParser, events: locals.notificationEvents });
    gateway.attach(httpServer);
    await new Promise<void>((resolve) => httpServer.listen(0, '127.0.0.1', resolve));
    baseUrl = `http://127.0.0.1:${(httpServer.address() as AddressInfo).port}`;
  });
  afterAll(async () => {
    gateway?.close();
    await new Promise((resolve) => httpServer?.close(resolve));
    await server?.close();
    await database?.close();
  });
  beforeEach(async () => {
    await database.reset();
    maren = await member(database, server, 'maren');
    tobias = await member(database, server, 'tobias');
    entryId = (await publishedBar(maren, 'Sine 24')).entryId;
  });
  afterEach(() => {
    for (const s of sockets.splice(0)) s.disconnect();
  });

  it('refuses a socket without a signed-in session', async () => {
    const error = await new Promise<Error>((resolve) => socketFor().once('connect_error', resolve));
    expect(error.message).toBe('unauthorized');
    const forged = await new Promise<Error>((resolve) => socketFor('barwright.sid=s%3Aforged.signature').once('connect_error', resolve));
    expect(forged.message).toBe('unauthorized');
  });

  it('delivers a comment live to the author’s room only, and by e-mail at once', async () => {
    const author = socketFor(sessionCookieOf(maren.client));
    const bystander = socketFor(sessionCookieOf(tobias.client));
    // Both first counts listened for before either is awaited: the bystander's may arrive first.
    const [authorCount] = await Promise.all([next(author, 'notification:unread'), next(bystander, 'notification:unread')]);
    expect(authorCount).toEqual([0]);
    let bystanderHeard = false;
    bystander.on('notification:new', () => (bystanderHeard = true));
    const since = new Date();
    const live = next(author, 'notification:new');
    expect((await tobias.client.post(`/api/entries/${entryId}/comments`, { body: 'Crisp lines.' })).status).toBe(201);
    const [notification, unread] = (await live) as [Notification, number];
    expect(notification).toMatchObject({ kind: 'comment', text: 'tobias commented on your bar “Sine 24”.', link: `/entries/${entryId}#comments`, entryId, read: false, actor: { id: tobias.id } });
    expect(unread).toBe(1);
    const mail = await server.smtp.waitFor(maren.email, since);
    expect(mail.subject).toBe('tobias commented on your bar “Sine 24”.');
    expect(mail.text).toContain(`http://localhost:3000/entries/${entryId}#comments`);
    expect(tokenIn(mail.text)).not.toBe('');
    await pause(100);
    expect(bystanderHeard).toBe(false);
  });

  it('tells of remixes, first ratings and invitations, never of one’s own doings', async () => {
    await tobias.client.send('put', `/api/entries/${entryId}/rating`, { stars: 5 });
    await tobias.client.send('put', `/api/entries/${entryId}/rating`, { stars: 4 }); // a change: no second notification
    await tobias.client.post(`/api/entries/${entryId}/remix`, { boardId: tobias.boardId });
    await maren.client.post(`/api/entries/${entryId}/comments`, { body: 'My own note' });
    await maren.client.post(`/api/entries/${entryId}/remix`, { boardId: maren.boardId });
    await maren.client.post(`/api/boards/${maren.boardId}/invitations`, { email: tobias.email, role: 'editor' });
    const forMaren = (await maren.client.get('/api/notifications')).body;
    expect(forMaren.items.map((n: Notification) => n.text)).toEqual(['tobias remixed your bar “Sine 24”.', 'tobias rated your bar “Sine 24”: 5 of 5 stars.']);
    expect(forMaren.unread).toBe(2);
    const forTobias = (await tobias.client.get('/api/notifications')).body.items;
    expect(forTobias).toMatchObject([{ kind: 'invitation', boardId: maren.boardId, link: '/boards' }]);
    expect(forTobias[0].text).toMatch(/^maren invited you to the board “maren's bars” as an editor\./);
    expect((await new Client(server.app).get('/api/notifications')).status).toBe(401);
  });

  it('marks read by id or all, and tells the open sockets the new count', async () => {
    await tobias.client.send('put', `/api/entries/${entryId}/rating`, { stars: 5 });
    await tobias.client.post(`/api/entries/${entryId}/comments`, { body: 'one' });
    const socket = socketFor(sessionCookieOf(maren.client));
    expect(await next(socket, 'notification:unread')).toEqual([2]);
    const [newest] = (await maren.client.get('/api/notifications')).body.items;
    const counted = next(socket, 'notification:unread');
    expect((await maren.client.post('/api/notifications/read', { ids: [newest.id] })).body).toEqual({ unread: 1 });
    expect(await counted).toEqual([1]);
    expect((await maren.client.post('/api/notifications/read', { all: true })).body).toEqual({ unread: 0 });
    expect((await maren.client.post('/api/notifications/read', { ids: [] })).status).toBe(400);
    expect((await maren.client.get('/api/notifications?limit=1')).body.items).toMatchObject([{ read: true }]);
  });

  it('sends a daily digest instead in digest mode, and stops e-mail by the one-click link', async () => {
    expect((await maren.client.send('put', '/api/notifications/settings', { email: 'digest' })).body).toEqual({ email: 'digest' });
    expect((await maren.client.send('put', '/api/notifications/settings', { email: 'weekly' })).status).toBe(400);
    const since = new Date();
    await tobias.client.post(`/api/entries/${entryId}/comments`, { body: 'one' });
    await tobias.client.send('put', `/api/entries/${entryId}/rating`, { stars: 5 });
    await pause(300);
    expect(server.smtp.messages().filter((m) => m.to.includes(maren.email) && new Date(m.sentAt) >= since)).toEqual([]);

    const mailer = createMailer({ localPort: server.smtp.port, from: 'Barwright <no-reply@barwright.example>' });
    const deps = { db: database.db, mailer, publicUrl: 'http://localhost:3000', secret: SECRET };
    expect(await sendDueDigests(deps)).toBe(1);
    const digest = await server.smtp.waitFor(maren.email, since);
    expect(digest.subject).toBe('Barwright: 2 new notifications');
    expect(digest.text).toContain('• tobias commented on your bar “Sine 24”.');
    expect(await sendDueDigests(deps)).toBe(0); // nothing new, and not a day yet
    await tobias.client.post(`/api/entries/${entryId}/comments`, { body: 'two' });
    expect(await sendDueDigests(deps)).toBe(0);
    expect(await sendDueDigests(deps, new Date(Date.now() + 25 * 3600_000))).toBe(1);
    deps.mailer.close();

    const visitor = new Client(server.app);
    expect((await visitor.get(`/api/notifications/unsubscribe?token=${tokenIn(digest.text)}x`)).status).toBe(400);
    const page = await visitor.agent.get(`/api/notifications/unsubscribe?token=${tokenIn(digest.text)}`).set('Accept', 'text/html');
    expect(page.status).toBe(200);
    expect(page.text).toMatch(/no more notification e-mails/);
    expect((await maren.client.get('/api/notifications/settings')).body).toEqual({ email: 'off' });
    const after = new Date();
    await tobias.client.post(`/api/entries/${entryId}/comments`, { body: 'three' });
    await pause(300);
    expect(server.smtp.messages().filter((m) => m.to.includes(maren.email) && new Date(m.sentAt) >= after)).toEqual([]);
    expect((await maren.client.get('/api/notifications')).body.unread).toBe(4);
  });

  it('ends the sockets of a suspended member', async () => {
    await makeUser(database, 'admin@example.test', 'admin');
    const admin = new Client(server.app);
    await admin.signIn('admin@example.test');
    const cookie = sessionCookieOf(tobias.client);
    const socket = socketFor(cookie);
    await next(socket, 'notification:unread');
    const closed = new Promise((resolve) => socket.once('disconnect', resolve));
    expect((await admin.patch(`/api/admin/users/${tobias.id}`, { suspended: true })).status).toBe(200);
    expect(await closed).toBe('io server disconnect');
    const again = await new Promise<Error>((resolve) => socketFor(cookie).once('connect_error', resolve));
    expect(again.message).toBe('unauthorized');
  });
});
