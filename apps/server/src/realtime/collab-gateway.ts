import type { IncomingMessage, Server } from 'node:http';
import type { Duplex } from 'node:stream';
import type { RequestHandler } from 'express';
import { WebSocketServer, type WebSocket, type RawData } from 'ws';
import * as Y from 'yjs';
import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import * as syncProtocol from 'y-protocols/sync';
import { CLOSE_CODES, type BoardRole } from '@barwright/contracts';
import { docs, setPersistence, setupWSConnection, type WSSharedDoc } from '@y/websocket-server/utils';
import type { Db } from '../database/database';
import { findUserById } from '../auth/users';
import { boardRoleOf, type BoardAccessEvents } from '../boards/board-access';
import { findDesign } from '../designs/designs-service';
import { originAllowed } from './allowed-origins';
import { DesignDocStore } from './design-doc-store';
import type { CloseMatch, ControlMessage, RedisRelay } from './redis-relay';
import { CLIENT_IDS_PER_SOCKET, stampPresence } from './presence-stamp';
import { sessionIdOf, sessionUser } from './handshake-session';
import { AccountBuckets, DEFAULT_REALTIME_LIMITS, type RealtimeLimits, type TokenBucket } from './realtime-limits';
import { MISSING_EDITS, UpdateCheck } from './update-check';

const MESSAGE_SYNC = 0;
const MESSAGE_AWARENESS = 1;
const SYNC_STEP_1 = 0;
const SYNC_STEP_2 = 1;
const SYNC_UPDATE = 2;

export const COLLAB_PATH = '/collab/';

interface Connection {
  ws: WebSocket;
  userId: string;
  /** The HTTP session the socket was opened with: signing out closes it. */
  sessionId: string;
  displayName: string;
  boardId: string;
  designId: string;
  role: BoardRole;
  updates: TokenBucket;
  awareness: TokenBucket;
  /** The Yjs client ids whose presence this socket speaks for. */
  clientIds: Set<number>;
  /** The server has asked this client for the edits an update of its built on (a sync step 1) and awaits its answer. */
  askedForMissing: boolean;
  /** How often it has asked on this socket (past MAX_ASKS the socket is closed: each ask rebuilt the check's shadow). */
  asks: number;
}

/**
 * Asks for missing edits one socket may need: an honest client needs one a reconnection. Each ask follows
 * a refused check, which rebuilds the shadow from the whole document (tens of ms on the largest design),
 * so past this the socket is closed as rate-limited (the client reconnects and syncs afresh).
 */
const MAX_ASKS = 4;

export interface CollabGatewayDeps {
  db: Db;
  sessionParser: RequestHandler;
  accessEvents: BoardAccessEvents;
  /** Origins a browser may connect from (allowedOrigins()); others get 403. Omitted: no Origin check (benchmarks). */
  origins?: ReadonlySet<string>;
  limits?: Partial<RealtimeLimits>;
  log?: (error: unknown) => void;
  /** Stored rows per design above which the background compaction merges them. */
  compactAbove?: number;
  /** The store shared with the app (its append listener feeds the relay); omitted: one of the gateway's own. */
  store?: DesignDocStore;
  /** Several instances: updates, presence, role changes and closings cross to the others through Redis. */
  relay?: RedisRelay;
}

/**
 * What a y-websocket message carries: a sync step 1, an update (`answer`: a sync step 2, the client's
 * answer to the server's step 1; otherwise an edit as it is made), presence, or something else.
 */
export function readMessage(message: Uint8Array):
  | { kind: 'step1' }
  | { kind: 'update'; update: Uint8Array; answer: boolean }
  | { kind: 'awareness'; update: Uint8Array }
  | { kind: 'other' } {
  const decoder = decoding.createDecoder(message);
  const type = decoding.readVarUint(decoder);
  if (type === MESSAGE_AWARENESS) return { kind: 'awareness', update: decoding.readVarUint8Array(decoder) };
  if (type !== MESSAGE_SYNC) return { kind: 'other' };
  const step = decoding.readVarUint(decoder);
  if (step === SYNC_STEP_1) return { kind: 'step1' };
  if (step === SYNC_STEP_2 || step === SYNC_UPDATE) return { kind: 'update', update: decoding.readVarUint8Array(decoder), answer: step === SYNC_STEP_2 };
  return { kind: 'other' };
}

/** The server's sync step 1 for `doc`: the client answers with everything it has that `doc` lacks. */
const step1Message = (doc: Y.Doc) => {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_SYNC);
  syncProtocol.writeSyncStep1(encoder, doc);
  return encoding.toUint8Array(encoder);
};

