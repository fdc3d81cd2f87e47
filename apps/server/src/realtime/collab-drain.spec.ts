import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CLOSE_CODES } from '@barwright/contracts';
import { openTestDatabase, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, sidOf } from '../testing/test-app';
import { collabClient } from '../testing/collab-client';
import { startRealtimeTestServer } from '../testing/realtime-test-server';

/**
 * Shutdown (main.ts on SIGTERM): sockets close with 1001 going away. What the server had taken is
 * stored; what was still on the wire is refused with the closed socket, and the client, which keeps
 * its edits and reconnects from 1001, sends it again on its next sync, to another instance or this one.
 */
describe('collaboration gateway: draining', () => {
  let database: TestDatabase;
  let server: Awaited<ReturnType<typeof startRealtimeTestServer>>;

  beforeAll(async () => {
    database = await openTestDatabase('pglite');
    server = await startRealtimeTestServer(database);
  });
  afterAll(async () => {
    await server.close();
    await database.close();
  });

  it('closes with going away; the client comes back and nothing of a burst in flight is lost', async () => {
    await makeUser(database, 'owner@example.test');
    const owner = new Client(server.app);
    const cookie = sidOf(await owner.signIn('owner@example.test'))!;
    const boardId = (await owner.post('/api/boards', { name: 'Drain' })).body.id;
    const designId = (await owner.post(`/api/boards/${boardId}/designs`, { title: 'Drained' })).body.id;
    const client = collabClient(server.baseUrl, designId, cookie);
    await client.synced();
    const closed = client.closed();
    const notes = client.doc.getText('notes');
    for (let i = 0; i < 200; i++) notes.insert(notes.length, `${i} `); // 200 updates on the wire as the drain begins

    await server.collab.drain(CLOSE_CODES.goingAway, 'server going away');
    expect(await closed).toEqual({ code: CLOSE_CODES.goingAway, reason: 'server going away' });
    expect(client.provider.shouldConnect).toBe(true); // not final for y-websocket (44xx would be)
    await client.synced(); // reconnected: the sync sends the server what it lacks
    let stored = '';
    for (let tries = 0; tries < 50 && stored !== notes.toString(); tries++) {
      if (tries) await new Promise((r) => setTimeout(r, 100));
      stored = (await server.collab.store.loadDoc(designId)).getText('notes').toString();
    }
    expect(stored).toBe(notes.toString());
    client.destroy();
  });
});
