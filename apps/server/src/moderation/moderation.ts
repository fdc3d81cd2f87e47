import { Router } from 'express';
import type { Db } from '../database/database';
import type { AccountChangeDeps } from '../admin/account-changes';
import type { DatabaseSessionStore } from '../auth/session-store';
import type { NotificationEvents } from '../notifications/notification-events';
import type { Notifier } from '../notifications/notifier';
import { auditRouter } from '../audit/audit-router';
import { curationRouter } from '../showcase/curation-router';
import { showcaseRouter } from '../showcase/showcase-router';
import { deskRouter } from './desk-router';
import { DEFAULT_MODERATION_LIMITS, type ModerationLimits } from './moderation-limits';
import { ModerationEvents } from './moderation-events';
import { reportsRouter } from './reports-router';

export interface ModerationDeps {
  db: Db;
  sessionStore: DatabaseSessionStore;
  closeUserSockets: (userId: string) => void;
  /** The community's notification events: hiding a comment changes its notification's bell count. */
  notificationEvents: NotificationEvents;
  /** Tells authors when their item is hidden, restored or featured. */
  notifier: Pick<Notifier, 'notify'>;
  events?: ModerationEvents;
  limits?: Partial<ModerationLimits>;
}

/**
 * Moderation and the showcase, mounted on /api: the public routes (`GET /showcase`, `POST /reports`),
 * the desk, the curation and the audit log under /moderation (moderators and admins), and the
 * account-change dependencies the admin routes share with the desk (one code path for roles and
 * suspensions, audited).
 */
export function createModeration(deps: ModerationDeps) {
  const events = deps.events ?? new ModerationEvents();
  const limits = { ...DEFAULT_MODERATION_LIMITS, ...deps.limits };
  const accounts: AccountChangeDeps = { db: deps.db, sessionStore: deps.sessionStore, closeUserSockets: deps.closeUserSockets, moderationEvents: events };
  const routerDeps = { db: deps.db, accounts, events, notificationEvents: deps.notificationEvents, notifier: deps.notifier, reportsPerHour: limits.reportsPerHour };
  const router = Router();
  router.use(showcaseRouter({ db: deps.db }));
  router.use(reportsRouter(routerDeps));
  router.use(deskRouter(routerDeps));
  router.use(curationRouter({ db: deps.db, notifier: deps.notifier }));
  router.use(auditRouter({ db: deps.db }));
  return { router, accounts, events };
}