const awarenessMessage = (update: Uint8Array) => {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, MESSAGE_AWARENESS);
  encoding.writeVarUint8Array(encoder, update);
  return encoding.toUint8Array(encoder);
};

/**
 * The realtime gateway: one Yjs document per bar design at `/collab/<designId>`, y-websocket protocol.
 * The Origin, the session and the board role are checked at the HTTP upgrade (403 / 4401 / 4403).
 * Each incoming update is tried on a shadow of the document, then stored, and only then handed to
 * the shared document that applies and relays it; viewers' updates are dropped; presence is stamped
 * with the socket's account. Limits (frame size, rates, sockets, slow consumers): realtime-limits.ts.
 */
export class CollabGateway {
  readonly store: DesignDocStore;
  private readonly limits: RealtimeLimits;
  private readonly buckets: AccountBuckets;
  private readonly wss: WebSocketServer;
  private readonly connections = new Set<Connection>();
  private readonly checks = new WeakMap<Y.Doc, UpdateCheck>();
  private readonly timer: NodeJS.Timeout;
  /** Each socket's messages, handled one after another (stored, then applied); drain() waits for the last. */
  private readonly received = new WeakMap<Connection, Promise<void>>();

  constructor(private readonly deps: CollabGatewayDeps) {
    this.limits = { ...DEFAULT_REALTIME_LIMITS, ...deps.limits };
    this.buckets = new AccountBuckets(this.limits);
    this.wss = new WebSocketServer({ noServer: true, maxPayload: this.limits.maxFrameBytes });
    this.store = deps.store ?? new DesignDocStore(deps.db, (message) => this.log(new Error(message)));
    const store = this.store;
    const relay = deps.relay;
    setPersistence({
      provider: store,
      // The library calls this without awaiting or catching: every error is handled here.
      bindState: (designId: string, doc: WSSharedDoc) => {
        const loaded = (async () => {
          await relay?.follow(designId, doc); // subscribed before the load, so no update falls between
          const { update, lastSeq } = await store.loadAfter(designId, 0);
          Y.applyUpdate(doc, update, 'storage');
          relay?.loaded(designId, doc, lastSeq);
          this.checks.set(doc, new UpdateCheck(doc, this.limits));
        })();
        doc.whenInitialized = loaded;
        loaded.catch((error) => {
          this.log(error);
          for (const ws of doc.conns.keys()) (ws as WebSocket).close(1011, 'the design could not be loaded');
        });
      },
      writeState: async (designId: string, doc: WSSharedDoc) => {
        await relay?.unfollow(designId, doc);
        this.checks.get(doc)?.dispose();
        await store.compact(designId).catch(this.log);
      },
    });
    deps.accessEvents.on('changed', ({ boardId, userId }) => {
      relay?.publishControl({ kind: 'access', boardId, userId });
      void this.recheck(boardId, userId).catch(this.log);
    });
    void relay?.onControl((message) => this.control(message)).catch(this.log);
    this.timer = setInterval(() => void this.compactBusyDocs(), 60_000);
    this.timer.unref();
  }

  private log = (error: unknown) => (this.deps.log ?? console.error)(error);

  attach(server: Server): void {
    server.on('upgrade', (req, socket, head) => {
      if (!req.url?.startsWith(COLLAB_PATH)) return;
      if (this.deps.origins && !originAllowed(req, this.deps.origins)) {
        socket.end('HTTP/1.1 403 Forbidden\r\nConnection: close\r\nContent-Length: 0\r\n\r\n');
        return;
      }
      void this.upgrade(req, socket, head).catch((error) => {
        this.log(error);
        socket.destroy();
      });
    });
  }

  private async upgrade(req: IncomingMessage, socket: Duplex, head: Buffer) {
    const designId = decodeURIComponent(req.url!.slice(COLLAB_PATH.length).split('?')[0]);
    const session = await this.sessionOf(req);
    const refuse = (code: number, reason: string) =>
      this.wss.handleUpgrade(req, socket, head, (ws) => ws.close(code, reason));
    const user = session && (await findUserById(this.deps.db, session.userId));
    if (!session || !user || user.suspendedAt) return refuse(CLOSE_CODES.unauthorized, 'sign in first');
    const design = await findDesign(this.deps.db, designId);
    const role = design ? await boardRoleOf(this.deps.db, design.boardId, user.id) : undefined;
    if (!design || !role) return refuse(CLOSE_CODES.forbidden, 'not a member of this board');
    const open = [...this.connections];
    if (open.filter((c) => c.sessionId === session.sessionId).length >= this.limits.socketsPerSession || open.filter((c) => c.userId === user.id).length >= this.limits.socketsPerUser) {
      return refuse(CLOSE_CODES.tooManySockets, 'too many open designs: close some tabs first');
    }
    this.wss.handleUpgrade(req, socket, head, (ws) =>
      this.connect(ws, req, {
        ws, userId: user.id, sessionId: session.sessionId, displayName: user.displayName, boardId: design.boardId, designId, role,
        ...this.buckets.of(user.id), clientIds: new Set(), askedForMissing: false, asks: 0,
      }),
    );
  }

