import { Router } from 'express';
import { featureBody, showcaseNoteBody, showcaseOrderBody, type CuratedItem } from '@barwright/contracts';
import type { Db } from '../database/database';
import type { Notifier } from '../notifications/notifier';
import { parseBody } from '../http/validate';
import { DESK_PATH, deskOnly } from '../moderation/desk-guard';
import { curatedShowcase, editNote, featureEntry, reorder, unfeature } from './showcase-service';

/** Showcase curation at /api/moderation/showcase (moderators and admins); every change is audited. */
export function curationRouter(deps: { db: Db; notifier: Pick<Notifier, 'notify'> }): Router {
  const { db, notifier } = deps;
  const router = Router();
  router.use(DESK_PATH, deskOnly);
  router.get('/moderation/showcase', async (_req, res) => {
    res.json((await curatedShowcase(db)) satisfies CuratedItem[]);
  });
  router.post('/moderation/showcase', async (req, res) => {
    const { entryId, note } = parseBody(featureBody, req.body);
    const item = await featureEntry(db, req.user!, entryId, note);
    // The author hears of it (in the app and by their e-mail setting); a failure there never undoes the feature.
    await notifier.notify({ userId: item.entry.author.id, kind: 'entry-featured', actor: req.user!, entry: { id: item.entry.id, title: item.entry.title }, data: { note } });
    res.status(201).json(item satisfies CuratedItem);
  });
  router.put('/moderation/showcase/order', async (req, res) => {
    const { entryIds, moved } = parseBody(showcaseOrderBody, req.body);
    res.json((await reorder(db, req.user!, entryIds, moved)) satisfies CuratedItem[]);
  });
  router.patch('/moderation/showcase/:entryId', async (req, res) => {
    const { note } = parseBody(showcaseNoteBody, req.body);
    res.json((await editNote(db, req.user!, req.params.entryId, note)) satisfies CuratedItem);
  });
  router.delete('/moderation/showcase/:entryId', async (req, res) => {
    await unfeature(db, req.user!, req.params.entryId);
    res.status(204).end();
  });
  return router;
}
