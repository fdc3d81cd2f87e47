import pg from 'pg';
import * as Y from 'yjs';
import * as encoding from 'lib0/encoding';
import * as syncProtocol from 'y-protocols/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CLOSE_CODES, MODERATION_NAMESPACE } from '@barwright/contracts';
import { readDesign, setDesignField } from '@barwright/contracts/design-doc';
import { startServerPair, type ServerPair } from '../testing/server-pair';
import { collabClient, eventually } from '../testing/collab-client';
import { closeOf, ioClient, rawCollabSocket } from '../testing/realtime-test-server';
import { sameSessionAt, signedUpAccount, storedDoc, storedRowCount } from '../testing/pair-accounts';
import { postgresAnswers, TEST_POSTGRES_URL } from '../testing/test-database';
import { redisAnswers, TEST_REDIS_URL } from '../testing/test-redis';

process.setMaxListeners(0); // every y-websocket client adds an exit listener

const services = (await postgresAnswers()) && (await redisAnswers());
if (!services) console.warn(`two-instance suite skipped: it needs PostgreSQL at ${TEST_POSTGRES_URL} and Redis at ${TEST_REDIS_URL}, and one of them does not answer.`);

const lengthOf = (doc: Y.Doc) => (readDesign(doc) as { bar: { length: number } }).bar.length;
const updateMessage = (update: Uint8Array) => {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, 0);
  syncProtocol.writeUpdate(encoder, update);
  return encoding.toUint8Array(encoder);
};

/**
 * Two real server processes on one PostgreSQL database and one Redis, behind a round-robin proxy:
 * what a club behind a load balancer gets. Both start together on the empty database.
 */
