import type WebSocket from 'ws';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { CLOSE_CODES, MODERATION_NAMESPACE } from '@barwright/contracts';
import { issueToken } from '../auth/account-tokens';
import { openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, sidOf } from '../testing/test-app';
import { closeOf, ioClient, rawCollabSocket, startRealtimeTestServer, TEST_ORIGIN } from '../testing/realtime-test-server';

const FOREIGN = 'http://localhost:3001'; // another port of the same host: same site, another origin

describe('who may keep a realtime socket', () => {
  let database: TestDatabase;
  let server: Awaited<ReturnType<typeof startRealtimeTestServer>>;
  let designId: string;
  const cleanup: (() => void)[] = [];

  beforeAll(async () => {
    database = await openTestDatabase('pglite');
    server = await startRealtimeTestServer(database);
  });
  afterAll(async () => {
    await server.close();
    await database.close();
  });
  beforeEach(async () => {
    await database.reset();
    await makeUser(database, 'mod@example.test', 'moderator');
  });
  afterEach(() => {
    for (const c of cleanup.splice(0)) c();
  });

  async function signedIn() {
    const client = new Client(server.app);
    const cookie = sidOf(await client.signIn('mod@example.test'))!;
    if (!designId || (await client.get(`/api/designs/${designId}`)).status !== 200) {
      const boardId = (await client.post('/api/boards', { name: 'Access' })).body.id;
      designId = (await client.post(`/api/boards/${boardId}/designs`, { title: 'Shared' })).body.id;
    }
    return { client, cookie };
  }
  async function collab(cookie: string, origin?: string) {
    const ws = await rawCollabSocket(server.baseUrl, designId, origin ? { cookie, origin } : { cookie });
    if (typeof ws !== 'number') cleanup.push(() => ws.terminate());
    return ws;
  }
  async function io(cookie: string, origin?: string, namespace = '/') {
    const client = await ioClient(server.baseUrl, origin ? { cookie, origin } : { cookie }, namespace);
    cleanup.push(() => client.socket.close());
    return client;
  }
  const ioClosed = (socket: Awaited<ReturnType<typeof io>>['socket']) => new Promise<string>((r) => socket.once('disconnect', (why) => r(why)));

  it('refuses a foreign Origin on both endpoints, and admits the public origin and none', async () => {
    const { cookie } = await signedIn();
    expect(await collab(cookie, FOREIGN)).toBe(403);
    expect((await io(cookie, FOREIGN)).outcome).not.toBe('connected');
    expect((await io(cookie, FOREIGN, MODERATION_NAMESPACE)).outcome).not.toBe('connected');
    expect(typeof (await collab(cookie, TEST_ORIGIN))).toBe('object');
    expect(typeof (await collab(cookie, 'http://127.0.0.1:3000'))).toBe('object'); // the same loopback server
    expect(typeof (await collab(cookie))).toBe('object'); // no Origin: not a browser
    expect((await io(cookie, TEST_ORIGIN)).outcome).toBe('connected');
  });

  it('signing out closes the sockets of that session only: collab, notifications and the desk', async () => {
    const { client, cookie } = await signedIn();
    const other = await signedIn(); // the same account in another browser
    const ws = (await collab(cookie, TEST_ORIGIN)) as WebSocket;
    const notify = await io(cookie, TEST_ORIGIN);
    const desk = await io(cookie, TEST_ORIGIN, MODERATION_NAMESPACE);
    const otherWs = (await collab(other.cookie, TEST_ORIGIN)) as WebSocket;
    const otherNotify = await io(other.cookie, TEST_ORIGIN);
    expect([notify.outcome, desk.outcome, otherNotify.outcome]).toEqual(['connected', 'connected', 'connected']);
    const closed = Promise.all([closeOf(ws), ioClosed(notify.socket), ioClosed(desk.socket)] as const);
    expect((await client.post('/api/auth/sign-out')).status).toBe(204);
    const [collabClose, notifyWhy, deskWhy] = await closed;
    expect(collabClose.code).toBe(CLOSE_CODES.unauthorized);
    expect([notifyWhy, deskWhy]).toEqual(['io server disconnect', 'io server disconnect']);
    await new Promise((r) => setTimeout(r, 100));
    expect(otherWs.readyState).toBe(otherWs.OPEN);
    expect(otherNotify.socket.connected).toBe(true);
  });

  it('a password reset closes every socket of the account', async () => {
    const first = await signedIn();
    const second = await signedIn();
    const sockets = [(await collab(first.cookie)) as WebSocket, (await collab(second.cookie)) as WebSocket];
    const notify = [await io(first.cookie), await io(second.cookie), await io(second.cookie, undefined, MODERATION_NAMESPACE)];
    const closed = [...sockets.map(closeOf), ...notify.map((n) => ioClosed(n.socket))];
    const userId = (await first.client.get('/api/auth/me')).body.id;
    const token = await issueToken(database.db, userId, 'reset');
    const res = await new Client(server.app).post('/api/auth/password-reset/confirm', { token, password: 'another-walnut-crosscut-77' });
    expect(res.status).toBe(200);
    const outcomes = await Promise.all(closed);
    expect(outcomes.slice(0, 2).map((o) => (o as { code: number }).code)).toEqual([CLOSE_CODES.unauthorized, CLOSE_CODES.unauthorized]);
    expect(outcomes.slice(2)).toEqual(['io server disconnect', 'io server disconnect', 'io server disconnect']);
  });
});
