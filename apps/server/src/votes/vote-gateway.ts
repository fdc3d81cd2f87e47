import type { RequestHandler } from 'express';
import type { Namespace, Server, Socket } from 'socket.io';
import { userRoom, VOTE_REFUSALS, type RankedDesign, VOTES_NAMESPACE, type VoteClientEvents, type VoteServerEvents } from '@barwright/contracts';
import type { Db } from '../database/database';
import { findUserById } from '../auth/users';
import { eq } from 'drizzle-orm';
import { votes as voteTable } from '../../../../db/schema';
import { boardRoleOf, type BoardAccessEvents } from '../boards/board-access';
import { isUuid } from '../http/uuid';
import { overSocketCap, sessionIdOf, sessionRoom, sessionUser, TOO_MANY_SOCKETS } from '../realtime/handshake-session';
import { DEFAULT_REALTIME_LIMITS, type RealtimeLimits } from '../realtime/realtime-limits';
import { requireVote, type VotesService } from './votes-service';

/** Votes one socket may watch at once: a ranking page watches one, a board page a few. */
export const MAX_WATCHED_VOTES = 8;
export const MAX_VOTE_MESSAGES_PER_MINUTE = 60;
export const voteRoom = (voteId: string) => `vote:${voteId}`;

export interface VoteGatewayDeps {
  /** The notification socket's server (NotifyGateway.io): votes are a namespace on it. */
  io: Server;
  db: Db;
  sessionParser: RequestHandler;
  /** The app's votes (app.locals.votes): its events feed the rooms, its reads answer a watch. */
  votes: VotesService;
  accessEvents: BoardAccessEvents;
  limits?: Partial<RealtimeLimits>;
  log?: (error: unknown) => void;
}

type VoteSocket = Socket<VoteClientEvents, VoteServerEvents>;

/**
 * Live rankings on the namespace VOTES_NAMESPACE. The handshake lets in signed-in, unsuspended
 * members; every `vote:watch` is checked against the vote's board (members only) before the socket
 * joins the vote's room, and a member who leaves the board is taken out of its votes' rooms at once.
 */
export class VoteGateway {
  readonly namespace: Namespace<VoteClientEvents, VoteServerEvents>;
  private readonly onRanking = (update: { voteId: string; ranking: RankedDesign[]; answers: number; closed: boolean }) =>
    this.namespace.to(voteRoom(update.voteId)).emit('vote:ranking', { voteId: update.voteId, ranking: update.ranking, answers: update.answers, closed: update.closed });
  private readonly onAccess = ({ boardId, userId }: { boardId: string; userId?: string }) => void this.recheck(boardId, userId).catch(this.log);

  constructor(private readonly deps: VoteGatewayDeps) {
    this.namespace = deps.io.of(VOTES_NAMESPACE);
    const limits = { ...DEFAULT_REALTIME_LIMITS, ...deps.limits };
    this.namespace.use((socket, next) => {
      void this.admit(socket.request as never)
        .then((userId) => {
          if (!userId) return next(new Error(VOTE_REFUSALS.unauthorized));
          const sessionId = sessionIdOf(socket.request);
          if (overSocketCap(this.namespace.sockets.values(), { userId, sessionId }, limits)) return next(new Error(TOO_MANY_SOCKETS));
          socket.data.userId = userId;
          socket.data.sessionId = sessionId;
          socket.data.votes = new Map<string, string>(); // vote id → board id
          next();
        })
        .catch((error) => {
          this.log(error);
          next(new Error(VOTE_REFUSALS.unauthorized));
        });
    });
    this.namespace.on('connection', (socket) => {
      void socket.join(userRoom(socket.data.userId as string));
      if (socket.data.sessionId) void socket.join(sessionRoom(socket.data.sessionId as string));
      let messages = 0;
      const window = setInterval(() => (messages = 0), 60_000);
      window.unref();
      socket.on('disconnect', () => clearInterval(window));
      socket.onAny((event: string, voteId: unknown) => {
        // Each watch reads the session and the board: a socket that floods them is dropped.
        if (++messages > MAX_VOTE_MESSAGES_PER_MINUTE) socket.disconnect(true);
        else if (event === 'vote:watch') void this.watch(socket, voteId).catch(this.log);
        else if (event === 'vote:unwatch' && typeof voteId === 'string') this.unwatch(socket, voteId);
        else socket.disconnect(true); // nothing else is spoken here
      });
    });
    deps.votes.events.on('ranking', this.onRanking);
    deps.accessEvents.on('changed', this.onAccess);
  }

  private log = (error: unknown) => (this.deps.log ?? console.error)(error);

  private async admit(req: Parameters<typeof sessionUser>[1]): Promise<string | undefined> {
    const userId = await sessionUser(this.deps.sessionParser, req);
    const user = userId ? await findUserById(this.deps.db, userId) : undefined;
    return user && !user.suspendedAt ? user.id : undefined;
  }

  /** Checked on every message: the account is still active and a member of the vote's board. */
  private async watch(socket: VoteSocket, voteId: unknown) {
    const userId = socket.data.userId as string;
    const watched = socket.data.votes as Map<string, string>;
    const id = typeof voteId === 'string' ? voteId : '';
    const refuse = () => void socket.emit('vote:refused', { voteId: id.slice(0, 64), reason: VOTE_REFUSALS.notFound });
    if (!isUuid(id) || (!watched.has(id) && watched.size >= MAX_WATCHED_VOTES)) return refuse();
    if (!(await this.admit(socket.request as never))) return void socket.disconnect(true);
    try {
      const { vote } = await requireVote(this.deps.db, id, userId);
      watched.set(vote.id, vote.boardId);
      await socket.join(voteRoom(vote.id));
      const detail = await this.deps.votes.detail(vote.id, userId);
      socket.emit('vote:ranking', { voteId: vote.id, ranking: detail.ranking, answers: detail.answers, closed: detail.closed });
    } catch {
      refuse();
    }
  }

  private unwatch(socket: VoteSocket, voteId: string) {
    (socket.data.votes as Map<string, string>).delete(voteId);
    void socket.leave(voteRoom(voteId));
  }

  /**
   * A role changed or ended on a board. A member who is no longer on it leaves the rooms of its votes on
   * every instance (socketsLeave goes through the adapter); this instance's sockets also forget them.
   */
  private async recheck(boardId: string, userId?: string) {
    if (userId && !(await boardRoleOf(this.deps.db, boardId, userId))) {
      const onBoard = await this.deps.db.select({ id: voteTable.id }).from(voteTable).where(eq(voteTable.boardId, boardId));
      if (onBoard.length) this.namespace.in(userRoom(userId)).socketsLeave(onBoard.map((v) => voteRoom(v.id)));
    }
    for (const socket of this.namespace.sockets.values()) {
      if (userId && socket.data.userId !== userId) continue;
      const watched = socket.data.votes as Map<string, string>;
      for (const [voteId, votesBoard] of watched) {
        if (votesBoard !== boardId) continue;
        const still = await requireVote(this.deps.db, voteId, socket.data.userId as string).then(() => true, () => false);
        if (!still) this.unwatch(socket, voteId);
      }
    }
  }

  disconnectUser(userId: string): void {
    this.namespace.in(userRoom(userId)).disconnectSockets(true);
  }

  disconnectSession(sessionId: string): void {
    this.namespace.in(sessionRoom(sessionId)).disconnectSockets(true);
  }

  close(): void {
    this.deps.votes.events.off('ranking', this.onRanking);
    this.deps.accessEvents.off('changed', this.onAccess);
    this.namespace.disconnectSockets(true);
  }
}
