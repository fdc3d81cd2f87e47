import { Router } from 'express';
import { and, desc, eq, inArray, isNull, lt } from 'drizzle-orm';
import { escapeHtml, markReadBody, notificationListQuery, notificationSettings as settingsSchema, type NotificationList, type NotificationSettings } from '@barwright/contracts';
import { notifications } from '../../../../db/schema';
import type { Db } from '../database/database';
import { requireUser } from '../auth/auth-router';
import { HttpError } from '../http/http-error';
import { parseBody } from '../http/validate';
import type { NotificationEvents } from './notification-events';
import { emailModeOf, setEmailMode } from './notification-settings';
import { toNotification } from './notification-text';
import type { Notifier } from './notifier';
import { verifyUnsubscribeToken } from './unsubscribe-token';
import { shownNotifications } from '../moderation/hidden-visibility';

export interface NotificationsRouterDeps {
  db: Db;
  notifier: Notifier;
  events: NotificationEvents;
  secret: string;
  publicUrl: string;
}

const unsubscribedPage = (settingsUrl: string) => `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>Unsubscribed · Barwright</title></head>
<body style="font-family:Roboto,Arial,sans-serif;max-width:560px;margin:48px auto;padding:0 16px;color:#1f252c;line-height:1.5">
<h1 style="font-size:20px;font-weight:500">You will get no more notification e-mails</h1>
<p>Barwright will still show your notifications in the app. To have e-mails again, choose immediate or a daily digest in <a href="${escapeHtml(settingsUrl)}">your notification settings</a>.</p>
</body></html>`;

export function notificationsRouter(deps: NotificationsRouterDeps): Router {
  const { db } = deps;
  const router = Router();

  router.get('/notifications', async (req, res) => {
    const user = requireUser(req);
    const query = parseBody(notificationListQuery, req.query);
    const rows = await db
      .select()
      .from(notifications)
      .where(and(eq(notifications.userId, user.id), query.before ? lt(notifications.createdAt, new Date(query.before)) : undefined, shownNotifications))
      .orderBy(desc(notifications.createdAt))
      .limit(query.limit);
    res.json({ items: rows.map(toNotification), unread: await deps.notifier.unreadCount(user.id) } satisfies NotificationList);
  });
  router.post('/notifications/read', async (req, res) => {
    const user = requireUser(req);
    const body = parseBody(markReadBody, req.body);
    const mine = and(eq(notifications.userId, user.id), isNull(notifications.readAt));
    await db
      .update(notifications)
      .set({ readAt: new Date() })
      .where('ids' in body ? and(mine, inArray(notifications.id, body.ids)) : mine);
    const unread = await deps.notifier.unreadCount(user.id);
    deps.events.emit('unread', { userId: user.id, unread });
    res.json({ unread });
  });
  router.get('/notifications/settings', async (req, res) => {
    res.json({ email: await emailModeOf(db, requireUser(req).id) } satisfies NotificationSettings);
  });
  router.put('/notifications/settings', async (req, res) => {
    const { email } = parseBody(settingsSchema, req.body);
    res.json({ email: await setEmailMode(db, requireUser(req).id, email) } satisfies NotificationSettings);
  });
  // The e-mail's one-click link: no session needed, the signed token says whose e-mail to stop.
  router.get('/notifications/unsubscribe', async (req, res) => {
    const userId = verifyUnsubscribeToken(deps.secret, String(req.query.token ?? ''));
    if (!userId) throw new HttpError(400, 'invalid_token', 'This unsubscribe link is not valid. Change your e-mail settings after signing in instead.');
    await setEmailMode(db, userId, 'off').catch(() => {
      throw new HttpError(400, 'invalid_token', 'This unsubscribe link is not valid. Change your e-mail settings after signing in instead.');
    });
    if (req.accepts(['json', 'html']) === 'html') res.type('html').send(unsubscribedPage(`${deps.publicUrl}/notifications`));
    else res.json({ email: 'off' } satisfies NotificationSettings);
  });
  return router;
}
