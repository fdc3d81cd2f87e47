import type { UserRow } from '../../../../db/schema';
import { forbidden } from '../http/http-error';

/** Moderators and admins: who reaches the desk, the showcase curation and the audit log. */
export const isModerator = (user?: Pick<UserRow, 'role'> | null) => user?.role === 'moderator' || user?.role === 'admin';

type Author = Pick<UserRow, 'id' | 'role' | 'suspendedAt'>;

/**
 * Why the viewer may not decide on an item by this author, or null when they may: nobody judges
 * their own content, and a moderator does not judge an admin's.
 */
export function refusalFor(viewer: Pick<UserRow, 'id' | 'role'>, author: Author | undefined): string | null {
  if (!author) return null;
  if (author.id === viewer.id) return 'This is your own content: another moderator must decide on it.';
  if (author.role === 'admin' && viewer.role !== 'admin') return 'Moderators do not act on an admin’s content; ask an admin.';
  return null;
}

/** What the desk offers the viewer on an item: the moderation actions, and (admins) suspending its author. */
export function canActOn(viewer: Pick<UserRow, 'id' | 'role'>, author: Author | undefined) {
  const why = refusalFor(viewer, author);
  const suspend = !why && viewer.role === 'admin' && Boolean(author) && !author!.suspendedAt;
  return { act: why === null, suspend, why };
}

/** 403 with the reason when the viewer may not decide on this author's item. */
export function requireMayAct(viewer: Pick<UserRow, 'id' | 'role'>, author: Author | undefined): void {
  const why = refusalFor(viewer, author);
  if (why) throw forbidden(why);
}
