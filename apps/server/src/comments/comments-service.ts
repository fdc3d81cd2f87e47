import { and, asc, count, eq, gt, isNull } from 'drizzle-orm';
import { COMMENT_EDIT_WINDOW_MS, type CommentNode, type CommentThread } from '@barwright/contracts';
import { comments, entries, users, type CommentRow, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { forbidden, HttpError, notFound } from '../http/http-error';
import { isUuid } from '../http/uuid';
import { refreshCommentCount } from '../publishing/entry-counts';
import { hiddenFields, seesHiddenItem } from '../moderation/hidden-visibility';

export interface CommentLimits {
  perMinute: number;
  editWindowMs: number;
}

function toNode(row: CommentRow, authorName: string, editWindowMs: number, viewer?: UserRow): CommentNode {
  // A hidden comment reads as deleted to everyone but its author and the moderators, who see it with the reason.
  const shownHidden = row.hiddenAt !== null && row.deletedAt === null && seesHiddenItem(row.authorId, viewer);
  const deleted = row.deletedAt !== null || (row.hiddenAt !== null && !shownHidden);
  return {
    id: row.id,
    parentId: row.parentId,
    author: deleted ? null : { id: row.authorId, displayName: authorName },
    body: deleted ? null : row.body,
    deleted,
    createdAt: row.createdAt.toISOString(),
    editedAt: row.editedAt?.toISOString() ?? null,
    editableUntil: deleted || shownHidden ? null : new Date(row.createdAt.getTime() + editWindowMs).toISOString(),
    replies: [],
    ...(shownHidden ? hiddenFields(row) : {}),
  };
}

/** The thread of an entry: top-level comments oldest first, each with its replies. */
export async function commentThread(db: Db, entryId: string, limits: CommentLimits, viewer?: UserRow): Promise<CommentThread> {
  const rows = await db
    .select({ comment: comments, authorName: users.displayName })
    .from(comments)
    .innerJoin(users, eq(users.id, comments.authorId))
    .where(eq(comments.entryId, entryId))
    .orderBy(asc(comments.createdAt), asc(comments.id));
  const nodes = new Map(rows.map((r) => [r.comment.id, toNode(r.comment, r.authorName, limits.editWindowMs, viewer)]));
  const top: CommentNode[] = [];
  for (const node of nodes.values()) {
    if (node.parentId) nodes.get(node.parentId)?.replies.push(node);
    else top.push(node);
  }
  // A deleted comment without replies left says nothing: drop it. With replies it keeps the thread's shape.
  const kept = top.filter((n) => !n.deleted || n.replies.some((r) => !r.deleted));
  for (const n of kept) n.replies = n.replies.filter((r) => !r.deleted);
  return { comments: kept, count: rows.filter((r) => !r.comment.deletedAt && !r.comment.hiddenAt).length };
}

export async function addComment(db: Db, entryId: string, author: UserRow, body: string, parentId: string | undefined, limits: CommentLimits): Promise<CommentNode> {
  const since = new Date(Date.now() - 60_000);
  const [{ n }] = await db.select({ n: count() }).from(comments).where(and(eq(comments.authorId, author.id), gt(comments.createdAt, since)));
  if (n >= limits.perMinute) {
    throw new HttpError(429, 'rate_limited', `You are commenting fast: at most ${limits.perMinute} comments a minute. Wait a moment and try again.`);
  }
  if (parentId) {
    const [parent] = await db.select().from(comments).where(and(eq(comments.id, parentId), eq(comments.entryId, entryId)));
    if (!parent) throw new HttpError(400, 'invalid_input', 'The comment answered is not on this entry.', { parentId: 'is not a comment on this entry' });
    if (parent.parentId) throw new HttpError(400, 'invalid_input', 'Reply to the first comment of the thread: replies go one level deep.', { parentId: 'must be a top-level comment' });
    if (parent.deletedAt) throw new HttpError(409, 'conflict', 'That comment was deleted; start a new thread instead.');
    if (parent.hiddenAt) throw new HttpError(409, 'conflict', 'That comment is hidden by the moderators; start a new thread instead.');
  }
  const [row] = await db.insert(comments).values({ entryId, authorId: author.id, body, parentId: parentId ?? null }).returning();
  await refreshCommentCount(db, entryId);
  return toNode(row, author.displayName, limits.editWindowMs);
}

/** The user's own live comment on a live entry. */
async function ownComment(db: Db, id: string, user: UserRow): Promise<CommentRow> {
  const [found] = isUuid(id)
    ? await db.select({ comment: comments }).from(comments).innerJoin(entries, eq(entries.id, comments.entryId)).where(and(eq(comments.id, id), isNull(entries.deletedAt)))
    : [];
  const row = found?.comment;
  if (!row || row.deletedAt) throw notFound('comment');
  if (row.authorId !== user.id) throw forbidden('Only its author can change this comment.');
  return row;
}

export async function editComment(db: Db, id: string, user: UserRow, body: string, limits: CommentLimits): Promise<CommentNode> {
  const row = await ownComment(db, id, user);
  if (row.hiddenAt) throw new HttpError(409, 'comment_hidden', 'This comment is hidden by the moderators and can no longer be edited; you may delete it.');
  if (Date.now() - row.createdAt.getTime() > limits.editWindowMs) {
    throw new HttpError(403, 'edit_window_closed', `Comments can be edited for ${Math.round(limits.editWindowMs / 60_000)} minutes after posting; this one can no longer be changed.`);
  }
  const [updated] = await db.update(comments).set({ body, editedAt: new Date() }).where(eq(comments.id, id)).returning();
  return toNode(updated, user.displayName, limits.editWindowMs);
}

/** Soft delete: the row stays so replies keep their place; its text and author are no longer shown. */
export async function deleteComment(db: Db, id: string, user: UserRow): Promise<void> {
  const row = await ownComment(db, id, user);
  await db.update(comments).set({ deletedAt: new Date() }).where(eq(comments.id, id));
  await refreshCommentCount(db, row.entryId);
}
