import { eq } from 'drizzle-orm';
import { comments, entries, photos } from '../../../../db/schema';
import type { Db } from '../database/database';
import { refreshCommentCount, refreshRemixCount } from '../publishing/entry-counts';
import type { TargetFacts } from './moderation-targets';

/** The hidden state to set: when and why, or null to show the item again. */
export type Hiding = { at: Date; reason: string } | null;

/**
 * Hides or shows one item (never deletes it), then recounts what Explore sorts on, so a hidden
 * remix or comment stops counting and counts again on restore: everything comes back as it was.
 */
export async function setHidden(db: Db, target: TargetFacts, hiding: Hiding): Promise<void> {
  const values = { hiddenAt: hiding?.at ?? null, hiddenReason: hiding?.reason ?? null };
  switch (target.kind) {
    case 'entry':
      await db.update(entries).set(values).where(eq(entries.id, target.id));
      await refreshRemixCount(db, target.parentEntryId);
      return;
    case 'comment':
      await db.update(comments).set(values).where(eq(comments.id, target.id));
      await refreshCommentCount(db, target.entryId);
      return;
    case 'photo':
      await db.update(photos).set(values).where(eq(photos.id, target.id));
      return;
  }
}
