import { Router, type Request } from 'express';
import { dismissBody, hideBody, reportTargetSchema, restoreBody, suspendAuthorBody, type ModerationCase, type ModerationQueue, type ReportTarget } from '@barwright/contracts';
import { notFound } from '../http/http-error';
import { parseBody } from '../http/validate';
import { DESK_PATH, deskOnly } from './desk-guard';
import { dismissReports, hideItem, restoreItem, suspendAuthor, type ModerationActionDeps } from './moderation-actions';
import { buildCases, hiddenTargets, queueTargets } from './moderation-cases';

/** The item named by `…/items/:kind/:id`, or 404. */
function targetOf(req: Request): ReportTarget {
  const parsed = reportTargetSchema.safeParse({ kind: req.params.kind, id: req.params.id });
  if (!parsed.success) throw notFound('item');
  return parsed.data;
}

/** The moderation desk: the queue, the hidden items, one item's case and the decisions on it (moderators and admins). */
export function deskRouter(deps: ModerationActionDeps): Router {
  const { db } = deps;
  const router = Router();
  router.use(DESK_PATH, deskOnly);

  router.get('/moderation/queue', async (req, res) => {
    const cases = await buildCases(db, await queueTargets(db), req.user!);
    res.json({ cases, openReports: cases.reduce((n, c) => n + c.openReports.length, 0) } satisfies ModerationQueue);
  });
  router.get('/moderation/hidden', async (req, res) => {
    res.json((await buildCases(db, await hiddenTargets(db), req.user!)) satisfies ModerationCase[]);
  });

  const caseOf = async (req: Request): Promise<ModerationCase> => {
    const [found] = await buildCases(db, [targetOf(req)], req.user!);
    if (!found) throw notFound('item');
    return found;
  };
  router.get('/moderation/items/:kind/:id', async (req, res) => {
    res.json(await caseOf(req));
  });
  router.post('/moderation/items/:kind/:id/dismiss', async (req, res) => {
    const { note } = parseBody(dismissBody, req.body);
    await dismissReports(deps, req.user!, targetOf(req), note);
    res.json(await caseOf(req));
  });
  router.post('/moderation/items/:kind/:id/hide', async (req, res) => {
    const { reason } = parseBody(hideBody, req.body);
    await hideItem(deps, req.user!, targetOf(req), reason);
    res.json(await caseOf(req));
  });
  router.post('/moderation/items/:kind/:id/restore', async (req, res) => {
    const { note } = parseBody(restoreBody, req.body);
    await restoreItem(deps, req.user!, targetOf(req), note);
    res.json(await caseOf(req));
  });
  router.post('/moderation/items/:kind/:id/suspend-author', async (req, res) => {
    const { reason } = parseBody(suspendAuthorBody, req.body);
    await suspendAuthor(deps, req.user!, targetOf(req), reason);
    res.json(await caseOf(req));
  });
  return router;
}
