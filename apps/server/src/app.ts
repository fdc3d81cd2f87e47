import express from 'express';
import session from 'express-session';
import compression from 'compression';
import type { ClientConfig, Health } from '@barwright/contracts';
import { healthRouter, type ReadinessCheck } from './http/health-router';
import type { Db } from './database/database';
import { adminRouter } from './admin/admin-router';
import { authRouter } from './auth/auth-router';
import { createPassport } from './auth/passport-setup';
import { DatabaseSessionStore } from './auth/session-store';
import { mailboxRouter } from './dev/mailbox-router';
import { csrfProtection } from './http/csrf';
import { apiNotFound, errorMiddleware } from './http/error-middleware';
import { HttpError } from './http/http-error';
import { createRateLimits, DEFAULT_RATE_LIMITS, type RateLimitSettings, type RateLimitStoreFactory } from './http/rate-limits';
import { securityHeaders } from './http/security-headers';
import { refuseHostileShapes } from './http/request-shape';
import type { LocalSmtp } from './mail/local-smtp';
import type { Mailer } from './mail/mailer';
import { webAppRouter } from './web/web-app';
import { openApiDocument } from './openapi/openapi-document';
import { BoardAccessEvents } from './boards/board-access';
import { boardsRouter, invitationsRouter } from './boards/boards-router';
import { designsRouter } from './designs/designs-router';
import { DesignDocStore } from './realtime/design-doc-store';
// The community (publishing, Explore, ratings, comments, remix, shop log, notifications).
import { createCommunity } from './community/community';
import type { CommunityLimits } from './community/community-limits';
import type { PhotoStorage } from './shop-log/photo-storage';
import { NotificationEvents } from './notifications/notification-events';
// Moderation: the showcase, reports and the desk, the audit log.
import { createModeration } from './moderation/moderation';
import type { ModerationEvents } from './moderation/moderation-events';
import type { ModerationLimits } from './moderation/moderation-limits';
// Engine work (exports, thumbnails) runs in a worker pool with a budget per job.
import { retryAfterWhenBusy, type ComputePool } from './compute/compute-pool';
// The rosette rack and its sweeps; votes on a board's designs.
import { isRackImport, rackRouter } from './rack/rack-router';
import { VoteEvents } from './votes/vote-events';
import { votesRouter } from './votes/votes-router';
import { VotesService } from './votes/votes-service';

/** Idle and absolute session lifetimes. */
export const SESSION_IDLE_MS = 7 * 24 * 3600_000;
export const SESSION_ABSOLUTE_MS = 30 * 24 * 3600_000;
export const SESSION_COOKIE = 'barwright.sid';

export interface AppDeps {
  db: Db;
  databaseKind: Health['database'];
  mailer: Mailer;
  /** Present in local mail mode: the fake SMTP server whose messages the mailbox shows. */
  localSmtp?: LocalSmtp;
  sessionSecret: string;
  publicUrl: string;
  /** The built web app; omitted in API tests. */
  webDist?: string;
  demo?: boolean;
  rateLimits?: Partial<RateLimitSettings>;
  /** Several instances: the rate-limit counters' shared store (Redis); omitted: in memory. */
  rateLimitStore?: RateLimitStoreFactory;
  /** Express's `trust proxy` (TRUST_PROXY): which hops' X-Forwarded-For to believe for the client's address. */
  trustProxy?: boolean | number | string;
  /** The co-editing store shared with the realtime gateway (its append listener feeds the cross-instance relay). */
  designDocStore?: DesignDocStore;
  log?: (error: unknown) => void;
  /** Shared with the realtime gateway so role changes reach open sockets. */
  accessEvents?: BoardAccessEvents;
  /** Closes the open sockets of a design (it was deleted); the realtime gateway provides it. */
  closeDesignSockets?: (designId: string) => void;
  /** Closes every open socket of a user (suspended, password reset); the realtime gateways provide it. */
  closeUserSockets?: (userId: string) => void;
  /** Closes the open sockets opened with one session (signed out); the realtime gateways provide it. */
  closeSessionSockets?: (sessionId: string) => void;
  /** The community: shared with the notification socket gateway; where photos are stored (DATA_DIR/uploads); lower limits for tests. */
  notificationEvents?: NotificationEvents;
  uploadsDir?: string;
  /** Photo storage shared by instances (an S3 bucket); takes the place of uploadsDir. */
  photoStorage?: PhotoStorage;
  communityLimits?: Partial<CommunityLimits>;
  /** Moderation: shared with the moderation socket gateway (queue counts, roles removed); lower limits for tests. */
  moderationEvents?: ModerationEvents;
  moderationLimits?: Partial<ModerationLimits>;
  /** Readiness probes besides the database's (`redis`), and whether shutdown has begun: see http/health-router.ts. */
  readinessChecks?: Record<string, ReadinessCheck>;
  isDraining?: () => boolean;
  /** Runs engine work off the request thread; main.ts (or the test) creates and closes it. */
  compute: ComputePool;
}

