import { Router } from 'express';
import type { LocalSmtp } from '../mail/local-smtp';
import { loopbackOnly } from './loopback-only';

/**
 * `GET /api/dev/mailbox`: what the local fake SMTP server received, newest first. Mounted only in local
 * mail mode (never in production: the configuration refuses to start there without SMTP_URL), and it
 * answers only to clients on this machine, since the messages hold sign-in and reset links.
 */
export function mailboxRouter(smtp: LocalSmtp): Router {
  const router = Router();
  router.use(loopbackOnly);
  router.get('/mailbox', (_req, res) => {
    res.json(smtp.messages());
  });
  return router;
}
