import { Router } from 'express';
import { remixBody } from '@barwright/contracts';
import { requireUser } from '../auth/auth-router';
import type { Db } from '../database/database';
import { parseBody } from '../http/validate';
import type { Notifier } from '../notifications/notifier';
import { requireOpenEntry, requireVisibleEntry, viewerOf } from '../publishing/entry-access';
import { lineageOf } from './lineage';
import { changesOf, remixEntry, remixesOf } from './remix-service';

export function remixRouter(deps: { db: Db; notifier: Notifier }): Router {
  const { db } = deps;
  const router = Router();
  router.post('/entries/:id/remix', async (req, res) => {
    const user = requireUser(req);
    const entry = await requireOpenEntry(db, req.params.id, user, 'remixed');
    const { boardId } = parseBody(remixBody, req.body);
    const result = await remixEntry(db, entry, user, boardId);
    await deps.notifier.notify({ userId: entry.authorId, kind: 'remix', actor: user, entry });
    res.status(201).json(result);
  });
  router.get('/entries/:id/lineage', async (req, res) => {
    const entry = await requireVisibleEntry(db, req.params.id, viewerOf(req));
    res.json(await lineageOf(db, entry.id, entry.rootEntryId, viewerOf(req)));
  });
  router.get('/entries/:id/remixes', async (req, res) => {
    const entry = await requireVisibleEntry(db, req.params.id, viewerOf(req));
    res.json(await remixesOf(db, entry.id));
  });
  router.get('/entries/:id/changes', async (req, res) => {
    const entry = await requireVisibleEntry(db, req.params.id, viewerOf(req));
    res.json(await changesOf(db, entry));
  });
  return router;
}
