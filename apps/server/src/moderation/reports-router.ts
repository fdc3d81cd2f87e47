import { Router } from 'express';
import { newReportBody, type Report } from '@barwright/contracts';
import { requireUser } from '../auth/auth-router';
import { parseBody } from '../http/validate';
import { announceQueue, type ModerationActionDeps } from './moderation-actions';
import { fileReport } from './reports-service';

/** `POST /api/reports`: any signed-in member reports an entry, a comment or a photo. */
export function reportsRouter(deps: ModerationActionDeps & { reportsPerHour: number }): Router {
  const router = Router();
  router.post('/reports', async (req, res) => {
    const user = requireUser(req);
    const body = parseBody(newReportBody, req.body);
    const report = await fileReport(deps.db, user, body, deps.reportsPerHour);
    await announceQueue(deps);
    res.status(201).json(report satisfies Report);
  });
  return router;
}
