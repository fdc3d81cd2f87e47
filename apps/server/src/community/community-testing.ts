import * as Y from 'yjs';
import { CookieAccessInfo } from 'cookiejar';
import type { Design } from '@barwright/contracts';
import { readDesign, writeDesign } from '@barwright/contracts/design-doc';
import type { TestDatabase } from '../testing/test-database';
import { Client, makeUser, type TestServer } from '../testing/test-app';
import { DesignDocStore } from '../realtime/design-doc-store';
import { applyServerUpdate } from '../realtime/live-docs';

/** Changes a stored design as an editor in the studio would (a new Yjs update). For tests. */
export async function editDesign(database: TestDatabase, designId: string, change: (d: Design) => void): Promise<void> {
  const store = new DesignDocStore(database.db);
  const doc = await store.loadDoc(designId);
  const before = Y.encodeStateVector(doc);
  const design = structuredClone(readDesign(doc)) as unknown as Design;
  change(design);
  writeDesign(doc, design);
  await applyServerUpdate(store, designId, Y.encodeStateAsUpdate(doc, before));
}

export interface Member {
  client: Client;
  id: string;
  email: string;
  boardId: string;
}

/** A signed-in member with a board of their own. */
export async function member(database: TestDatabase, server: TestServer, name: string): Promise<Member> {
  const email = `${name}@example.test`;
  const user = await makeUser(database, email);
  const client = new Client(server.app);
  await client.signIn(email);
  const board = await client.post('/api/boards', { name: `${name}'s bars` });
  return { client, id: user.id, email, boardId: board.body.id };
}

/** A new design on the member's board (from a preset) and its entry, published once. */
export async function publishedBar(m: Member, title: string, options: { preset?: string; tags?: string[]; description?: string } = {}) {
  const design = await m.client.post(`/api/boards/${m.boardId}/designs`, { title, preset: options.preset ?? 'example' });
  if (design.status !== 201) throw new Error(`design: ${design.status} ${JSON.stringify(design.body)}`);
  const res = await m.client.post(`/api/designs/${design.body.id}/publish`, { title, description: options.description ?? '', tags: options.tags ?? [] });
  if (res.status !== 201) throw new Error(`publish: ${res.status} ${JSON.stringify(res.body)}`);
  return { designId: design.body.id as string, entryId: res.body.entryId as string };
}

/** The XSRF token the client's cookie jar holds (what a browser's page would echo in X-XSRF-TOKEN). */
export async function xsrfOf(client: Client): Promise<string> {
  const access = new CookieAccessInfo('127.0.0.1', '/', false, true);
  let cookie = client.agent.jar.getCookie('XSRF-TOKEN', access);
  if (!cookie) {
    await client.get('/api/auth/me');
    cookie = client.agent.jar.getCookie('XSRF-TOKEN', access);
  }
  return decodeURIComponent(cookie?.value ?? '');
}

/** A multipart upload the way a browser form sends it. */
export async function upload(client: Client, path: string, file: { field?: string; data: Buffer; name: string } | undefined, fields: Record<string, string>) {
  const token = await xsrfOf(client); // first: the agent attaches its cookies when the request is made
  let req = client.agent.post(path).set('X-XSRF-TOKEN', token);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  if (file) req = req.attach(file.field ?? 'photo', file.data, file.name);
  return req;
}

/** The session cookie (`barwright.sid=…`) the client holds, to open a socket as that member. */
export function sessionCookieOf(client: Client): string {
  const cookie = client.agent.jar.getCookie('barwright.sid', new CookieAccessInfo('127.0.0.1', '/', false, false)); // http-only: not a script's access
  if (!cookie) throw new Error('the client has no session cookie');
  return `barwright.sid=${cookie.value}`;
}
