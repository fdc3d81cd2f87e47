import type { RequestHandler } from 'express';
import type { Namespace, Server } from 'socket.io';
import { MODERATION_NAMESPACE, MODERATION_REFUSALS, userRoom, type ModerationClientEvents, type ModerationServerEvents } from '@barwright/contracts';
import type { Db } from '../database/database';
import { findUserById } from '../auth/users';
import { overSocketCap, sessionIdOf, sessionRoom, sessionUser, TOO_MANY_SOCKETS } from '../realtime/handshake-session';
import { DEFAULT_REALTIME_LIMITS, type RealtimeLimits } from '../realtime/realtime-limits';
import type { ModerationEvents } from './moderation-events';
import { isModerator } from './moderation-rules';
import { openReportCount } from './reports-service';

export interface ModerationGatewayDeps {
  /** The notification socket's server (NotifyGateway.io): the desk's socket is a namespace on it. */
  io: Server;
  db: Db;
  sessionParser: RequestHandler;
  events: ModerationEvents;
  limits?: Partial<RealtimeLimits>;
  log?: (error: unknown) => void;
}

/**
 * The desk's live count of open reports, on the socket.io namespace MODERATION_NAMESPACE. The
 * handshake lets in signed-in, unsuspended moderators and admins only; when an account loses the
 * role or is suspended, its sockets here end at once (the HTTP routes refuse it on its next request).
 */
export class ModerationGateway {
  readonly namespace: Namespace<ModerationClientEvents, ModerationServerEvents>;
  private readonly onQueue = ({ openReports }: { openReports: number }) => this.namespace.emit('moderation:queue', openReports);
  private readonly onAccount = ({ userId, role, suspended }: { userId: string; role: 'member' | 'moderator' | 'admin'; suspended: boolean }) => {
    if (suspended || !isModerator({ role })) this.disconnectUser(userId);
  };

  constructor(private readonly deps: ModerationGatewayDeps) {
    this.namespace = deps.io.of(MODERATION_NAMESPACE);
    const limits = { ...DEFAULT_REALTIME_LIMITS, ...deps.limits };
    this.namespace.use((socket, next) => {
      void this.admit(socket.request as never)
        .then((refusal) => {
          if (typeof refusal === 'string') return next(new Error(refusal));
          const sessionId = sessionIdOf(socket.request);
          if (overSocketCap(this.namespace.sockets.values(), { userId: refusal.userId, sessionId }, limits)) {
            return next(new Error(TOO_MANY_SOCKETS));
          }
          socket.data.userId = refusal.userId;
          socket.data.sessionId = sessionId;
          next();
        })
        .catch((error) => {
          this.log(error);
          next(new Error(MODERATION_REFUSALS.unauthorized));
        });
    });
    this.namespace.on('connection', (socket) => {
      socket.onAny(() => socket.disconnect(true)); // clients send nothing on the desk's socket either
      void socket.join(userRoom(socket.data.userId as string));
      if (socket.data.sessionId) void socket.join(sessionRoom(socket.data.sessionId as string));
      void openReportCount(deps.db).then((n) => socket.emit('moderation:queue', n), this.log);
    });
    deps.events.on('queue', this.onQueue);
    deps.events.on('account', this.onAccount);
  }

  private log = (error: unknown) => (this.deps.log ?? console.error)(error);

  private async admit(req: Parameters<typeof sessionUser>[1]): Promise<{ userId: string } | string> {
    const userId = await sessionUser(this.deps.sessionParser, req);
    const user = userId ? await findUserById(this.deps.db, userId) : undefined;
    if (!user || user.suspendedAt) return MODERATION_REFUSALS.unauthorized;
    return isModerator(user) ? { userId: user.id } : MODERATION_REFUSALS.forbidden;
  }

  disconnectUser(userId: string): void {
    this.namespace.in(userRoom(userId)).disconnectSockets(true);
  }

  /** Ends the desk sockets opened with one session (signed out). */
  disconnectSession(sessionId: string): void {
    this.namespace.in(sessionRoom(sessionId)).disconnectSockets(true);
  }

  close(): void {
    this.deps.events.off('queue', this.onQueue);
    this.deps.events.off('account', this.onAccount);
    this.namespace.disconnectSockets(true);
  }
}
