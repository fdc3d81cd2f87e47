import type { Server as HttpServer, IncomingMessage } from 'node:http';
import type { RequestHandler } from 'express';
import { Server, type ServerOptions } from 'socket.io';
import { NOTIFY_REFUSALS, NOTIFY_SOCKET_PATH, userRoom, type NotifyClientEvents, type NotifyServerEvents } from '@barwright/contracts';
import type { Db } from '../database/database';
import { findUserById } from '../auth/users';
import type { NotificationEvents } from './notification-events';
import { unreadCount } from './notifier';
import { originAllowed } from '../realtime/allowed-origins';
import { overSocketCap, sessionIdOf, sessionRoom, sessionUser, TOO_MANY_SOCKETS } from '../realtime/handshake-session';
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
