import { Router } from 'express';
import { ratingBody, type RatingAnswer } from '@barwright/contracts';
import { requireUser } from '../auth/auth-router';
import type { Db } from '../database/database';
import { forbidden } from '../http/http-error';
import { parseBody } from '../http/validate';
import type { Notifier } from '../notifications/notifier';
import { requireOpenEntry } from '../publishing/entry-access';
import { setRating } from './ratings-service';

export function ratingsRouter(deps: { db: Db; notifier: Notifier }): Router {
  const { db } = deps;
  const router = Router();
  router.put('/entries/:id/rating', async (req, res) => {
    const user = requireUser(req);
    const entry = await requireOpenEntry(db, req.params.id, user, 'rated');
    if (entry.authorId === user.id) throw forbidden('You cannot rate your own bar.');
    const { stars } = parseBody(ratingBody, req.body);
    const { first, ...answer } = await setRating(db, entry.id, user.id, stars);
    // Only the first rating tells the author; changing one's stars does not notify again.
    if (first) await deps.notifier.notify({ userId: entry.authorId, kind: 'rating', actor: user, entry, data: { stars } });
    res.json(answer satisfies RatingAnswer);
  });
  router.delete('/entries/:id/rating', async (req, res) => {
    const user = requireUser(req);
    const entry = await requireOpenEntry(db, req.params.id, user, 'rated');
    const { first: _first, ...answer } = await setRating(db, entry.id, user.id, null);
    res.json(answer satisfies RatingAnswer);
  });
  return router;
}
