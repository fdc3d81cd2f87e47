import type { Request } from 'express';
import { and, eq, isNull } from 'drizzle-orm';
import { entries, entryRevisions, type EntryRevisionRow, type EntryRow, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { HttpError, notFound } from '../http/http-error';
import { isUuid } from '../http/uuid';

/** The signed-in user, if any (entries are readable signed out). */
export const viewerOf = (req: Request): UserRow | undefined => req.user ?? undefined;

/** Who may see a hidden entry: its author and the moderators. */
export const seesHidden = (entry: Pick<EntryRow, 'authorId'>, viewer?: UserRow) =>
  Boolean(viewer && (viewer.id === entry.authorId || viewer.role === 'moderator' || viewer.role === 'admin'));

export async function findLiveEntry(db: Db, id: string): Promise<EntryRow | undefined> {
  if (!isUuid(id)) return undefined;
  const [row] = await db.select().from(entries).where(and(eq(entries.id, id), isNull(entries.deletedAt)));
  return row;
}

/** The entry as the viewer may see it: 404 when missing, deleted, or hidden from them. */
export async function requireVisibleEntry(db: Db, id: string, viewer?: UserRow): Promise<EntryRow> {
  const entry = await findLiveEntry(db, id);
  if (!entry || (entry.hiddenAt && !seesHidden(entry, viewer))) throw notFound('entry');
  return entry;
}

/** A visible entry that is not hidden: the ones others may rate, comment on, remix. */
export async function requireOpenEntry(db: Db, id: string, viewer: UserRow | undefined, action: string): Promise<EntryRow> {
  const entry = await requireVisibleEntry(db, id, viewer);
  if (entry.hiddenAt) throw new HttpError(409, 'entry_hidden', `This entry is hidden by the moderators and cannot be ${action}.`);
  return entry;
}

export async function findRevision(db: Db, entryId: string, number: number): Promise<EntryRevisionRow | undefined> {
  if (!Number.isInteger(number) || number < 1) return undefined;
  const [row] = await db.select().from(entryRevisions).where(and(eq(entryRevisions.entryId, entryId), eq(entryRevisions.number, number)));
  return row;
}

/** A revision number from a route parameter, or 404. */
export async function requireRevision(db: Db, entry: EntryRow, param: string | undefined): Promise<EntryRevisionRow> {
  const number = param === undefined ? entry.latestRevision : /^\d{1,9}$/.test(param) ? Number(param) : NaN;
  const row = await findRevision(db, entry.id, number);
  if (!row) throw notFound('revision');
  return row;
}
