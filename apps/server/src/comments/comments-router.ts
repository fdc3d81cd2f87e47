import { Router } from 'express';
import { editCommentBody, newCommentBody } from '@barwright/contracts';
import { requireUser } from '../auth/auth-router';
import type { Db } from '../database/database';
import { parseBody } from '../http/validate';
import type { Notifier } from '../notifications/notifier';
import { requireOpenEntry, requireVisibleEntry, viewerOf } from '../publishing/entry-access';
import { addComment, commentThread, deleteComment, editComment, type CommentLimits } from './comments-service';

export function commentsRouter(deps: { db: Db; notifier: Notifier; limits: CommentLimits }): Router {
  const { db, limits } = deps;
  const router = Router();
  router.get('/entries/:id/comments', async (req, res) => {
    const entry = await requireVisibleEntry(db, req.params.id, viewerOf(req));
    res.json(await commentThread(db, entry.id, limits, viewerOf(req)));
  });
  router.post('/entries/:id/comments', async (req, res) => {
    const user = requireUser(req);
    const entry = await requireOpenEntry(db, req.params.id, user, 'commented on');
    const body = parseBody(newCommentBody, req.body);
    const node = await addComment(db, entry.id, user, body.body, body.parentId, limits);
    await deps.notifier.notify({ userId: entry.authorId, kind: 'comment', actor: user, entry, comment: { id: node.id } });
    res.status(201).json(node);
  });
  router.patch('/comments/:id', async (req, res) => {
    const user = requireUser(req);
    const { body } = parseBody(editCommentBody, req.body);
    res.json(await editComment(db, req.params.id, user, body, limits));
  });
  router.delete('/comments/:id', async (req, res) => {
    await deleteComment(db, req.params.id, requireUser(req));
    res.status(204).end();
  });
  return router;
}
