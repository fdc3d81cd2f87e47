import { Router } from 'express';
import type { LocalSmtp } from '../mail/local-smtp';

/** `GET /api/dev/mailbox`: what the local fake SMTP server received, newest first. Mounted only in local mail mode. */
export function mailboxRouter(smtp: LocalSmtp): Router {
  const router = Router();
  router.get('/mailbox', (_req, res) => {
    res.json(smtp.messages());
  });
  return router;
}
