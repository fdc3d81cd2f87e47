import { expect } from 'vitest';
import { Client, makeUser, type TestServer } from '../testing/test-app';
import type { TestDatabase } from '../testing/test-database';

const tokenIn = (text: string) => text.match(/token=([A-Za-z0-9_-]+)/)?.[1] ?? '';
export const inAWeek = () => new Date(Date.now() + 7 * 86_400_000).toISOString();

/** A board owned by `owner@…` with an editor, a viewer (both invited by e-mail and accepted) and four designs. */
export async function boardWithMembers(database: TestDatabase, server: TestServer) {
  const ids: Record<string, string> = {};
  for (const name of ['owner', 'editor', 'viewer', 'outsider']) ids[name] = (await makeUser(database, `${name}@example.test`)).id;
  const clients: Record<string, Client> = {};
  for (const name of ['owner', 'editor', 'viewer', 'outsider']) {
    clients[name] = new Client(server.app);
    await clients[name].signIn(`${name}@example.test`);
  }
  const boardId = (await clients.owner.post('/api/boards', { name: 'Winter bars' })).body.id as string;
  for (const [name, role] of [['editor', 'editor'], ['viewer', 'viewer']] as const) {
    const since = new Date();
    expect((await clients.owner.post(`/api/boards/${boardId}/invitations`, { email: `${name}@example.test`, role })).status).toBe(201);
    const mail = await server.smtp.waitFor(`${name}@example.test`, since);
    expect((await clients[name].post('/api/invitations/accept', { token: tokenIn(mail.text) })).status).toBe(200);
  }
  const designIds: string[] = [];
  for (const title of ['Sine 24', 'Barleycorn', 'Basket weave', 'Moiré']) designIds.push((await clients.owner.post(`/api/boards/${boardId}/designs`, { title })).body.id);
  return { ids, clients, boardId, designIds };
}
