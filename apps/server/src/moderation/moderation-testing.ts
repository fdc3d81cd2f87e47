import type { ReportReason, ReportTargetKind } from '@barwright/contracts';
import { Client, makeUser, type TestServer } from '../testing/test-app';
import type { TestDatabase } from '../testing/test-database';
import { member, upload, type Member } from '../community/community-testing';
import { smallPng } from '../shop-log/test-images';

export type Role = 'member' | 'moderator' | 'admin';

/** A signed-in account of the given role, with a board of its own (a member of the club like any other). */
export async function person(database: TestDatabase, server: TestServer, name: string, role: Role = 'member'): Promise<Member> {
  if (role === 'member') return member(database, server, name);
  const email = `${name}@example.test`;
  const user = await makeUser(database, email, role);
  const client = new Client(server.app);
  await client.signIn(email);
  const board = await client.post('/api/boards', { name: `${name}'s bars` });
  return { client, id: user.id, email, boardId: board.body.id };
}

/** Posts a comment on an entry; returns its id. */
export async function commentOn(m: Member, entryId: string, body: string): Promise<string> {
  const res = await m.client.post(`/api/entries/${entryId}/comments`, { body });
  if (res.status !== 201) throw new Error(`comment: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id;
}

/** Uploads a small photo to an entry's shop log (the server needs an uploads directory); returns its id. */
export async function photoOn(m: Member, entryId: string, caption = 'Trial in acrylic'): Promise<string> {
  const res = await upload(m.client, `/api/entries/${entryId}/photos`, { data: await smallPng(), name: 'cut.png' }, { kind: 'trial', caption, material: 'acrylic', date: '2026-03-14' });
  if (res.status !== 201) throw new Error(`photo: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id;
}

/** Files a report; returns the response (201 on success). */
export function report(m: { client: Client }, kind: ReportTargetKind, id: string, reason: ReportReason = 'spam', details = '') {
  return m.client.post('/api/reports', { target: { kind, id }, reason, details });
}

/** The desk's path of an item. */
export const itemPath = (kind: ReportTargetKind, id: string) => `/api/moderation/items/${kind}/${id}`;