  private async sessionOf(req: IncomingMessage): Promise<{ userId: string; sessionId: string } | undefined> {
    const userId = await sessionUser(this.deps.sessionParser, req);
    const sessionId = sessionIdOf(req);
    return userId && sessionId ? { userId, sessionId } : undefined;
  }

  private connect(ws: WebSocket, req: IncomingMessage, conn: Connection) {
    this.connections.add(conn);
    ws.on('close', () => this.connections.delete(conn));
    // ws reports a frame over maxPayload (and other protocol errors) as an 'error' event, then closes
    // the socket itself (1009, 1002); unheard, the event would end the process.
    ws.on('error', (error) => this.log(new Error(`collab: socket error: ${error.message}`)));
    this.dropWhenSlow(ws);
    // y-websocket registers its own 'message' listener; ours runs first, stores the update, then hands it on in order.
    const original = ws.on.bind(ws);
    let handOn: ((data: RawData | Uint8Array) => void) | undefined;
    (ws as unknown as { on: typeof ws.on }).on = ((event: string, listener: (...args: unknown[]) => void) =>
      event === 'message' ? ((handOn = listener as never), ws) : original(event as never, listener as never)) as typeof ws.on;
    setupWSConnection(ws, req, { docName: conn.designId });
    ws.on = original as typeof ws.on;
    const doc = docs.get(conn.designId)!;
    this.received.set(conn, Promise.resolve());
    original('message', (data: RawData) => {
      this.received.set(conn, this.received.get(conn)!.then(() => this.receive(conn, doc, data, handOn)).catch(this.log));
    });
  }

  /** A socket whose unsent bytes pass the bound is dropped (it reconnects and syncs afresh) instead of growing the heap. */
  private dropWhenSlow(ws: WebSocket) {
    const send = ws.send.bind(ws) as (...args: unknown[]) => void;
    (ws as unknown as { send: (...args: unknown[]) => void }).send = (...args: unknown[]) => {
      if (ws.readyState === ws.OPEN && ws.bufferedAmount > this.limits.slowConsumerBytes) {
        this.log(new Error(`collab: dropped a slow consumer with ${ws.bufferedAmount} bytes queued`));
        ws.terminate();
      }
      send(...args);
    };
  }

  private async receive(conn: Connection, doc: WSSharedDoc, data: RawData, handOn?: (data: RawData | Uint8Array) => void) {
    if (conn.ws.readyState !== conn.ws.OPEN) return;
    const bytes = new Uint8Array(data as ArrayBuffer);
    let message: ReturnType<typeof readMessage>;
    try {
      message = readMessage(bytes);
    } catch {
      return conn.ws.close(CLOSE_CODES.invalidUpdate, 'a message that does not decode');
    }
    if (message.kind === 'awareness') return this.receivePresence(conn, doc, message.update, handOn);
    if (message.kind === 'other') return;
    if (message.kind === 'update') {
      if (!conn.updates.take()) return conn.ws.close(CLOSE_CODES.rateLimited, 'too many updates: slow down');
      if (conn.role === 'viewer') return; // read-only: never applied, never stored
      await doc.whenInitialized; // the check and the relay see the stored state first
      if (message.answer) conn.askedForMissing = false;
      // Asked already: this edit comes again in the answer, so it is dropped unchecked.
      else if (conn.askedForMissing) return;
      if (message.update.length > 2) {
        const check = this.checks.get(doc);
        let refusal = check ? check.refusal(message.update) : 'the design is not loaded';
        // The refusal rebuilt the shadow from the document: an edit of this client's that was being stored
        // while another refusal rebuilt it is in the shadow now, so an answer is checked once more.
        if (refusal === MISSING_EDITS && message.answer) refusal = check!.refusal(message.update);
        // An edit that builds on edits this document lacks, from an honest client: it reconnected and
        // typed before answering the server's step 1 (its answer carries what it made offline), or the
        // instance it was on died holding its last edits. The client is asked once for all this document
        // lacks (a step 1); its answer carries the missing edits and this one, and edits that arrive
        // before it are dropped the same way. An answer that still lacks them is final, as before.
        if (refusal === MISSING_EDITS && !message.answer) {
          if (++conn.asks > MAX_ASKS) {
            this.log(new Error(`collab: closed a socket of user ${conn.userId} on design ${conn.designId}: edits built on missing edits after ${MAX_ASKS} asks`));
            return conn.ws.close(CLOSE_CODES.rateLimited, 'too many edits built on edits the server does not have');
          }
          conn.askedForMissing = true;
          conn.ws.send(step1Message(doc));
          return;
        }
        if (refusal) {
          this.log(new Error(`collab: refused an update to design ${conn.designId} from user ${conn.userId}: ${refusal}`));
          return conn.ws.close(CLOSE_CODES.invalidUpdate, 'an update that does not apply');
        }
        await this.store.append(conn.designId, message.update).catch((error) => {
          check?.reset(); // the shadow holds an update the document will not get
          throw error;
        });
      }
    } else await doc.whenInitialized; // sync step 1: answered from the loaded document
    handOn?.(data);
  }

