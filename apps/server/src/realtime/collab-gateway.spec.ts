import * as Y from 'yjs';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { CLOSE_CODES } from '@barwright/contracts';
import { DESIGN_MAP, readDesign, setDesignField } from '@barwright/contracts/design-doc';
import { designUpdates } from '../../../../db/schema';
import { openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, sidOf } from '../testing/test-app';
import { collabClient, eventually } from '../testing/collab-client';
import { startRealtimeTestServer } from '../testing/realtime-test-server';

describe('collaboration gateway', () => {
  let database: TestDatabase;
  let server: Awaited<ReturnType<typeof startRealtimeTestServer>>;
  let owner: Client;
  let ownerCookie: string;
  let designId: string;
  let boardId: string;
  const clients: { destroy(): void }[] = [];

  beforeAll(async () => {
    database = await openTestDatabase('pglite');
    // The convergence test opens 20 sockets with one session, more than a session may by default.
    server = await startRealtimeTestServer(database, { limits: { socketsPerSession: 32 } });
  });
  afterAll(async () => {
    await server.close();
    await database.close();
  });
  beforeEach(async () => {
    await database.reset();
    await makeUser(database, 'owner@example.test');
    owner = new Client(server.app);
    ownerCookie = sidOf(await owner.signIn('owner@example.test'))!;
    boardId = (await owner.post('/api/boards', { name: 'Collab' })).body.id;
    designId = (await owner.post(`/api/boards/${boardId}/designs`, { title: 'Shared' })).body.id;
  });
  afterEach(() => {
    for (const c of clients.splice(0)) c.destroy();
  });

  async function member(email: string, role: 'editor' | 'viewer') {
    const user = await makeUser(database, email);
    const { boardMembers } = await import('../../../../db/schema');
    await database.db.insert(boardMembers).values({ boardId, userId: user.id, role });
    const c = new Client(server.app);
    return { user, cookie: sidOf(await c.signIn(email))! };
  }
  const open = (cookie: string) => {
    const c = collabClient(server.baseUrl, designId, cookie);
    clients.push(c);
    return c;
  };
  const lobes = (doc: Y.Doc) => (readDesign(doc) as any).rosette?.layers?.[0]?.lobes;

  it('refuses the upgrade without a session (4401) and for non-members (4403)', async () => {
    const anonymous = open('barwright.sid=nothing');
    expect((await anonymous.closed()).code).toBe(CLOSE_CODES.unauthorized);
    await makeUser(database, 'outsider@example.test');
    const outsiderCookie = sidOf(await new Client(server.app).signIn('outsider@example.test'))!;
    expect((await open(outsiderCookie).closed()).code).toBe(CLOSE_CODES.forbidden);
  });

  it('serves the stored design and relays edits between two editors', async () => {
    const { cookie } = await member('ed@example.test', 'editor');
    const a = open(ownerCookie);
    const b = open(cookie);
    await Promise.all([a.synced(), b.synced()]);
    await eventually(() => lobes(a.doc) === 24 && lobes(b.doc) === 24, 5000, 'initial state');
    setDesignField(a.doc, ['rosette', 'layers', 0, 'lobes'], 36);
    await eventually(() => lobes(b.doc) === 36, 2000, 'relayed edit');
    b.doc.getText('notes').insert(0, 'Cut in A2 next week.');
    await eventually(() => a.doc.getText('notes').toString() === 'Cut in A2 next week.');
    const stored = await server.collab.store.loadDoc(designId);
    expect(lobes(stored)).toBe(36);
  });

  it('an edit typed the moment the connection returns, after edits made offline, is asked for again, not refused: both arrive and are stored', async () => {
    const a = open(ownerCookie);
    await a.synced();
    const closings: number[] = [];
    a.provider.on('connection-close', (e: CloseEvent | null) => e && closings.push(e.code));
    a.provider.disconnect();
    a.doc.getText('notes').insert(0, 'offline;');
    // On open the client sends its step 1 and, at once, this edit; what it made offline goes only in
    // its answer to the server's step 1, which is still on the way. The edit builds on the offline one.
    const typeOnOpen = ({ status }: { status: string }) => {
      if (status !== 'connected') return;
      a.provider.off('status', typeOnOpen);
      a.doc.getText('notes').insert(0, 'at-reconnect;');
    };
    a.provider.on('status', typeOnOpen);
    a.provider.connect();
    await eventually(() => a.provider.synced, 5000, 'the client to sync');
    const expected = 'at-reconnect;offline;';
    let stored = '';
    for (let i = 0; i < 50 && stored !== expected; i++) {
      if (i) await new Promise((r) => setTimeout(r, 100));
      stored = (await server.collab.store.loadDoc(designId)).getText('notes').toString();
    }
    expect(stored).toBe(expected);
    expect(closings).toEqual([]);
    const b = open(ownerCookie);
    await b.synced();
    expect(b.doc.getText('notes').toString()).toBe(expected);
  });

  it('drops a viewer\'s edits: never relayed, never stored', async () => {
    const { cookie } = await member('vi@example.test', 'viewer');
    const a = open(ownerCookie);
    const v = open(cookie);
    await Promise.all([a.synced(), v.synced()]);
    const rowsBefore = await server.collab.store.rowCount(designId);
    setDesignField(v.doc, ['rosette', 'layers', 0, 'lobes'], 99);
    setDesignField(a.doc, ['bar', 'length'], 140);
    await eventually(() => (readDesign(v.doc) as any).bar.length === 140);
    await new Promise((r) => setTimeout(r, 200));
    expect(lobes(a.doc)).toBe(24);
    expect(await server.collab.store.rowCount(designId)).toBe(rowsBefore + 1);
  });

  it('applies a role change and a removal to open sockets at once', async () => {
    const { user, cookie } = await member('ch@example.test', 'editor');
    const a = open(ownerCookie);
    const e = open(cookie);
    await Promise.all([a.synced(), e.synced()]);
    const changed = e.closed();
    expect((await owner.patch(`/api/boards/${boardId}/members/${user.id}`, { role: 'viewer' })).status).toBe(200);
    expect((await changed).code).toBe(CLOSE_CODES.roleChanged);
    e.provider.connect();
    await e.synced();
    setDesignField(e.doc, ['rosette', 'layers', 0, 'lobes'], 50);
    await new Promise((r) => setTimeout(r, 300));
    expect(lobes(a.doc)).toBe(24);
    const closed = e.closed();
    await owner.send('delete', `/api/boards/${boardId}/members/${user.id}`);
    expect((await closed).code).toBe(CLOSE_CODES.forbidden);
  });

  it('closes a suspended member\'s sockets at once', async () => {
    const { user, cookie } = await member('su@example.test', 'editor');
    await makeUser(database, 'boss@example.test', 'admin');
    const admin = new Client(server.app);
    await admin.signIn('boss@example.test');
    const e = open(cookie);
    await e.synced();
    const closed = e.closed();
    expect((await admin.patch(`/api/admin/users/${user.id}`, { suspended: true })).status).toBe(200);
    expect((await closed).code).toBe(CLOSE_CODES.unauthorized);
  });

  it.each([2, 20])('converges with %i clients making random concurrent edits through random disconnects', async (n) => {
    const peers = Array.from({ length: n }, () => open(ownerCookie));
    await Promise.all(peers.map((p) => p.synced()));
    let seed = 7 + n;
    const random = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
    for (let round = 0; round < 60; round++) {
      const p = peers[Math.floor(random() * n)];
      const r = random();
      if (r < 0.15) p.provider.disconnect();
      else if (r < 0.3) p.provider.connect();
      else if (r < 0.65) setDesignField(p.doc, ['rosette', 'layers', 0, 'lobes'], 1 + Math.floor(random() * 100));
      else p.doc.getText('notes').insert(Math.floor(random() * (p.doc.getText('notes').length + 1)), String.fromCharCode(97 + (round % 26)));
      if (round % 10 === 0) await new Promise((res) => setTimeout(res, 10));
    }
    for (const p of peers) p.provider.connect();
    const state = (d: Y.Doc) => JSON.stringify([d.getMap(DESIGN_MAP).toJSON(), d.getText('notes').toString()]);
    await eventually(() => peers.every((p) => p.provider.synced && state(p.doc) === state(peers[0].doc)), 15000, 'convergence');
    const stored = await server.collab.store.loadDoc(designId);
    expect(state(stored)).toBe(state(peers[0].doc));
    expect(peers[0].doc.getText('notes').length).toBeGreaterThan(0);
  });

  it('compacts stored updates without changing the document', async () => {
    const a = open(ownerCookie);
    await a.synced();
    for (let i = 1; i <= 30; i++) setDesignField(a.doc, ['rosette', 'layers', 0, 'lobes'], i);
    await eventually(() => true);
    await new Promise((r) => setTimeout(r, 300));
    const before = await server.collab.store.loadDoc(designId);
    const { before: rows } = await server.collab.store.compact(designId);
    expect(rows).toBeGreaterThan(10);
    expect(await server.collab.store.rowCount(designId)).toBe(1);
    const after = await server.collab.store.loadDoc(designId);
    expect(readDesign(after)).toEqual(readDesign(before));
    expect((await database.db.select().from(designUpdates))[0].merged).toBeGreaterThanOrEqual(rows);
  });
});