describe.skipIf(!services)('two instances on PostgreSQL and Redis', () => {
  let pair: ServerPair;
  let pool: pg.Pool;
  let owner: Awaited<ReturnType<typeof signedUpAccount>>;
  let boardId: string;
  const newDesign = async (title = 'Pair') => (await owner.http.request('POST', `/api/boards/${boardId}/designs`, { title })).body.id as string;
  const addMember = (userId: string, role: 'editor' | 'viewer') => pool.query('insert into board_members (board_id, user_id, role) values ($1, $2, $3)', [boardId, userId, role]);

  beforeAll(async () => {
    // Behind the proxy on loopback, as a deployment behind its TLS proxy sets TRUST_PROXY.
    pair = await startServerPair({ REDIS_URL: TEST_REDIS_URL, TRUST_PROXY: 'loopback' });
    pool = new pg.Pool({ connectionString: pair.databaseUrl, max: 3 });
    owner = await signedUpAccount(pair.proxyUrl, pool, 'Owner', 'admin');
    boardId = (await owner.http.request('POST', '/api/boards', { name: 'Two instances' })).body.id;
  }, 90_000);
  afterAll(async () => {
    await pool?.end();
    await pair?.close();
  });

  it('both instances came up together on the empty database (migrations under a lock)', async () => {
    for (const s of [pair.a, pair.b]) expect((await fetch(`${s.baseUrl}/api/health`)).status).toBe(200);
    expect(pair.a.output() + pair.b.output()).not.toMatch(/duplicate key|error/i);
  });

  it('an edit through A reaches a client on B, and back; GET and saved versions agree on both', async () => {
    const designId = await newDesign();
    const onA = collabClient(pair.a.baseUrl, designId, owner.cookie());
    const onB = collabClient(pair.b.baseUrl, designId, owner.cookie());
    await Promise.all([onA.synced(), onB.synced()]);
    setDesignField(onA.doc, ['bar', 'length'], 321);
    await eventually(() => lengthOf(onB.doc) === 321, 3000, 'A → B');
    setDesignField(onB.doc, ['bar', 'length'], 654);
    await eventually(() => lengthOf(onA.doc) === 654, 3000, 'B → A');
    const atB = sameSessionAt(pair.b.baseUrl, owner.http);
    const atA = sameSessionAt(pair.a.baseUrl, owner.http);
    expect((await atA.request('GET', `/api/designs/${designId}`)).body.bar.length).toBe(654);
    expect((await atB.request('GET', `/api/designs/${designId}`)).body.bar.length).toBe(654);
    const version = await atB.request('POST', `/api/designs/${designId}/versions`, { name: 'Saved on B' });
    expect((await atA.request('GET', `/api/designs/${designId}/versions/${version.body.id}`)).body.design.bar.length).toBe(654);
    onA.destroy();
    onB.destroy();
  });

  it('20 clients on both instances editing at random with random disconnects all converge, and so do both instances', async () => {
    const designId = await newDesign('Random');
    let seed = 12345;
    const random = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
    const clients = Array.from({ length: 20 }, (_, i) => collabClient(i % 2 ? pair.b.baseUrl : pair.a.baseUrl, designId, owner.cookie()));
    await Promise.all(clients.map((c) => c.synced()));
    for (let round = 0; round < 40; round++) {
      const c = clients[Math.floor(random() * clients.length)];
      const pick = random();
      if (pick < 0.15 && c.provider.wsconnected) c.provider.disconnect();
      else if (pick < 0.3 && !c.provider.shouldConnect) c.provider.connect();
      else if (pick < 0.65) setDesignField(c.doc, ['bar', 'length'], 100 + Math.floor(random() * 400));
      else c.doc.getText('notes').insert(0, `r${round};`);
      await new Promise((r) => setTimeout(r, random() * 15));
    }
    for (const c of clients) if (!c.provider.shouldConnect) c.provider.connect();
    const state = (doc: Y.Doc) => JSON.stringify({ design: readDesign(doc), notes: doc.getText('notes').toString() });
    await eventually(() => clients.every((c) => state(c.doc) === state(clients[0].doc)), 15000, 'the clients to converge');
    const expected = readDesign(clients[0].doc);
    for (const base of [pair.a.baseUrl, pair.b.baseUrl]) {
      expect((await sameSessionAt(base, owner.http).request('GET', `/api/designs/${designId}`)).body).toEqual(expected);
    }
    expect(readDesign(await storedDoc(pool, designId))).toEqual(expected);
    for (const c of clients) c.destroy();
  }, 40_000);

  it('a demotion, a removal and a suspension through A close the member\'s sockets on B, and nothing they send afterwards is stored', async () => {
    const designId = await newDesign('Access');
    const member = await signedUpAccount(pair.a.baseUrl, pool, 'Member');
    await addMember(member.id, 'editor');
    const atA = sameSessionAt(pair.a.baseUrl, owner.http);
    const headers = () => ({ cookie: member.cookie() });
    const edit = () => {
      const doc = new Y.Doc();
      setDesignField(doc, ['bar', 'length'], 999);
      return updateMessage(Y.encodeStateAsUpdate(doc));
    };

    let ws = (await rawCollabSocket(pair.b.baseUrl, designId, headers())) as import('ws').WebSocket;
    let closed = closeOf(ws);
    await atA.request('PATCH', `/api/boards/${boardId}/members/${member.id}`, { role: 'viewer' });
    expect((await closed).code).toBe(CLOSE_CODES.roleChanged);
    // Back as a viewer on B: an edit is dropped, never stored.
    ws = (await rawCollabSocket(pair.b.baseUrl, designId, headers())) as import('ws').WebSocket;
    const rows = await storedRowCount(pool, designId);
    ws.send(edit());
    await new Promise((r) => setTimeout(r, 300));
    expect(await storedRowCount(pool, designId)).toBe(rows);

    closed = closeOf(ws);
    await atA.request('DELETE', `/api/boards/${boardId}/members/${member.id}`);
    expect((await closed).code).toBe(CLOSE_CODES.forbidden);

    await addMember(member.id, 'editor');
    ws = (await rawCollabSocket(pair.b.baseUrl, designId, headers())) as import('ws').WebSocket;
    const notify = await ioClient(pair.b.baseUrl, headers());
    expect(notify.outcome).toBe('connected');
    const notifyGone = new Promise((r) => notify.socket.once('disconnect', r));
    closed = closeOf(ws);
    expect((await atA.request('PATCH', `/api/admin/users/${member.id}`, { suspended: true })).status).toBe(200);
    expect((await closed).code).toBe(CLOSE_CODES.unauthorized);
    await notifyGone;
    expect(await rawCollabSocket(pair.b.baseUrl, designId, headers()).then((s) => (typeof s === 'number' ? s : closeOf(s).then((c) => c.code)))).toBe(CLOSE_CODES.unauthorized);
    expect(await storedRowCount(pool, designId)).toBe(rows);
  });

  it('a notification caused on A reaches the member\'s socket on B; the desk count changes on both', async () => {
    const member = await signedUpAccount(pair.a.baseUrl, pool, 'Invitee');
    const notify = await ioClient(pair.b.baseUrl, { cookie: member.cookie() });
    expect(notify.outcome).toBe('connected');
    const arrived = new Promise<{ kind: string }>((r) => notify.socket.on('notification:new', (n: { kind: string }) => r(n)));
    await sameSessionAt(pair.a.baseUrl, owner.http).request('POST', `/api/boards/${boardId}/invitations`, { email: member.email, role: 'viewer' });
    expect((await arrived).kind).toBe('invitation');
    notify.socket.disconnect();

    const moderator = await signedUpAccount(pair.b.baseUrl, pool, 'Moderator', 'moderator');
    const desks = await Promise.all([pair.a.baseUrl, pair.b.baseUrl].map((base) => ioClient(base, { cookie: moderator.cookie() }, MODERATION_NAMESPACE)));
    expect(desks.map((d) => d.outcome)).toEqual(['connected', 'connected']);
    const counts = desks.map((d) => new Promise<number>((r) => d.socket.on('moderation:queue', (n: number) => n > 0 && r(n))));
    const designId = await newDesign('Reported');
    const entry = await owner.http.request('POST', `/api/designs/${designId}/publish`, { title: 'Reported entry' });
    const reporter = sameSessionAt(pair.a.baseUrl, member.http);
    const report = await reporter.request('POST', '/api/reports', { target: { kind: 'entry', id: entry.body.entryId }, reason: 'spam' });
    expect(report.status).toBe(201);
    expect(await Promise.all(counts)).toEqual([1, 1]);
    for (const d of desks) d.socket.disconnect();
  }, 40_000);

  it('failed sign-ins alternating between the instances hit the lock at the same count as on one instance', async () => {
    const member = await signedUpAccount(pair.a.baseUrl, pool, 'Locked');
    const statuses: number[] = [];
    for (let i = 0; i < 9; i++) {
      const http = sameSessionAt(i % 2 ? pair.b.baseUrl : pair.a.baseUrl, member.http);
      statuses.push((await http.request('POST', '/api/auth/sign-in', { email: member.email, password: 'wrong-walnut-crosscut-00' })).status);
    }
    expect(statuses).toEqual([401, 401, 401, 401, 401, 401, 401, 401, 429]);
  });

  // Last: it kills instance A.
  it('kill -9 of one instance during an edit burst: the stored state holds every update any client had sent', async () => {
    const designId = await newDesign('Burst');
    const clients = Array.from({ length: 6 }, () => collabClient(pair.proxyUrl, designId, owner.cookie()));
    await Promise.all(clients.map((c) => c.synced()));
    // Each client's closings, so a client that does not come back says why.
    const closings = clients.map((c) => {
      const codes: string[] = [];
      c.provider.on('connection-close', (e: CloseEvent | null) => codes.push(e ? `${e.code}${e.reason ? ` ${e.reason}` : ''}` : 'none'));
      return codes;
    });
    const sent = new Set<string>();
    let n = 0;
    const type = () => {
      for (const [i, c] of clients.entries()) {
        const token = `c${i}e${n};`;
        c.doc.getText('notes').insert(0, token);
        sent.add(token);
      }
      n++;
    };
    const typing = setInterval(type, 10);
    await new Promise((r) => setTimeout(r, 300));
    pair.a.child.kill('SIGKILL');
    pair.markDown(pair.a); // the balancer's health check would notice
    await new Promise((r) => setTimeout(r, 300));
    clearInterval(typing);
    // Clients that were on A reconnect through the proxy to B and send what B lacks; it is stored before it is relayed.
    await eventually(() => clients.every((c) => c.provider.wsconnected && c.provider.synced), 15000, 'every client to be back, on B').catch((error: Error) => {
      const states = clients.map((c, i) => `client ${i}: connected ${c.provider.wsconnected}, connecting ${c.provider.wsconnecting}, synced ${c.provider.synced}, closings [${closings[i].join(', ')}]`);
      throw new Error(`${error.message}\n${states.join('\n')}\nB said:\n${pair.b.output().slice(-3000)}`);
    });
    const stored = async () => (await storedDoc(pool, designId)).getText('notes').toString();
    let text = '';
    for (let i = 0; i < 50 && ![...sent].every((t) => text.includes(t)); i++) {
      if (i) await new Promise((r) => setTimeout(r, 100));
      text = await stored();
    }
    expect([...sent].filter((t) => !text.includes(t))).toEqual([]);
    for (const c of clients) c.destroy();
  }, 40_000);
});
