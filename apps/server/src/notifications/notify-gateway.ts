import type { Server as HttpServer, IncomingMessage } from 'node:http';
import type { RequestHandler, Response } from 'express';
import { Server } from 'socket.io';
import { NOTIFY_REFUSALS, NOTIFY_SOCKET_PATH, userRoom, type NotifyClientEvents, type NotifyServerEvents } from '@barwright/contracts';
import type { Db } from '../database/database';
import { findUserById } from '../auth/users';
import type { NotificationEvents } from './notification-events';
import { unreadCount } from './notifier';

export interface NotifyGatewayDeps {
  db: Db;
  sessionParser: RequestHandler;
  events: NotificationEvents;
  log?: (error: unknown) => void;
}

/** The signed-in user of a handshake request, read with the app's own session parser (the moderation socket uses it too). */
export function sessionUser(parser: RequestHandler, req: IncomingMessage): Promise<string | undefined> {
  return new Promise((resolve) => {
    const res = { getHeader: () => undefined, setHeader: () => res, end: () => res } as unknown as Response;
    parser(req as never, res, () => resolve((req as unknown as { session?: { passport?: { user?: string } } }).session?.passport?.user));
  });
}

/**
 * Live notifications over socket.io at /socket.io. The session is checked at the handshake (no
 * signed-in, unsuspended session: refused); each socket joins its user's room only, and the
 * notification events are emitted to that room.
 */
export class NotifyGateway {
  readonly io: Server<NotifyClientEvents, NotifyServerEvents>;

  constructor(private readonly deps: NotifyGatewayDeps) {
    // destroyUpgrade off: other WebSocket upgrades on this server (the Yjs gateway at /collab/) are not ours to end.
    this.io = new Server({ path: NOTIFY_SOCKET_PATH, serveClient: false, destroyUpgrade: false });
    this.io.use((socket, next) => {
      void this.authenticate(socket.request)
        .then((userId) => {
          if (!userId) return next(new Error(NOTIFY_REFUSALS.unauthorized));
          socket.data.userId = userId;
          next();
        })
        .catch((error) => {
          this.log(error);
          next(new Error(NOTIFY_REFUSALS.unauthorized));
        });
    });
    this.io.on('connection', (socket) => {
      const userId = socket.data.userId as string;
      void socket.join(userRoom(userId));
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

  /** Ends the sockets of a user (suspended, signed out everywhere). */
  disconnectUser(userId: string): void {
    this.io.in(userRoom(userId)).disconnectSockets(true);
  }

  /** Ends every socket; the HTTP server itself is main.ts's to close (io.close() would close it too). */
  close(): void {
    this.deps.events.removeAllListeners();
    this.io.disconnectSockets(true);
    this.io.engine.close();
  }
}
