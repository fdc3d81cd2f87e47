import http from 'node:http';
import { createApp, type AppLocals } from './app';
import { closeHttpServer } from './http/graceful-close';
import { withLiveness } from './http/liveness';
import { ComputePool } from './compute/compute-pool';
import { BoardAccessEvents } from './boards/board-access';
import { CLOSE_CODES } from '@barwright/contracts';
import { CollabGateway } from './realtime/collab-gateway';
import { allowedOrigins } from './realtime/allowed-origins';
import { configWarnings, loadConfig } from './config';
import { DataDirBusyError } from './database/data-dir-lock';
import { startLocalSmtp, type LocalSmtp } from './mail/local-smtp';
import { createMailer } from './mail/mailer';
import { openConfiguredDatabase, openPhotoStorage, sessionSecretFor } from './runtime';
import { seedDemoScenario } from '../../../seeds/seed-demo';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../../seeds/demo-scenario';
import { NotificationEvents } from './notifications/notification-events';
import { NotifyGateway } from './notifications/notify-gateway';
import { DIGEST_CHECK_MS, sendDueDigests } from './notifications/digests';
import { ModerationGateway } from './moderation/moderation-gateway';
import { VoteGateway } from './votes/vote-gateway';
// Several instances (REDIS_URL): socket.io rooms, the co-editing relay and the rate-limit counters in Redis.
// The Redis client and adapter are imported below only when REDIS_URL is set (a one-process start loads neither).
import { redisRateLimitStores } from './http/rate-limits';
import { DesignDocStore } from './realtime/design-doc-store';
import { RedisRelay } from './realtime/redis-relay';
import { DatabaseSessionStore, PRUNE_EVERY_MS } from './auth/session-store';

const log = (line: string) => console.log(`[barwright] ${line}`);

/** Shutdown: how long requests in flight may take to finish, and the whole sequence at most. */
const HTTP_DRAIN_MS = 10_000;
const SHUTDOWN_DEADLINE_MS = 20_000;