  /** Presence: rate-limited and size-limited (excess dropped), stamped with the account, own client ids only. */
  private receivePresence(conn: Connection, doc: WSSharedDoc, update: Uint8Array, handOn?: (data: Uint8Array) => void) {
    if (update.length > this.limits.maxAwarenessBytes || !conn.awareness.take()) return;
    const ownedElsewhere = (clientId: number) => [...this.connections].some((c) => c !== conn && c.designId === conn.designId && c.clientIds.has(clientId));
    const owns = (clientId: number) => {
      if (conn.clientIds.has(clientId)) return true; // the usual case: no scan
      if (conn.clientIds.size >= CLIENT_IDS_PER_SOCKET || clientId === doc.clientID || ownedElsewhere(clientId)) return false;
      conn.clientIds.add(clientId);
      return true;
    };
    const stamped = stampPresence(update, conn, owns);
    if (stamped) handOn?.(awarenessMessage(stamped));
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

  /** Closes the matching sockets on every instance: of a design (deleted), a user (suspended, password reset), a session (signed out). */
  closeEverywhere(match: CloseMatch, code: number, reason: string) {
    this.deps.relay?.publishControl({ kind: 'close', match, code, reason });
    this.closeMatching(match, code, reason);
  }

  private closeMatching(match: CloseMatch, code: number, reason: string) {
    this.closeWhere((c) => (!match.designId || c.designId === match.designId) && (!match.userId || c.userId === match.userId) && (!match.sessionId || c.sessionId === match.sessionId), code, reason);
  }

  /** Work asked by another instance. */
  private control(message: ControlMessage) {
    if (message.kind === 'access') void this.recheck(message.boardId, message.userId).catch(this.log);
    else if (message.match.designId || message.match.userId || message.match.sessionId) this.closeMatching(message.match, message.code, message.reason);
  }

  /** Closes this instance's sockets of a design, a user or a session (closeEverywhere reaches the other instances too). */
  closeWhere(match: (c: { designId: string; userId: string; boardId: string; sessionId: string }) => boolean, code: number, reason: string) {
    for (const conn of this.connections) if (match(conn)) conn.ws.close(code, reason);
  }

  private async compactBusyDocs() {
    const ids = await this.store.designsToCompact(this.deps.compactAbove ?? 500).catch(() => []);
    for (const id of ids) await this.store.compact(id).catch(this.log);
  }

  /**
   * Shutdown, before close(): every socket is closed with `code` (a client reconnects, to another
   * instance behind the balancer), and the update being stored when it closed is stored. Updates
   * still on the wire are refused with the closed socket; the client keeps them and its next sync
   * sends them again. A socket that does not finish the closing handshake within `timeoutMs` is cut.
   */
  async drain(code: number, reason: string, timeoutMs = 3_000): Promise<void> {
    await Promise.all(
      [...this.connections].map(async (conn) => {
        await new Promise<void>((resolve) => {
          if (conn.ws.readyState === conn.ws.CLOSED) return resolve();
          const timer = setTimeout(() => conn.ws.terminate(), timeoutMs);
          conn.ws.once('close', () => {
            clearTimeout(timer);
            resolve();
          });
          conn.ws.close(code, reason);
        });
        await this.received.get(conn);
      }),
    );
  }

  async close(): Promise<void> {
    clearInterval(this.timer);
    await this.deps.relay?.close();
    for (const conn of this.connections) conn.ws.terminate();
    await new Promise<void>((resolve) => this.wss.close(() => resolve()));
  }
}
