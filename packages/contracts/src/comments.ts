import * as z from 'zod';
import type { PersonRef } from './entries';

/**
 * Comments on an entry: plain text, threaded one level (a reply answers a top-level comment).
 *   GET    /api/entries/:id/comments   → CommentThread
 *   POST   /api/entries/:id/comments   NewCommentBody → 201 CommentNode   (signed in; 429 when too fast)
 *   PATCH  /api/comments/:id           EditCommentBody → CommentNode      (own, within COMMENT_EDIT_WINDOW_MS)
 *   DELETE /api/comments/:id           → 204                              (own; the node stays as "comment deleted")
 * Bodies are plain text both ways: show them with `renderCommentHtml` or as text, never as HTML.
 */
export const COMMENT_MAX = 2000;
/** How long after posting its author may edit a comment. */
export const COMMENT_EDIT_WINDOW_MS = 15 * 60_000;
/** Default per-member pace (the server's setting may differ). */
export const COMMENTS_PER_MINUTE = 10;

const commentText = z
  .string({ error: 'is required' })
  .trim()
  .min(1, 'is required')
  .max(COMMENT_MAX, `must be at most ${COMMENT_MAX} characters`);

export const newCommentBody = z.strictObject({
  body: commentText,
  /** The top-level comment this one answers; omit for a new thread. */
  parentId: z.uuid('must be a comment id').optional(),
});
export type NewCommentBody = z.input<typeof newCommentBody>;

export const editCommentBody = z.strictObject({ body: commentText });
export type EditCommentBody = z.input<typeof editCommentBody>;

export interface CommentNode {
  id: string;
  parentId: string | null;
  /** Null once deleted (the node keeps its place in the thread). */
  author: PersonRef | null;
  body: string | null;
  deleted: boolean;
  createdAt: string;
  editedAt: string | null;
  /** Until when its author may still edit it (ISO 8601); null when deleted. */
  editableUntil: string | null;
  /** Replies, oldest first (always empty on replies). */
  replies: CommentNode[];
  /** Moderation: set only for the viewers who may see a hidden comment (its author, moderators); to others it reads as deleted. */
  hidden?: boolean;
  hiddenReason?: string | null;
}

export interface CommentThread {
  /** Top-level comments, oldest first. */
  comments: CommentNode[];
  /** Comments not deleted, replies included. */
  count: number;
}