/** The only file that starts things: config, database, mail, HTTP; and stops them on SIGINT/SIGTERM. */
async function main() {
  const started = performance.now();
  const config = loadConfig();
  for (const line of configWarnings(config)) console.warn(`[barwright] ${line}`);
  const photoStorage = await openPhotoStorage(config);
  const { database, release, fresh } = await openConfiguredDatabase(config, log);
  const redis = config.redisUrl ? await (await import('./cluster/redis-connection')).openRedis(config.redisUrl, log, { prefix: config.redisPrefix }) : undefined;
  const createAdapter = redis && (await import('@socket.io/redis-streams-adapter')).createAdapter;
  // One store for the app and the gateway: each stored update is published to the other instances.
  const designDocStore = new DesignDocStore(database.db, undefined, (designId, seq, update) => relay?.published(designId, seq, update));
  const relay = redis && new RedisRelay(redis, designDocStore, console.error);
  let localSmtp: LocalSmtp | undefined;
  if (!config.smtpUrl) localSmtp = await startLocalSmtp();
  const mailer = createMailer({ smtpUrl: config.smtpUrl, localPort: localSmtp?.port, from: config.mailFrom });

  let seeded = false;
  if (config.demoData) seeded = await seedDemoScenario(database.db);

  const accessEvents = new BoardAccessEvents();
  let gateway: CollabGateway | undefined;
  let notify: NotifyGateway | undefined;
  let moderation: ModerationGateway | undefined;
  let votes: VoteGateway | undefined;
  // Browsers may open the realtime sockets from these origins only (a page on another port of this host may not).
  const origins = allowedOrigins(config.publicUrl, config.extraOrigins);
  const notificationEvents = new NotificationEvents();
  const sessionSecret = sessionSecretFor(config);
  const compute = new ComputePool();
  const lifecycle = { draining: false };
  const app = createApp({
    accessEvents,
    closeDesignSockets: (designId) => gateway?.closeEverywhere({ designId }, CLOSE_CODES.forbidden, 'design deleted'),
    closeUserSockets: (userId) => {
      gateway?.closeEverywhere({ userId }, CLOSE_CODES.unauthorized, 'signed out: account suspended or password reset');
      notify?.disconnectUser(userId);
      moderation?.disconnectUser(userId);
      votes?.disconnectUser(userId);
    },
    closeSessionSockets: (sessionId) => {
      gateway?.closeEverywhere({ sessionId }, CLOSE_CODES.unauthorized, 'signed out');
      notify?.disconnectSession(sessionId);
      moderation?.disconnectSession(sessionId);
      votes?.disconnectSession(sessionId);
    },
    db: database.db,
    databaseKind: database.kind,
    mailer,
    localSmtp,
    sessionSecret,
    publicUrl: config.publicUrl,
    webDist: config.webDist,
    demo: config.demoData,
    notificationEvents,
    photoStorage,
    isDraining: () => lifecycle.draining,
    readinessChecks: redis && { redis: () => redis.client.ping() },
    compute,
    designDocStore,
    trustProxy: config.trustProxy,
    rateLimitStore: redis && redisRateLimitStores(redis.prefix, (args) => redis.client.sendCommand(args)),
  });
  const server = http.createServer(withLiveness(app, database.kind));
  gateway = new CollabGateway({ db: database.db, sessionParser: (app.locals as AppLocals).sessionParser, accessEvents, origins, store: designDocStore, relay });
  gateway.attach(server);
  notify = new NotifyGateway({ db: database.db, sessionParser: (app.locals as AppLocals).sessionParser, events: notificationEvents, origins, adapter: redis && createAdapter && createAdapter(redis.client, { streamName: `${redis.prefix}:socket.io`, channelPrefix: `${redis.prefix}:socket.io` }) });
  notify.attach(server);
  // The desk's live count, a namespace on the notification socket; it drops whoever loses the moderator role.
  moderation = new ModerationGateway({ io: notify.io, db: database.db, sessionParser: (app.locals as AppLocals).sessionParser, events: (app.locals as AppLocals).moderationEvents });
  // Live vote rankings, another namespace; votes past their closing time are closed (and members told) every minute.
  votes = new VoteGateway({ io: notify.io, db: database.db, sessionParser: (app.locals as AppLocals).sessionParser, votes: (app.locals as AppLocals).votes, accessEvents });
  const voteCloser = setInterval(() => void (app.locals as AppLocals).votes.closeDue().catch(console.error), 60_000);
  voteCloser.unref();
  const digests = setInterval(() => void sendDueDigests({ db: database.db, mailer, publicUrl: config.publicUrl, secret: sessionSecret }).catch(console.error), DIGEST_CHECK_MS);
  digests.unref();
  // Expired sessions are swept now and every hour (the store deletes none on its own).
  const sessionStore = new DatabaseSessionStore(database.db);
  const sweepSessions = () => void sessionStore.pruneExpired().catch(console.error);
  const sweeps = setInterval(sweepSessions, PRUNE_EVERY_MS);
  sweeps.unref();
  await new Promise<void>((resolve) => server.listen(config.port, config.host, resolve));
  sweepSessions();

  const ms = Math.round(performance.now() - started);
  log(`database: ${database.kind}${database.kind === 'pglite' ? ` in ${config.dataDir}${fresh ? ' (new)' : ''}` : ''}`);
  log(`photos: ${photoStorage.description}`);
  log(`instances: ${redis ? `several, sharing Redis at ${new URL(config.redisUrl!).host}` : 'one'}`);
  log(`mail: ${localSmtp ? `local fake SMTP on 127.0.0.1:${localSmtp.port}; messages at ${config.publicUrl}/mailbox` : 'SMTP_URL'}`);
  if (seeded) {
    log(`demo scenario seeded; every demo account's password is "${DEMO_PASSWORD}":`);
    for (const a of DEMO_ACCOUNTS) log(`  ${a.role.padEnd(9)} ${a.email}  (${a.displayName})`);
  }
  log(`ready in ${ms} ms at ${config.publicUrl}`);

  // Draining: readiness answers 503 at once; no new connection is accepted; sockets close with
  // "going away" (clients reconnect, to another instance); requests and updates in flight are
  // stored; then Redis and the database close. Past SHUTDOWN_DEADLINE_MS the process exits regardless.
  const stop = async (signal: string) => {
    if (lifecycle.draining) return;
    lifecycle.draining = true;
    log(`${signal}: draining`);
    setTimeout(() => {
      console.error(`[barwright] shutdown took longer than ${SHUTDOWN_DEADLINE_MS} ms; exiting`);
      process.exit(1);
    }, SHUTDOWN_DEADLINE_MS).unref();
    clearInterval(digests);
    clearInterval(sweeps);
    clearInterval(voteCloser);
    const httpClosed = closeHttpServer(server, HTTP_DRAIN_MS);
    notify?.io.engine.close(); // transports closed, so socket.io clients reconnect (a server-side disconnect would be final)
    await gateway?.drain(CLOSE_CODES.goingAway, 'server going away');
    moderation?.close();
    votes?.close();
    notify?.close();
    await gateway?.close();
    await httpClosed;
    await redis?.close();
    await compute.close();
    mailer.close();
    await localSmtp?.close();
    photoStorage.close?.();
    await database.close();
    log(`database closed (${database.kind})`);
    release();
    log(`lock on ${config.dataDir} released`);
    log('stopped');
    process.exit(0);
  };
  process.on('SIGINT', () => void stop('SIGINT'));
  process.on('SIGTERM', () => void stop('SIGTERM'));
}

main().catch((error) => {
  console.error(error instanceof DataDirBusyError || error.message?.startsWith('Invalid configuration') ? `[barwright] ${error.message}` : error);
  process.exit(1);
});
