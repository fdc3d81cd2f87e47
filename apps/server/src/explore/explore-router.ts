import { Router } from 'express';
import { exploreQuery } from '@barwright/contracts';
import type { Db } from '../database/database';
import { parseBody } from '../http/validate';
import { explorePage } from './explore-query';

/** `GET /api/entries`: Explore, readable signed out. */
export function exploreRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/entries', async (req, res) => {
    res.json(await explorePage(deps.db, parseBody(exploreQuery, req.query)));
  });
  return router;
}
