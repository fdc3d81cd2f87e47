import { Router } from 'express';
import type { ShowcaseItem } from '@barwright/contracts';
import type { Db } from '../database/database';
import { publicShowcase } from './showcase-service';

/** `GET /api/showcase`: the home page's showcase, for everyone (signed in or not). */
export function showcaseRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/showcase', async (_req, res) => {
    res.json((await publicShowcase(deps.db)) satisfies ShowcaseItem[]);
  });
  return router;
}
