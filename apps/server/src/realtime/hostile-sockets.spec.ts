import WebSocket from 'ws';
import * as Y from 'yjs';
import * as encoding from 'lib0/encoding';
import * as syncProtocol from 'y-protocols/sync';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { CLOSE_CODES } from '@barwright/contracts';
import { readDesign, setDesignField } from '@barwright/contracts/design-doc';
import { boardMembers, designUpdates, designVersions } from '../../../../db/schema';
import { openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, sidOf } from '../testing/test-app';
import { collabClient, eventually } from '../testing/collab-client';
import { closeOf, rawCollabSocket, startRealtimeTestServer } from '../testing/realtime-test-server';
import { DEFAULT_REALTIME_LIMITS } from './realtime-limits';

/** A y-websocket sync-update message carrying `update`. */
const updateMessage = (update: Uint8Array) => {
  const e = encoding.createEncoder();
  encoding.writeVarUint(e, 0);
  syncProtocol.writeUpdate(e, update);
  return encoding.toUint8Array(e);
};
/** A y-websocket sync step 2 (the answer to a step 1) carrying `update`. */
const answerMessage = (update: Uint8Array) => {
  const e = encoding.createEncoder();
  encoding.writeVarUint(e, 0);
  encoding.writeVarUint(e, 1); // y-protocols' messageYjsSyncStep2
  encoding.writeVarUint8Array(e, update);
  return encoding.toUint8Array(e);
};
/** 9 bytes: a sync-update message whose 6-byte update does not decode (Yjs: "Unexpected end of array"). */
const POISON = new Uint8Array([0, 2, 6, 1, 1, 1, 1, 9, 9]);
const wait = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('hostile collab sockets', () => {
  let database: TestDatabase;
  let server: Awaited<ReturnType<typeof startRealtimeTestServer>>;
  let owner: Client;
  let cookie: string;
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
    await makeUser(database, 'owner@example.test');
    owner = new Client(server.app);
    cookie = sidOf(await owner.signIn('owner@example.test'))!;
    const boardId = (await owner.post('/api/boards', { name: 'Hostile' })).body.id;
    designId = (await owner.post(`/api/boards/${boardId}/designs`, { title: 'Target' })).body.id;
  });
  afterEach(async () => {
    for (const c of cleanup.splice(0)) c();
    await wait(100); // let the last socket's close unload the document
  });

  const open = async () => {
    const ws = await rawCollabSocket(server.baseUrl, designId, { cookie });
    if (typeof ws === 'number') throw new Error(`upgrade refused with ${ws}`);
    cleanup.push(() => ws.terminate());
    return ws;
  };
  const client = () => {
    const c = collabClient(server.baseUrl, designId, cookie);
    cleanup.push(c.destroy);
    return c;
  };
  const lobes = (doc: Y.Doc) => (readDesign(doc) as any).rosette?.layers?.[0]?.lobes;
  const healthy = async () => (await request(server.app).get('/api/health')).status === 200;

  it('refuses an update that does not decode with 4400, stores nothing, and the design reopens', async () => {
    const ws = await open();
    const rows = await server.collab.store.rowCount(designId);
    const closed = closeOf(ws);
    ws.send(POISON);
    expect((await closed).code).toBe(CLOSE_CODES.invalidUpdate);
    expect(await server.collab.store.rowCount(designId)).toBe(rows);
    expect(await healthy()).toBe(true);
    await wait(200); // the document unloads; reopening loads it from storage again
    const again = client();
    await again.synced();
    await eventually(() => lobes(again.doc) === 24, 5000, 'the design after the poison');
  });

  it('loads a design holding a corrupt stored row: the row is skipped and reported', async () => {
    await database.db.insert(designUpdates).values({ designId, update: new Uint8Array([1, 1, 1, 1, 9, 9]) });
    const c = client();
    await c.synced();
    await eventually(() => lobes(c.doc) === 24, 5000, 'the design over the socket');
    expect((await owner.get(`/api/designs/${designId}`)).status).toBe(200);
    setDesignField(c.doc, ['rosette', 'layers', 0, 'lobes'], 30);
    await eventually(() => true);
    await wait(200);
    c.destroy();
    await wait(200);
    expect((await server.collab.store.compact(designId)).after).toBe(2); // the merge plus the corrupt row, kept for inspection
    expect(lobes(await server.collab.store.loadDoc(designId))).toBe(30);
  });

  it('refuses an update that nests the design thousands deep, and keeps an invalid value typed in a field', async () => {
    const c = client();
    await c.synced();
    setDesignField(c.doc, ['rosette', 'layers', 0, 'lobes'], -3); // invalid but readable: flagged by the editor, kept
    await wait(300);
    expect(lobes(await server.collab.store.loadDoc(designId))).toBe(-3);
    expect((await owner.get(`/api/designs/${designId}`)).status).toBe(422);

    const ws = await open();
    const closed = closeOf(ws);
    const attacker = new Y.Doc();
    Y.applyUpdate(attacker, Y.encodeStateAsUpdate(c.doc));
    attacker.transact(() => {
      let node = attacker.getMap('design');
      for (let i = 0; i < 2000; i++) {
        const child = new Y.Map<unknown>();
        node.set(i === 0 ? 'deep' : 'k', child);
        node = child;
      }
    });
    ws.send(updateMessage(Y.encodeStateAsUpdate(attacker, Y.encodeStateVector(c.doc))));
    expect((await closed).code).toBe(CLOSE_CODES.invalidUpdate);
    expect(readDesign(await server.collab.store.loadDoc(designId))).not.toHaveProperty('deep');
  });

  it('closes a socket that sends a frame over maxPayload (1009) and the server answers meanwhile', async () => {
    const ws = await open();
    const closed = closeOf(ws);
    const big = new Uint8Array(DEFAULT_REALTIME_LIMITS.maxFrameBytes + 1);
    big[0] = 1; // an awareness message
    ws.send(big);
    expect((await closed).code).toBe(CLOSE_CODES.messageTooBig);
    expect(await healthy()).toBe(true);
  });

  it('limits a burst of 5 000 small updates: the socket is closed and at most the burst is stored', async () => {
    const ws = await open();
    const closed = closeOf(ws);
    const doc = new Y.Doc();
    const messages: Uint8Array[] = [];
    doc.on('update', (u: Uint8Array) => messages.push(updateMessage(u)));
    for (let i = 0; i < 5000; i++) doc.getText('notes').insert(0, 'x');
    for (const m of messages) ws.send(m);
    expect((await closed).code).toBe(CLOSE_CODES.rateLimited);
    const stored = await server.collab.store.rowCount(designId);
    // The burst, plus what the bucket refilled while they were stored (a fraction of a second).
    expect(stored).toBeLessThan(DEFAULT_REALTIME_LIMITS.updates.burst + DEFAULT_REALTIME_LIMITS.updates.perSecond * 3);
    expect(await healthy()).toBe(true);
  });

  it('shares the update allowance among all the sockets of one account, so opening more sockets buys no more', async () => {
    const sockets = await Promise.all([open(), open(), open(), open()]);
    const closes = sockets.map((ws) => closeOf(ws).then((c) => c.code));
    const perSocket = Math.ceil((DEFAULT_REALTIME_LIMITS.updates.burst * 1.5) / sockets.length); // each under the burst alone
    for (const ws of sockets) {
      const doc = new Y.Doc();
      doc.on('update', (u: Uint8Array) => ws.readyState === WebSocket.OPEN && ws.send(updateMessage(u)));
      for (let i = 0; i < perSocket; i++) doc.getText('notes').insert(0, 'y');
    }
    expect(await Promise.race([...closes, wait(3000).then(() => 0)])).toBe(CLOSE_CODES.rateLimited);
    expect(await server.collab.store.rowCount(designId)).toBeLessThan(DEFAULT_REALTIME_LIMITS.updates.burst + DEFAULT_REALTIME_LIMITS.updates.perSecond * 3);
  });

  it('refuses updates that would make the document too big to open: a new top-level type, a design or notes over the limit', async () => {
    const send = async (change: (doc: Y.Doc) => void) => {
      const ws = await open();
      const closed = closeOf(ws);
      const doc = new Y.Doc();
      const updates: Uint8Array[] = [];
      doc.on('update', (u: Uint8Array) => updates.push(u));
      change(doc);
      ws.send(updateMessage(Y.mergeUpdates(updates)));
      return Promise.race([closed.then((c) => c.code), wait(1500).then(() => 0)]);
    };
    const rows = await server.collab.store.rowCount(designId);
    expect(await send((doc) => doc.getMap('junk').set('s', 'a'.repeat(1000)))).toBe(CLOSE_CODES.invalidUpdate);
    const big = 'a'.repeat(DEFAULT_REALTIME_LIMITS.maxDesignJsonBytes);
    expect(await send((doc) => doc.getMap('design').set('padding', big))).toBe(CLOSE_CODES.invalidUpdate);
    expect(await send((doc) => doc.getText('notes').insert(0, 'n'.repeat(DEFAULT_REALTIME_LIMITS.maxNotesChars + 1)))).toBe(CLOSE_CODES.invalidUpdate);
    // The refused edit's successor from the same client waits for it forever: never stored as pending
    // bytes. Sent as an edit, the server asks the client for what it builds on (a step 1: an honest client
    // that typed on reconnecting answers with its offline edits); an answer still without it is final.
    const refusedFirst = new Y.Doc();
    refusedFirst.getMap('design').set('padding', big);
    const successor = (() => {
      const updates: Uint8Array[] = [];
      refusedFirst.on('update', (u: Uint8Array) => updates.push(u));
      refusedFirst.getMap('design').set('padding', 'small again');
      return updates[0];
    })();
    const ws = await open();
    const closed = closeOf(ws);
    const stepOnes = () => received.filter((m) => m[0] === 0 && m[1] === 0).length;
    const received: Uint8Array[] = [];
    ws.on('message', (data: Buffer) => received.push(new Uint8Array(data)));
    await wait(300); // the server's own step 1 on connecting
    const before = stepOnes();
    ws.send(updateMessage(successor));
    ws.send(updateMessage(successor)); // asked once, not once per edit
    await wait(300);
    expect(stepOnes()).toBe(before + 1);
    expect(ws.readyState).toBe(WebSocket.OPEN);
    ws.send(answerMessage(successor));
    expect(await Promise.race([closed.then((c) => c.code), wait(1500).then(() => 0)])).toBe(CLOSE_CODES.invalidUpdate);
    expect(await server.collab.store.rowCount(designId)).toBe(rows);
    // A design under the limits is still accepted.
    expect(await send((doc) => doc.getText('notes').insert(0, 'a fair note'))).toBe(0);
    expect(await server.collab.store.rowCount(designId)).toBe(rows + 1); // send() waited 1.5 s with the socket open
  });

  it('asks a socket for missing edits a few times at most, then closes it as rate-limited (each ask rebuilt the check)', async () => {
    const lost = new Y.Doc();
    lost.getText('notes').insert(0, 'never sent');
    const builtOnIt: Uint8Array[] = [];
    lost.on('update', (u: Uint8Array) => builtOnIt.push(u));
    lost.getText('notes').insert(0, 'sent; ');
    const ws = await open();
    const closed = closeOf(ws);
    const empty = answerMessage(Y.encodeStateAsUpdate(new Y.Doc())); // an answer with nothing in it
    for (let i = 0; i < 4; i++) {
      ws.send(updateMessage(builtOnIt[0]));
      ws.send(empty);
    }
    await wait(300);
    expect(ws.readyState).toBe(WebSocket.OPEN); // four asks: what an honest client could need
    ws.send(updateMessage(builtOnIt[0]));
    expect(await Promise.race([closed.then((c) => c.code), wait(1500).then(() => 0)])).toBe(CLOSE_CODES.rateLimited);
  });

  it('refuses one socket more than a session may open (4429)', async () => {
    const sockets = [];
    for (let i = 0; i < DEFAULT_REALTIME_LIMITS.socketsPerSession; i++) sockets.push(await open());
    const extra = await open();
    expect((await closeOf(extra)).code).toBe(CLOSE_CODES.tooManySockets);
    sockets[0].close();
    await wait(100);
    const after = await open(); // a freed place can be taken again
    await wait(100);
    expect(after.readyState).toBe(WebSocket.OPEN);
  });

  it('hands out a live document only once it has loaded: a version saved meanwhile is complete', async () => {
    const store = server.collab.store;
    const load = store.loadUpdate.bind(store);
    let release!: () => void;
    const gate = new Promise<void>((r) => (release = r));
    store.loadUpdate = async (id: string) => {
      await gate;
      return load(id);
    };
    try {
      const c = client();
      await eventually(() => c.provider.wsconnected, 5000, 'the socket to open');
      const saving = owner.post(`/api/designs/${designId}/versions`, { name: 'During load' });
      const copying = owner.post(`/api/designs/${designId}/duplicate`);
      await wait(300);
      release();
      const [saved, copied] = await Promise.all([saving, copying]);
      expect(saved.status).toBe(201);
      const [version] = await database.db.select().from(designVersions);
      const doc = new Y.Doc();
      Y.applyUpdate(doc, version.state);
      expect(lobes(doc)).toBe(24);
      expect((await owner.get(`/api/designs/${copied.body.id}`)).body.rosette.layers[0].lobes).toBe(24);
    } finally {
      store.loadUpdate = load;
      release();
    }
  });

  it('stamps presence with the account\'s name and lets no socket speak for another\'s client id', async () => {
    const mallory = await makeUser(database, 'mallory@example.test');
    await database.db.insert(boardMembers).values({ boardId: (await owner.get(`/api/designs/${designId}/meta`)).body.boardId, userId: mallory.id, role: 'viewer' });
    const viewerCookie = sidOf(await new Client(server.app).signIn('mallory@example.test'))!;
    const watcher = client();
    const viewer = collabClient(server.baseUrl, designId, viewerCookie);
    cleanup.push(viewer.destroy);
    await Promise.all([watcher.synced(), viewer.synced()]);
    watcher.provider.awareness.setLocalState({ user: { id: 'o', name: 'Owner', colour: '#1f78b4' }, field: null, pointer: null });
    viewer.provider.awareness.setLocalState({ user: { id: 'someone', name: 'The Club Admin', colour: '#c2185b' }, field: null, pointer: null });
    const seen = () => watcher.provider.awareness.getStates().get(viewer.doc.clientID) as { user: { id: string; name: string } } | undefined;
    await eventually(() => seen() !== undefined, 5000, 'the viewer\'s presence');
    expect(seen()!.user).toMatchObject({ id: mallory.id, name: 'mallory' });

    // The viewer re-announces the watcher's client id with a name of its choosing: left out.
    const forged = new Uint8Array([...encodingOf(watcher.doc.clientID, 99, { user: { id: 'o', name: 'Forged', colour: '#000' } })]);
    (viewer.provider.ws as unknown as WebSocket).send(forged);
    await wait(300);
    const own = viewer.provider.awareness.getStates().get(watcher.doc.clientID) as { user: { name: string } };
    expect(own.user.name).not.toBe('Forged');
  });
});

/** An awareness message (type 1) with one client's state. */
function encodingOf(clientId: number, clock: number, state: unknown): Uint8Array {
  const inner = encoding.createEncoder();
  encoding.writeVarUint(inner, 1);
  encoding.writeVarUint(inner, clientId);
  encoding.writeVarUint(inner, clock);
  encoding.writeVarString(inner, JSON.stringify(state));
  const outer = encoding.createEncoder();
  encoding.writeVarUint(outer, 1);
  encoding.writeVarUint8Array(outer, encoding.toUint8Array(inner));
  return encoding.toUint8Array(outer);
}
