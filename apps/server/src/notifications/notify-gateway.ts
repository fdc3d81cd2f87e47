import type { Server as HttpServer, IncomingMessage } from 'node:http';
import type { RequestHandler, Response } from 'express';
import { Server, type ServerOptions } from 'socket.io';
import { NOTIFY_REFUSALS, NOTIFY_SOCKET_PATH, userRoom, type NotifyClientEvents, type NotifyServerEvents } from '@barwright/contracts';
import type { Db } from '../database/database';
import { findUserById } from '../auth/users';
import type { NotificationEvents } from './notification-events';
import { unreadCount } from './notifier';
import { originAllowed } from '../realtime/allowed-origins';
import { DEFAULT_REALTIME_LIMITS, type RealtimeLimits } from '../realtime/realtime-limits';

export interface NotifyGatewayDeps {
  db: Db;
  sessionParser: RequestHandler;
  events: NotificationEvents;
  /** Origins a browser may connect from (allowedOrigins()); others are refused. Omitted: no Origin check. */
  origins?: ReadonlySet<string>;
  limits?: Partial<RealtimeLimits>;
  log?: (error: unknown) => void;
  /** Several instances: the Redis adapter, so rooms (a user's, a session's) and disconnections reach every instance. */
  adapter?: ServerOptions['adapter'];
}

/** The room of the sockets opened with one HTTP session (signing out ends them on every instance). */
export const sessionRoom = (sessionId: string) => `session:${sessionId}`;

/** The signed-in user of a handshake request, read with the app's own session parser (the moderation socket uses it too). */
export function sessionUser(parser: RequestHandler, req: IncomingMessage): Promise<string | undefined> {
  return new Promise((resolve) => {
    const res = { getHeader: () => undefined, setHeader: () => res, end: () => res } as unknown as Response;
    parser(req as never, res, () => resolve((req as unknown as { session?: { passport?: { user?: string } } }).session?.passport?.user));
  });
}

/** The session id of a handshake request (after sessionUser has run the parser on it). */
export const sessionIdOf = (req: IncomingMessage): string | undefined => (req as unknown as { sessionID?: string }).sessionID;

/**
 * Why a namespace refuses one more socket of this session or user, or undefined. Sockets carry
 * `data.userId` and `data.sessionId`.
 */
export function overSocketCap(
  sockets: Iterable<{ data: { userId?: string; sessionId?: string } }>,
  who: { userId: string; sessionId?: string },
  limits: Pick<RealtimeLimits, 'notifySocketsPerSession' | 'notifySocketsPerUser'>,
): boolean {
  let bySession = 0;
  let byUser = 0;
  for (const s of sockets) {
    if (s.data.userId === who.userId) byUser++;
    if (who.sessionId && s.data.sessionId === who.sessionId) bySession++;
  }
  return bySession >= limits.notifySocketsPerSession || byUser >= limits.notifySocketsPerUser;
}

/** The refusal a client reads when its session has too many sockets open. */
export const TOO_MANY_SOCKETS = 'too many sockets';

/**
 * Live notifications over socket.io at /socket.io. The session is checked at the handshake (no
 * signed-in, unsuspended session: refused); each socket joins its user's room only, and the
 * notification events are emitted to that room.
 */
export class NotifyGateway {
  readonly io: Server<NotifyClientEvents, NotifyServerEvents>;
  readonly limits: RealtimeLimits;

  constructor(private readonly deps: NotifyGatewayDeps) {
    // destroyUpgrade off: other WebSocket upgrades on this server (the Yjs gateway at /collab/) are not ours to end.
    this.limits = { ...DEFAULT_REALTIME_LIMITS, ...deps.limits };
    const origins = deps.origins;
    this.io = new Server({
      path: NOTIFY_SOCKET_PATH,
      serveClient: false,
      destroyUpgrade: false,
      maxHttpBufferSize: this.limits.notifyMaxMessageBytes,
      allowRequest: (req, callback) => callback(null, !origins || originAllowed(req, origins)),
      ...(deps.adapter ? { adapter: deps.adapter } : {}),
    });
    this.io.use((socket, next) => {
      void this.authenticate(socket.request)
        .then((userId) => {
          if (!userId) return next(new Error(NOTIFY_REFUSALS.unauthorized));
          const sessionId = sessionIdOf(socket.request);
          if (overSocketCap(this.io.sockets.sockets.values(), { userId, sessionId }, this.limits)) return next(new Error(TOO_MANY_SOCKETS));
          socket.data.userId = userId;
          socket.data.sessionId = sessionId;
          next();
        })
        .catch((error) => {
          this.log(error);
          next(new Error(NOTIFY_REFUSALS.unauthorized));
        });
    });
    this.io.on('connection', (socket) => {
      const userId = socket.data.userId as string;
      // Clients send nothing here (reading is done through REST): one that does is dropped.
      socket.onAny(() => socket.disconnect(true));
      void socket.join(userRoom(userId));
      if (socket.data.sessionId) void socket.join(sessionRoom(socket.data.sessionId));
      void unreadCount(deps.db, userId).then((n) => socket.emit('notification:unread', n), this.log);
    });
    deps.events.on('created', ({ userId, notification, unread }) => this.io.to(userRoom(userId)).emit('notification:new', notification, unread));
    deps.events.on('unread', ({ userId, unread }) => this.io.to(userRoom(userId)).emit('notification:unread', unread));
  }

  private log = (error: unknown) => (this.deps.log ?? console.error)(error);

  private async authenticate(req: IncomingMessage): Promise<string | undefined> {
    const userId = await sessionUser(this.deps.sessionParser, req);
    const user = userId ? await findUserById(this.deps.db, userId) : undefined;
    return user && !user.suspendedAt ? user.id : undefined;
  }

  attach(server: HttpServer): void {
    this.io.attach(server);
  }

  /** Ends the sockets of a user (suspended, password reset). */
  disconnectUser(userId: string): void {
    this.io.in(userRoom(userId)).disconnectSockets(true);
  }

  /** Ends the sockets opened with one session (signed out). */
  disconnectSession(sessionId: string): void {
    this.io.in(sessionRoom(sessionId)).disconnectSockets(true);
  }

  /** Ends every socket; the HTTP server itself is main.ts's to close (io.close() would close it too). */
  close(): void {
    this.deps.events.removeAllListeners();
    this.io.disconnectSockets(true);
    this.io.engine.close();
  }
}
