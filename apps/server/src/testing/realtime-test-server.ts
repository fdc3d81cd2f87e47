import http from 'node:http';
import type { AddressInfo } from 'node:net';
import WebSocket from 'ws';
import { io as connectIo, type Socket } from 'socket.io-client';
import { CLOSE_CODES, MODERATION_NAMESPACE } from '@barwright/contracts';
import type { AppDeps, AppLocals } from '../app';
import { BoardAccessEvents } from '../boards/board-access';
import { ModerationGateway } from '../moderation/moderation-gateway';
import { NotificationEvents } from '../notifications/notification-events';
import { NotifyGateway } from '../notifications/notify-gateway';
import { allowedOrigins } from '../realtime/allowed-origins';
import { CollabGateway } from '../realtime/collab-gateway';
import type { RealtimeLimits } from '../realtime/realtime-limits';
import { startTestServer, type TestServer } from './test-app';
import type { TestDatabase } from './test-database';

/** The test app's public URL; its origin is the one the realtime sockets accept. */
export const TEST_ORIGIN = 'http://localhost:3000';

/** The app listening on a port with the three realtime gateways wired as main.ts wires them. */
export async function startRealtimeTestServer(database: TestDatabase, options: { limits?: Partial<RealtimeLimits>; overrides?: Partial<AppDeps> } = {}) {
  const accessEvents = new BoardAccessEvents();
  const notificationEvents = new NotificationEvents();
  const origins = allowedOrigins(TEST_ORIGIN);
  const gateways = {} as { collab: CollabGateway; notify: NotifyGateway; moderation: ModerationGateway };
  const server: TestServer = await startTestServer(database, {
    accessEvents,
    notificationEvents,
    closeDesignSockets: (designId) => gateways.collab.closeWhere((c) => c.designId === designId, CLOSE_CODES.forbidden, 'design deleted'),
    closeUserSockets: (userId) => {
      gateways.collab.closeWhere((c) => c.userId === userId, CLOSE_CODES.unauthorized, 'signed out');
      gateways.notify.disconnectUser(userId);
      gateways.moderation.disconnectUser(userId);
    },
    closeSessionSockets: (sessionId) => {
      gateways.collab.closeWhere((c) => c.sessionId === sessionId, CLOSE_CODES.unauthorized, 'signed out');
      gateways.notify.disconnectSession(sessionId);
      gateways.moderation.disconnectSession(sessionId);
    },
    ...options.overrides,
  });
  const locals = server.app.locals as AppLocals;
  const httpServer = http.createServer(server.app);
  gateways.collab = new CollabGateway({ db: database.db, sessionParser: locals.sessionParser, accessEvents, origins, limits: options.limits, log: () => {} });
  gateways.notify = new NotifyGateway({ db: database.db, sessionParser: locals.sessionParser, events: locals.notificationEvents, origins, limits: options.limits, log: () => {} });
  gateways.moderation = new ModerationGateway({ io: gateways.notify.io as never, db: database.db, sessionParser: locals.sessionParser, events: locals.moderationEvents, limits: options.limits, log: () => {} });
  gateways.collab.attach(httpServer);
  gateways.notify.attach(httpServer);
  await new Promise<void>((r) => httpServer.listen(0, '127.0.0.1', r));
  const baseUrl = `http://127.0.0.1:${(httpServer.address() as AddressInfo).port}`;
  return {
    ...server,
    ...gateways,
    baseUrl,
    async close() {
      await gateways.collab.close();
      gateways.moderation.close();
      gateways.notify.close();
      httpServer.closeAllConnections();
      await new Promise((r) => httpServer.close(r));
      await server.close();
    },
  };
}

/** A raw WebSocket to /collab/<designId>; resolves once open, or with the HTTP status of a refused upgrade. */
export function rawCollabSocket(baseUrl: string, designId: string, headers: Record<string, string>): Promise<WebSocket | number> {
  return new Promise((resolve, reject) => {
    const ws = new WebSocket(`${baseUrl.replace(/^http/, 'ws')}/collab/${designId}`, { headers });
    ws.once('open', () => resolve(ws));
    ws.once('unexpected-response', (_req, res) => resolve(res.statusCode ?? 0));
    ws.once('error', reject);
  });
}

/** The close code and reason of a socket, once it closes. */
export const closeOf = (ws: WebSocket) => new Promise<{ code: number; reason: string }>((r) => ws.once('close', (code, reason) => r({ code, reason: reason.toString() })));

/** A socket.io client of the notification socket (or the desk's namespace) that reports whether it got in. */
export function ioClient(baseUrl: string, headers: Record<string, string>, namespace = '/'): Promise<{ socket: Socket; outcome: string }> {
  const socket = connectIo(baseUrl + (namespace === '/' ? '' : namespace), { transports: ['websocket'], extraHeaders: headers, reconnection: false, forceNew: true });
  return new Promise((resolve) => {
    socket.once('connect', () => resolve({ socket, outcome: 'connected' }));
    socket.once('connect_error', (e) => resolve({ socket, outcome: e.message }));
  });
}

export { MODERATION_NAMESPACE };