/** What main.ts needs besides the handler: the same session parser for the socket upgrade. */
export interface AppLocals {
  sessionParser: express.RequestHandler;
  accessEvents: BoardAccessEvents;
  notificationEvents: NotificationEvents;
  moderationEvents: ModerationEvents;
  /** Votes: their ranking events feed the vote socket (VoteGateway). */
  votes: VotesService;
}

/** Builds the Express app. It never listens: main.ts does, and tests call it through supertest. */
export function createApp(deps: AppDeps): express.Express {
  const log = deps.log ?? ((e: unknown) => console.error(e));
  const secureCookies = deps.publicUrl.startsWith('https://');
  const sessionStore = new DatabaseSessionStore(deps.db);
  const passport = createPassport(deps.db);
  const limits = createRateLimits({ ...DEFAULT_RATE_LIMITS, ...deps.rateLimits }, deps.rateLimitStore);

  const accessEvents = deps.accessEvents ?? new BoardAccessEvents();
  const store = deps.designDocStore ?? new DesignDocStore(deps.db);
  const sessionParser = session({
    name: SESSION_COOKIE,
    secret: deps.sessionSecret,
    store: sessionStore,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: secureCookies, maxAge: SESSION_IDLE_MS },
  });

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', deps.trustProxy ?? false);
  const community = createCommunity({
    db: deps.db, store, compute: deps.compute, mailer: deps.mailer, publicUrl: deps.publicUrl, secret: deps.sessionSecret,
    events: deps.notificationEvents, limits: deps.communityLimits, uploadsDir: deps.uploadsDir, photoStorage: deps.photoStorage, log,
  });
  const moderation = createModeration({
    db: deps.db, sessionStore, closeUserSockets: deps.closeUserSockets ?? (() => {}), notificationEvents: community.events, notifier: community.notifier,
    events: deps.moderationEvents, limits: deps.moderationLimits,
  });
  const votes = new VotesService({ db: deps.db, notifier: community.notifier, events: new VoteEvents() });
  Object.assign(app.locals, { sessionParser, accessEvents, notificationEvents: community.events, moderationEvents: moderation.events, votes } satisfies AppLocals);
  // Health checks first: a balancer's probe needs no security headers, session, body parser or compression.
  app.use('/api', healthRouter({ db: deps.db, databaseKind: deps.databaseKind, readinessChecks: deps.readinessChecks, isDraining: deps.isDraining }));
  app.use(securityHeaders(secureCookies));

  const api = express.Router();
  // JSON answers above 1 KiB go compressed (brotli or gzip, as the client accepts); images are left alone.
  api.use(compression({ threshold: 1024 }));
  // A rack file may be larger (RACK_FILE_MAX_BYTES): its route reads it itself, once the member is known.
  const json = express.json({ limit: '256kb' });
  api.use((req, res, next) => (isRackImport(req) ? next() : json(req, res, next)));
  api.use(refuseHostileShapes);
  let openapi: ReturnType<typeof openApiDocument> | undefined; // built when first asked for, not at every start
  api.get('/openapi.json', (_req, res) => {
    res.json((openapi ??= openApiDocument()));
  });
  // A visitor's request reads no session row and writes none (saveUninitialized: false, and the XSRF
  // token needs no session); a signed-in one is read once and its rolling expiry written at most once a minute.
  api.use(sessionParser);
  api.use((req, _res, next) => {
    // The absolute timeout: a session older than this ends however active it is.
    if (req.session.startedAt && Date.now() - req.session.startedAt > SESSION_ABSOLUTE_MS) req.session.regenerate(next);
    else next();
  });
  api.use(passport.initialize());
  api.use(passport.session());
  api.use(csrfProtection(deps.sessionSecret, secureCookies));
  api.get('/config', (_req, res) => {
    res.json({ localMail: Boolean(deps.localSmtp), demo: Boolean(deps.demo) } satisfies ClientConfig);
  });
  api.use('/auth', authRouter({ db: deps.db, mailer: deps.mailer, sessionStore, publicUrl: deps.publicUrl, log, passport, limits, secureCookies, closeUserSockets: deps.closeUserSockets, closeSessionSockets: deps.closeSessionSockets }));
  api.use('/admin', adminRouter(moderation.accounts)); // role changes and suspensions: one code path with the desk's, audited
  const boardDeps = { db: deps.db, mailer: deps.mailer, publicUrl: deps.publicUrl, accessEvents, log, notifyInvited: community.notifier.invited.bind(community.notifier) };
  api.use('/boards', boardsRouter(boardDeps));
  api.use('/invitations', invitationsRouter(boardDeps));
  api.use('/designs', designsRouter({ db: deps.db, store, compute: deps.compute, closeDesignSockets: deps.closeDesignSockets ?? (() => {}) }));
  api.use('/rack', rackRouter({ db: deps.db }));
  api.use(votesRouter(votes));
  api.use(community.router);
  api.use(moderation.router);
  if (deps.localSmtp) api.use('/dev', mailboxRouter(deps.localSmtp));
  api.use(apiNotFound);

  app.use('/api', api);
  if (deps.webDist) app.use(webAppRouter(deps.webDist));
  app.use((_req, _res, next) => next(new HttpError(404, 'not_found', 'Not found')));
  app.use(retryAfterWhenBusy);
  app.use(errorMiddleware(log));
  return app;
}
