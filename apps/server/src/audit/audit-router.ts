import { Router } from 'express';
import { auditQuery, type AuditPage, type PersonRef } from '@barwright/contracts';
import type { Db } from '../database/database';
import { parseBody } from '../http/validate';
import { DESK_PATH, deskOnly } from '../moderation/desk-guard';
import { auditActors, auditPage } from './audit-query';

/**
 * Reading the audit log at /api/moderation/audit (moderators and admins). Read-only on purpose:
 * the log is append-only, and no route changes or removes a line.
 */
export function auditRouter(deps: { db: Db }): Router {
  const router = Router();
  router.use(DESK_PATH, deskOnly);
  router.get('/moderation/audit', async (req, res) => {
    res.json((await auditPage(deps.db, parseBody(auditQuery, req.query))) satisfies AuditPage);
  });
  router.get('/moderation/audit/actors', async (_req, res) => {
    res.json((await auditActors(deps.db)) satisfies PersonRef[]);
  });
  return router;
}
