import { and, eq, isNull, or, sql, type SQL } from 'drizzle-orm';
import { comments, entries, notifications, photos, type UserRow } from '../../../../db/schema';
import { isModerator } from './moderation-rules';

/*
 * Where hidden comments and photos must vanish, in one place: the comment thread, the photo
 * lists and files, and the notifications. Hidden entries were already handled by the
 * publishing module (entry-access.ts); these rules follow the same principle: a hidden item is
 * seen by its author and by moderators, and by nobody else.
 */

/** May this viewer see a hidden item by this author? */
export const seesHiddenItem = (authorId: string, viewer?: Pick<UserRow, 'id' | 'role'> | null) => Boolean(viewer && (viewer.id === authorId || isModerator(viewer)));

/** The photos of an entry this viewer may see (undefined: all of them). */
export function photosShownTo(viewer?: Pick<UserRow, 'id' | 'role'> | null): SQL | undefined {
  if (isModerator(viewer)) return undefined;
  return viewer ? or(isNull(photos.hiddenAt), eq(photos.uploaderId, viewer.id)) : isNull(photos.hiddenAt);
}

/** The moderation fields of a comment or photo for a viewer allowed to see it hidden; nothing when it is not hidden. */
export const hiddenFields = (row: { hiddenAt: Date | null; hiddenReason: string | null }) =>
  row.hiddenAt ? { hidden: true, hiddenReason: row.hiddenReason } : {};

/**
 * Notifications a member is shown: none about a comment that is hidden now, and none about an
 * entry hidden from them (today every entry notification goes to the entry's own author, who may
 * see it; this keeps that true for any notification added later). Restoring brings them back.
 */
export const shownNotifications: SQL = and(
  sql`NOT EXISTS (SELECT 1 FROM ${comments} WHERE ${comments.id} = ${notifications.commentId} AND ${comments.hiddenAt} IS NOT NULL)`,
  sql`NOT EXISTS (SELECT 1 FROM ${entries} WHERE ${entries.id} = ${notifications.entryId} AND ${entries.hiddenAt} IS NOT NULL AND ${entries.authorId} <> ${notifications.userId})`,
)!;
