import { and, count, desc, eq, inArray, isNull } from 'drizzle-orm';
import type { EntryDetail, PersonRef } from '@barwright/contracts';
import { entries, entryRatings, entryRevisions, photos, users, type EntryRow, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { boardRoleOf } from '../boards/board-access';
import { seesHidden } from './entry-access';
import { toEntryCard, toEntryRevision, toRevisionListItem } from './entry-views';

/** Display names by user id. */
export async function people(db: Db, ids: string[]): Promise<Map<string, PersonRef>> {
  const unique = [...new Set(ids)];
  const rows = unique.length ? await db.select({ id: users.id, displayName: users.displayName }).from(users).where(inArray(users.id, unique)) : [];
  return new Map(rows.map((r) => [r.id, r]));
}

async function parentOf(db: Db, entry: EntryRow, viewer?: UserRow): Promise<EntryDetail['parent']> {
  if (!entry.parentRevisionId) return null;
  const [row] = await db
    .select({ entry: entries, number: entryRevisions.number })
    .from(entryRevisions)
    .innerJoin(entries, eq(entries.id, entryRevisions.entryId))
    .where(eq(entryRevisions.id, entry.parentRevisionId));
  if (!row) return null;
  const available = !row.entry.deletedAt && (!row.entry.hiddenAt || seesHidden(row.entry, viewer));
  return { entryId: row.entry.id, revision: row.number, title: available ? row.entry.title : null, available };
}

/** `GET /api/entries/:id`: the latest revision, the history, the rating summary and the counts. */
export async function entryDetail(db: Db, entry: EntryRow, viewer?: UserRow): Promise<EntryDetail> {
  const revisions = await db
    .select({ number: entryRevisions.number, title: entryRevisions.title, createdAt: entryRevisions.createdAt, authorId: entryRevisions.authorId })
    .from(entryRevisions)
    .where(eq(entryRevisions.entryId, entry.id))
    .orderBy(desc(entryRevisions.number));
  const [latest] = await db.select().from(entryRevisions).where(and(eq(entryRevisions.entryId, entry.id), eq(entryRevisions.number, entry.latestRevision)));
  const names = await people(db, [entry.authorId, ...revisions.map((r) => r.authorId)]);
  const [{ n: photoCount }] = await db.select({ n: count() }).from(photos).where(and(eq(photos.entryId, entry.id), isNull(photos.hiddenAt))); // hidden ones do not count
  const [mine] = viewer
    ? await db.select({ stars: entryRatings.stars }).from(entryRatings).where(and(eq(entryRatings.entryId, entry.id), eq(entryRatings.userId, viewer.id)))
    : [];
  const member = viewer && entry.boardId && entry.designId ? await boardRoleOf(db, entry.boardId, viewer.id) : undefined;
  const isAuthor = viewer?.id === entry.authorId;
  const hiddenShown = Boolean(entry.hiddenAt);
  return {
    ...toEntryCard(entry, names.get(entry.authorId)!),
    latest: toEntryRevision(latest, names.get(latest.authorId)!),
    revisions: revisions.map((r) => toRevisionListItem(r, names.get(r.authorId)!)),
    photoCount,
    parent: await parentOf(db, entry, viewer),
    rootEntryId: entry.rootEntryId,
    hidden: hiddenShown,
    hiddenReason: hiddenShown ? entry.hiddenReason : null,
    source: member && entry.boardId && entry.designId ? { boardId: entry.boardId, designId: entry.designId } : null,
    viewer: {
      signedIn: Boolean(viewer),
      isAuthor,
      canRate: Boolean(viewer) && !isAuthor && !entry.hiddenAt,
      myStars: mine?.stars ?? null,
      canDelete: isAuthor,
    },
  };
}

