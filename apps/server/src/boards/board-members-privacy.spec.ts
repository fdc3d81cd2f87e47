import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { boardInvitations } from '../../../../db/schema';
import { availableDrivers, type TestDatabase } from '../testing/test-database';
import { Client, makeUser, useTestServer, type TestServer } from '../testing/test-app';

const drivers = await availableDrivers();
const tokenIn = (text: string) => text.match(/token=([A-Za-z0-9_-]+)/)?.[1] ?? '';

describe.each(drivers)('board members and invitations on %s', (driver) => {
  const ctx = useTestServer(driver);
  let database: TestDatabase;
  let server: TestServer;
  let owner: Client;
  let boardId: string;
  beforeAll(() => void ({ database, server } = ctx));
  beforeEach(async () => {
    for (const name of ['owner', 'editor', 'viewer', 'rival']) await makeUser(database, `${name}@example.test`);
    owner = new Client(server.app);
    await owner.signIn('owner@example.test');
    boardId = (await owner.post('/api/boards', { name: 'Winter bars' })).body.id;
  });

  async function join(email: string, role: 'editor' | 'viewer') {
    const since = new Date();
    expect((await owner.post(`/api/boards/${boardId}/invitations`, { email, role })).status).toBe(201);
    const c = new Client(server.app);
    await c.signIn(email);
    expect((await c.post('/api/invitations/accept', { token: tokenIn((await server.smtp.waitFor(email, since)).text) })).status).toBe(200);
    return c;
  }

  it('shows members\' e-mail addresses to the owner only', async () => {
    const editor = await join('editor@example.test', 'editor');
    const viewer = await join('viewer@example.test', 'viewer');
    const seenByOwner = (await owner.get(`/api/boards/${boardId}`)).body.members;
    expect(seenByOwner.map((m: { email: string }) => m.email).sort()).toEqual(['editor@example.test', 'owner@example.test', 'viewer@example.test']);
    for (const member of [editor, viewer]) {
      const seen = (await member.get(`/api/boards/${boardId}`)).body;
      expect(seen.members).toHaveLength(3);
      expect(JSON.stringify(seen)).not.toMatch(/@example\.test/);
    }
  });

  it('withdraws an invitation only through its own board: another board\'s URL answers 404 and changes nothing', async () => {
    const invited = await owner.post(`/api/boards/${boardId}/invitations`, { email: 'viewer@example.test', role: 'viewer' });
    const rival = new Client(server.app);
    await rival.signIn('rival@example.test');
    const rivalBoard = (await rival.post('/api/boards', { name: 'Rival bars' })).body.id;
    const through = await rival.send('delete', `/api/boards/${rivalBoard}/invitations/${invited.body.id}`);
    expect(through.status).toBe(404);
    expect(through.body.error.code).toBe('not_found');
    const [row] = await database.db.select().from(boardInvitations);
    expect(row.revokedAt).toBeNull();
    expect((await owner.send('delete', `/api/boards/${boardId}/invitations/00000000-0000-4000-8000-000000000000`)).status).toBe(404);
    expect((await owner.send('delete', `/api/boards/${boardId}/invitations/${invited.body.id}`)).status).toBe(204);
    expect((await owner.get(`/api/boards/${boardId}`)).body.invitations).toEqual([]);
  });
});
