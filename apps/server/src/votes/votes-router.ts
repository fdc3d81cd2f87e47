import { Router } from 'express';
import { createVoteBody, voteAnswerBody } from '@barwright/contracts';
import { requireUser } from '../auth/auth-router';
import { parseBody } from '../http/validate';
import type { VotesService } from './votes-service';

/** Votes: opened on a board (/api/boards/:id/votes), then answered and read at /api/votes/:id. */
export function votesRouter(service: VotesService): Router {
  const router = Router();
  router.post('/boards/:id/votes', async (req, res) => {
    const user = requireUser(req);
    await service.mayOpen(req.params.id, user.id); // a stranger learns nothing of the board, whatever the body
    const body = parseBody(createVoteBody, req.body);
    res.status(201).json(await service.open(req.params.id, user, body));
  });
  router.get('/boards/:id/votes', async (req, res) => {
    res.json(await service.list(req.params.id, requireUser(req).id));
  });
  router.get('/votes/:id', async (req, res) => {
    res.json(await service.detail(req.params.id, requireUser(req).id));
  });
  router.get('/votes/:id/next-pair', async (req, res) => {
    const pair = await service.nextPair(req.params.id, requireUser(req).id);
    if (pair) res.json(pair);
    else res.status(204).end();
  });
  router.put('/votes/:id/answers', async (req, res) => {
    const user = requireUser(req);
    res.json(await service.answer(req.params.id, user.id, parseBody(voteAnswerBody, req.body)));
  });
  router.post('/votes/:id/close', async (req, res) => {
    res.json(await service.close(req.params.id, requireUser(req)));
  });
  return router;
}
