import { Router } from 'express';
import type { ComputePool } from '../compute/compute-pool';
import type { Db } from '../database/database';
import type { Mailer } from '../mail/mailer';
import type { DesignDocStore } from '../realtime/design-doc-store';
import { commentsRouter } from '../comments/comments-router';
import { exploreRouter } from '../explore/explore-router';
import { NotificationEvents } from '../notifications/notification-events';
import { notificationsRouter } from '../notifications/notifications-router';
import { Notifier } from '../notifications/notifier';
import { publishingRouter } from '../publishing/publishing-router';
import { ratingsRouter } from '../ratings/ratings-router';
import { remixRouter } from '../remix/remix-router';
import { measuredRouter } from '../shop-log/measured-router';
import { PhotoFiles } from '../shop-log/photo-files';
import { photosRouter } from '../shop-log/photos-router';
import type { PhotoStorage } from '../shop-log/photo-storage';
import { DEFAULT_COMMUNITY_LIMITS, type CommunityLimits } from './community-limits';

export interface CommunityDeps {
  db: Db;
  store: DesignDocStore;
  compute: ComputePool;
  mailer: Mailer;
  publicUrl: string;
  /** Signs unsubscribe links (the session secret). */
  secret: string;
  events?: NotificationEvents;
  limits?: Partial<CommunityLimits>;
  /** Where photos are stored (main.ts: the S3 bucket or DATA_DIR/uploads); else a folder, uploadsDir (tests). Uploads answer 503 without either. */
  photoStorage?: PhotoStorage;
  uploadsDir?: string;
  log: (error: unknown) => void;
}

/**
 * The community's routes (publishing, Explore, ratings, comments, remix, shop log, notifications),
 * mounted on /api by app.ts, and the notifier other features use (board invitations).
 */
export function createCommunity(deps: CommunityDeps) {
  const { db } = deps;
  const limits = { ...DEFAULT_COMMUNITY_LIMITS, ...deps.limits };
  const events = deps.events ?? new NotificationEvents();
  const notifier = new Notifier({ db, mailer: deps.mailer, publicUrl: deps.publicUrl, secret: deps.secret, events, log: deps.log });
  const router = Router();
  router.use(exploreRouter({ db }));
  router.use(publishingRouter({ db, store: deps.store, compute: deps.compute }));
  router.use(ratingsRouter({ db, notifier }));
  router.use(commentsRouter({ db, notifier, limits: { perMinute: limits.commentsPerMinute, editWindowMs: limits.commentEditWindowMs } }));
  router.use(remixRouter({ db, notifier }));
  router.use(photosRouter({ db, files: deps.photoStorage ?? (deps.uploadsDir ? new PhotoFiles(deps.uploadsDir) : undefined), limits: { maxBytes: limits.photoMaxBytes, maxPixels: limits.photoMaxPixels, perDay: limits.photosPerDay } }));
  router.use(measuredRouter());
  router.use(notificationsRouter({ db, notifier, events, secret: deps.secret, publicUrl: deps.publicUrl }));
  return { router, events, notifier };
}
