import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { io as connect, type Socket } from 'socket.io-client';
import { NOTIFY_SOCKET_PATH, VOTES_NAMESPACE, type VoteClientEvents, type VoteServerEvents } from '@barwright/contracts';
import type { AppLocals } from '../app';
import { BoardAccessEvents } from '../boards/board-access';
import { availableDrivers, openTestDatabase, type TestDatabase } from '../testing/test-database';
import { startTestServer, type Client, type TestServer } from '../testing/test-app';
import { sessionCookieOf } from '../community/community-testing';
import { NotifyGateway } from '../notifications/notify-gateway';
import { VoteGateway } from './vote-gateway';
import { boardWithMembers, inAWeek } from './votes-testing';

const drivers = await availableDrivers();
type Update = Parameters<VoteServerEvents['vote:ranking']>[0];

describe.each(drivers)('the vote socket on %s', (driver) => {
  let database: TestDatabase;
  let server: TestServer;
  let httpServer: http.Server;
  let notify: NotifyGateway;
  let gateway: VoteGateway;
  let baseUrl: string;
  let c: Record<string, Client>;
  let ids: Record<string, string>;
  let boardId: string;
  let designIds: string[];
  let voteId: string;
  const sockets: Socket[] = [];
  const accessEvents = new BoardAccessEvents();

  beforeAll(async () => {
    database = await openTestDatabase(driver);
    server = await startTestServer(database, { accessEvents });
    httpServer = http.createServer(server.app);
    const locals = server.app.locals as AppLocals;
    notify = new NotifyGateway({ db: database.db, sessionParser: locals.sessionParser, events: locals.notificationEvents, log: () => {} });
    notify.attach(httpServer);
    gateway = new VoteGateway({ io: notify.io, db: database.db, sessionParser: locals.sessionParser, votes: locals.votes, accessEvents, log: () => {} });
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
    ({ clients: c, ids, boardId, designIds } = await boardWithMembers(database, server));
    voteId = (await c.owner.post(`/api/boards/${boardId}/votes`, { question: 'Which would you cut?', designIds, closesAt: inAWeek() })).body.id;
  });
  afterEach(() => {
    for (const s of sockets.splice(0)) s.disconnect();
  });

  function voteSocket(who?: Client): Socket<VoteServerEvents, VoteClientEvents> {
    const socket = connect(baseUrl + VOTES_NAMESPACE, { path: NOTIFY_SOCKET_PATH, transports: ['websocket'], extraHeaders: who ? { cookie: sessionCookieOf(who) } : {}, reconnection: false, forceNew: true });
    sockets.push(socket);
    return socket;
  }
  const heard = (socket: Socket<VoteServerEvents, VoteClientEvents>) => {
    const updates: Update[] = [];
    const refusals: string[] = [];
    socket.on('vote:ranking', (u) => updates.push(u));
    socket.on('vote:refused', (r) => refusals.push(r.voteId));
    return { updates, refusals };
  };

  it('refuses a visitor, and a watch by someone not on the board', async () => {
    const visitor = voteSocket();
    expect(await new Promise((r) => visitor.once('connect_error', (e) => r(e.message)))).toBe('unauthorized');
    const outsider = voteSocket(c.outsider);
    const { updates, refusals } = heard(outsider);
    outsider.emit('vote:watch', voteId);
    await expect.poll(() => refusals).toEqual([voteId]);
    await c.viewer.send('put', `/api/votes/${voteId}/answers`, { a: designIds[0], b: designIds[1], pick: 'a' });
    await new Promise((r) => setTimeout(r, 200));
    expect(updates).toEqual([]);
  });

  it('pushes the ranking live to every member watching as answers arrive, and when it closes', async () => {
    const owner = voteSocket(c.owner);
    const { updates } = heard(owner);
    owner.emit('vote:watch', voteId);
    await expect.poll(() => updates.length).toBe(1);
    expect(updates[0]).toMatchObject({ voteId, answers: 0, closed: false });
    await c.viewer.send('put', `/api/votes/${voteId}/answers`, { a: designIds[2], b: designIds[1], pick: 'a' });
    await expect.poll(() => updates.length).toBe(2);
    expect(updates[1].answers).toBe(1);
    expect(updates[1].ranking[0]).toMatchObject({ designId: designIds[2], wins: 1, comparisons: 1 });
    await c.editor.post(`/api/votes/${voteId}/close`);
    await expect.poll(() => updates.at(-1)?.closed).toBe(true);
  });

  it('checks every message: a member who leaves the board hears no more, and a socket that speaks out of turn is dropped', async () => {
    const viewer = voteSocket(c.viewer);
    const { updates, refusals } = heard(viewer);
    viewer.emit('vote:watch', voteId);
    await expect.poll(() => updates.length).toBe(1);
    expect((await c.owner.send('delete', `/api/boards/${boardId}/members/${ids.viewer}`)).status).toBe(204);
    await new Promise((r) => setTimeout(r, 200));
    await c.editor.send('put', `/api/votes/${voteId}/answers`, { a: designIds[0], b: designIds[1], pick: 'a' });
    await new Promise((r) => setTimeout(r, 200));
    expect(updates).toHaveLength(1);
    viewer.emit('vote:watch', voteId);
    await expect.poll(() => refusals).toEqual([voteId]);
    const ended = new Promise<string>((r) => viewer.once('disconnect', r));
    (viewer as unknown as Socket).emit('answer', { a: 1 });
    expect(await ended).toBe('io server disconnect');
  });
});
