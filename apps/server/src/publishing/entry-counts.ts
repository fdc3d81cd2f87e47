import { and, count, eq, isNull } from 'drizzle-orm';
import { comments, entries } from '../../../../db/schema';
import type { Db } from '../database/database';

/**
 * The counters Explore sorts on, recounted from their rows (never incremented blindly, so they
 * cannot drift). Call after anything that adds, removes, hides or shows a remix or a comment.
 */
export async function refreshRemixCount(db: Db, entryId: string | null): Promise<void> {
  if (!entryId) return;
  const [{ n }] = await db
    .select({ n: count() })
    .from(entries)
    .where(and(eq(entries.parentEntryId, entryId), isNull(entries.deletedAt), isNull(entries.hiddenAt)));
  await db.update(entries).set({ remixCount: n }).where(eq(entries.id, entryId));
}

export async function refreshCommentCount(db: Db, entryId: string): Promise<number> {
  // Comments hidden by moderation do not count (moderation/item-hiding.ts recounts on hide and restore).
  const [{ n }] = await db.select({ n: count() }).from(comments).where(and(eq(comments.entryId, entryId), isNull(comments.deletedAt), isNull(comments.hiddenAt)));
  await db.update(entries).set({ commentCount: n }).where(eq(entries.id, entryId));
  return n;
}
