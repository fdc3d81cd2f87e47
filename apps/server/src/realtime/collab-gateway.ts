import type { IncomingMessage, Server } from 'node:http';
import type { Duplex } from 'node:stream';
import type { RequestHandler, Response } from 'express';
import { WebSocketServer, type WebSocket, type RawData } from 'ws';
import * as Y from 'yjs';
import * as decoding from 'lib0/decoding';
import { CLOSE_CODES, type BoardRole } from '@barwright/contracts';
import { setPersistence, setupWSConnection } from '@y/websocket-server/utils';
import type { Db } from '../database/database';
import { boardRoleOf, type BoardAccessEvents } from '../boards/board-access';
import { findDesign } from '../designs/designs-service';
import { DesignDocStore } from './design-doc-store';

const MESSAGE_SYNC = 0;
const SYNC_STEP_2 = 1;
const SYNC_UPDATE = 2;

export const COLLAB_PATH = '/collab/';

interface Connection {
  ws: WebSocket;
  userId: string;
  boardId: string;
  designId: string;
  role: BoardRole;
}

export interface CollabGatewayDeps {
  db: Db;
  sessionParser: RequestHandler;
  accessEvents: BoardAccessEvents;
  log?: (error: unknown) => void;
  /** Stored rows per design above which the background compaction merges them. */
  compactAbove?: number;
}

/** The Yjs update a y-websocket message carries, if it carries one (sync step 2 or update). */
export function updateInMessage(message: Uint8Array): Uint8Array | undefined {
  const decoder = decoding.createDecoder(message);
  if (decoding.readVarUint(decoder) !== MESSAGE_SYNC) return undefined;
  const kind = decoding.readVarUint(decoder);
  return kind === SYNC_STEP_2 || kind === SYNC_UPDATE ? decoding.readVarUint8Array(decoder) : undefined;
}

/**
 * The realtime gateway: one Yjs document per bar design at `/collab/<designId>`, y-websocket protocol.
 * The session and the board role are checked at the HTTP upgrade (4401 / 4403). Each incoming
 * update is stored before the shared document applies and relays it; viewers' updates are dropped.
 */
export class CollabGateway {
  readonly store: DesignDocStore;
  private readonly wss = new WebSocketServer({ noServer: true });
  private readonly connections = new Set<Connection>();
  private readonly timer: NodeJS.Timeout;

  constructor(private readonly deps: CollabGatewayDeps) {
    this.store = new DesignDocStore(deps.db);
    const store = this.store;
    setPersistence({
      provider: store,
      bindState: async (designId: string, doc: Y.Doc) => {
        Y.applyUpdate(doc, await store.loadUpdate(designId), 'storage');
      },
      writeState: async (designId: string) => {
        await store.compact(designId).catch(this.log);
      },
    });
    deps.accessEvents.on('changed', ({ boardId, userId }) => void this.recheck(boardId, userId));
    this.timer = setInterval(() => void this.compactBusyDocs(), 60_000);
    this.timer.unref();
  }

  private log = (error: unknown) => (this.deps.log ?? console.error)(error);

  attach(server: Server): void {
    server.on('upgrade', (req, socket, head) => {
      if (!req.url?.startsWith(COLLAB_PATH)) return;
      void this.upgrade(req, socket, head).catch((error) => {
        this.log(error);
        socket.destroy();
      });
    });
  }

  private async upgrade(req: IncomingMessage, socket: Duplex, head: Buffer) {
    const designId = decodeURIComponent(req.url!.slice(COLLAB_PATH.length).split('?')[0]);
    const userId = await this.sessionUser(req);
    const refuse = (code: number, reason: string) =>
      this.wss.handleUpgrade(req, socket, head, (ws) => ws.close(code, reason));
    if (!userId) return refuse(CLOSE_CODES.unauthorized, 'sign in first');
    const design = await findDesign(this.deps.db, designId);
    const role = design ? await boardRoleOf(this.deps.db, design.boardId, userId) : undefined;
    if (!design || !role) return refuse(CLOSE_CODES.forbidden, 'not a member of this board');
    this.wss.handleUpgrade(req, socket, head, (ws) => this.connect(ws, req, { ws, userId, boardId: design.boardId, designId, role }));
  }

  private sessionUser(req: IncomingMessage): Promise<string | undefined> {
    return new Promise((resolve) => {
      const res = { getHeader: () => undefined, setHeader: () => res, end: () => res } as unknown as Response;
      this.deps.sessionParser(req as never, res, () => {
        const session = (req as unknown as { session?: { passport?: { user?: string } } }).session;
        resolve(session?.passport?.user);
      });
    });
  }

  private connect(ws: WebSocket, req: IncomingMessage, conn: Connection) {
    this.connections.add(conn);
    ws.on('close', () => this.connections.delete(conn));
    // y-websocket registers its own 'message' listener; ours runs first, stores the update, then hands it on in order.
    const original = ws.on.bind(ws);
    let relay: ((data: RawData) => void) | undefined;
    (ws as unknown as { on: typeof ws.on }).on = ((event: string, listener: (...args: unknown[]) => void) =>
      event === 'message' ? ((relay = listener as never), ws) : original(event as never, listener as never)) as typeof ws.on;
    setupWSConnection(ws, req, { docName: conn.designId });
    ws.on = original as typeof ws.on;
    let queue = Promise.resolve();
    original('message', (data: RawData) => {
      queue = queue.then(() => this.receive(conn, data, relay)).catch(this.log);
    });
  }

  private async receive(conn: Connection, data: RawData, relay?: (data: RawData) => void) {
    const bytes = new Uint8Array(data as ArrayBuffer);
    const update = updateInMessage(bytes);
    if (update) {
      if (conn.role === 'viewer') return; // read-only: never applied, never stored
      if (update.length > 2) await this.store.append(conn.designId, update);
    }
    relay?.(data);
  }

  private async recheck(boardId: string, userId?: string) {
    for (const conn of this.connections) {
      if (conn.boardId !== boardId || (userId && conn.userId !== userId)) continue;
      const role = await boardRoleOf(this.deps.db, boardId, conn.userId);
      if (!role) conn.ws.close(CLOSE_CODES.forbidden, 'no longer a member of this board');
      else if (role !== conn.role) {
        conn.role = role; // writes are judged by the new role at once, even before the client reconnects
        conn.ws.close(CLOSE_CODES.roleChanged, 'your role on this board changed');
      }
    }
  }

  /** Closes every socket of a design (deleted) or of a user (suspended). */
  closeWhere(match: (c: { designId: string; userId: string; boardId: string }) => boolean, code: number, reason: string) {
    for (const conn of this.connections) if (match(conn)) conn.ws.close(code, reason);
  }

  private async compactBusyDocs() {
    const ids = await this.store.designsToCompact(this.deps.compactAbove ?? 500).catch(() => []);
    for (const id of ids) await this.store.compact(id).catch(this.log);
  }

  async close(): Promise<void> {
    clearInterval(this.timer);
    for (const conn of this.connections) conn.ws.terminate();
    await new Promise<void>((resolve) => this.wss.close(() => resolve()));
  }
}
