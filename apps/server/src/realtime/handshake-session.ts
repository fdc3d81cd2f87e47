import type { IncomingMessage } from 'node:http';
import type { RequestHandler, Response } from 'express';
import type { RealtimeLimits } from './realtime-limits';

/* What the three realtime gateways (collab, notifications, the desk) read from a handshake request. */

/** The room of the sockets opened with one HTTP session (signing out ends them on every instance). */
export const sessionRoom = (sessionId: string) => `session:${sessionId}`;

/** The signed-in user of a handshake request, read with the app's own session parser (every realtime gateway uses it). */
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
