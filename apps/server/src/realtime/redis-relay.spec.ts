import * as Y from 'yjs';
import * as awarenessProtocol from 'y-protocols/awareness';
import { WSSharedDoc } from '@y/websocket-server/utils';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createBoard } from '../boards/boards-service';
import { createDesign } from '../designs/designs-service';
import { openRedis, type RedisConnection } from '../cluster/redis-connection';
import { designUpdates } from '../../../../db/schema';
import { makeUser } from '../testing/test-app';
import { eventually } from '../testing/collab-client';
import { openTestDatabase, type TestDatabase } from '../testing/test-database';
import { redisAnswers, TEST_REDIS_URL } from '../testing/test-redis';
import { DesignDocStore } from './design-doc-store';
import { RedisRelay } from './redis-relay';

const redisUp = await redisAnswers();
if (!redisUp) console.warn(`relay tests skipped: no Redis at ${TEST_REDIS_URL}`);

/** Two instances' relays in one process, on one database and one Redis, each holding the design open. */
describe.skipIf(!redisUp)('the co-editing relay between instances', () => {
  let database: TestDatabase;
  const redis: RedisConnection[] = [];
  const names = [`relay-spec-a-${process.pid}`, `relay-spec-b-${process.pid}`];
  let designId: string;
  let instances: { store: DesignDocStore; relay: RedisRelay; doc: WSSharedDoc }[];
  const quiet = () => {};

  beforeAll(async () => {
    database = await openTestDatabase('pglite');
    const owner = await makeUser(database, 'relay@example.test');
    const board = await createBoard(database.db, owner, 'Relay');
    designId = (await createDesign(database.db, { boardId: board.id, title: 'Relayed', createdBy: owner.id })).id;
    instances = [];
    for (const name of names) {
      const connection = await openRedis(TEST_REDIS_URL, quiet, { prefix: `relay-spec-${process.pid}`, name });
      redis.push(connection);
      let relay: RedisRelay | undefined;
      const store = new DesignDocStore(database.db, quiet, (id, seq, update) => relay?.published(id, seq, update));
      relay = new RedisRelay(connection, store, quiet);
      const doc = new WSSharedDoc(designId);
      doc.whenInitialized = (async () => {
        await relay.follow(designId, doc);
        const { update, lastSeq } = await store.loadAfter(designId, 0);
        Y.applyUpdate(doc, update, 'storage');
        relay.loaded(designId, doc, lastSeq);
      })();
      await doc.whenInitialized;
      instances.push({ store, relay, doc });
    }
  });
  afterAll(async () => {
    for (const i of instances ?? []) await i.relay.close();
    for (const r of redis) await r.close();
    await database?.close();
  });

  const notes = (doc: Y.Doc) => doc.getText('notes').toString();
  const edit = (text: string) => {
    const doc = new Y.Doc();
    Y.applyUpdate(doc, Y.encodeStateAsUpdate(instances[0].doc));
    let update: Uint8Array | undefined;
    doc.on('update', (u: Uint8Array) => (update = u));
    doc.getText('notes').insert(0, text);
    return update!;
  };

  it('applies an update stored on one instance to the other\'s live document, without storing it again', async () => {
    const [a, b] = instances;
    const rows = await a.store.rowCount(designId);
    await a.store.append(designId, edit('hello '));
    await eventually(() => notes(b.doc) === 'hello ', 3000, 'the update on B');
    expect(await a.store.rowCount(designId)).toBe(rows + 1);
  });

  it('carries presence across, and its removal', async () => {
    const [a, b] = instances;
    const client = new awarenessProtocol.Awareness(new Y.Doc());
    client.setLocalState({ user: { id: 'u1', name: 'Ada' } });
    awarenessProtocol.applyAwarenessUpdate(a.doc.awareness, awarenessProtocol.encodeAwarenessUpdate(client, [client.clientID]), 'a socket');
    await eventually(() => b.doc.awareness.getStates().has(client.clientID), 3000, 'the presence on B');
    awarenessProtocol.removeAwarenessStates(a.doc.awareness, [client.clientID], null);
    await eventually(() => !b.doc.awareness.getStates().has(client.clientID), 3000, 'the removal on B');
    client.destroy();
  });

  it('after its Redis connection drops, catches up from the database with what it missed', async () => {
    const [a, b] = instances;
    // Stored on A while B's subscriber is cut off: its message never reaches B.
    await database.db.insert(designUpdates).values({ designId, update: edit('missed ') });
    const list = String(await redis[0].client.sendCommand(['CLIENT', 'LIST']));
    const line = list.split('\n').find((l) => l.includes(`name=${names[1]}-subscriber`));
    expect(line).toBeDefined();
    await redis[0].client.sendCommand(['CLIENT', 'KILL', 'ID', line!.match(/id=(\d+)/)![1]]);
    await eventually(() => notes(b.doc).includes('missed '), 5000, 'the catch-up on B');
    // And the relay works again afterwards.
    await a.store.append(designId, edit('again '));
    await eventually(() => notes(b.doc).includes('again '), 3000, 'a later update on B');
  });
});
