import { randomUUID } from 'node:crypto';
import * as Y from 'yjs';
import * as awarenessProtocol from 'y-protocols/awareness';
import type { WSSharedDoc } from '@y/websocket-server/utils';
import type { RedisConnection } from '../cluster/redis-connection';
import type { DesignDocStore } from './design-doc-store';

/** The origin of changes that came from another instance: applied and relayed here, never stored or published again. */
export const RELAY_ORIGIN = Symbol('relay');

/** How long a sequence number must have been seen before catch-up may start from it (rows commit out of order). */
const SETTLE_MS = 5000;


/** Which collab sockets to close: every field given must match. */
export interface CloseMatch {
  designId?: string;
  userId?: string;
  sessionId?: string;
}

/** Work for the collab sockets of every instance: a board's roles changed, or some sockets must close. */
export type ControlMessage =
  | { kind: 'access'; boardId: string; userId?: string }
  | { kind: 'close'; match: CloseMatch; code: number; reason: string };

interface Followed {
  doc: WSSharedDoc;
  listener: (message: string) => void;
  onAwareness: (changes: { added: number[]; updated: number[]; removed: number[] }, origin: unknown) => void;
  /** Highest sequence number applied or stored here; `settled` is what it was SETTLE_MS to 2 × SETTLE_MS ago. */
  seen: number;
  previous: number;
  settled: number;
}

type DesignMessage = { from: string; seq: number; update: string } | { from: string; awareness: string };

/**
 * The co-editing relay between instances, over Redis pub/sub (a channel per design, one for control).
 *
 * Every stored update is published with its row's sequence number; an instance holding the design
 * open applies it to its live document with RELAY_ORIGIN, which y-websocket relays to its clients;
 * it is not stored again. Presence changes are published as they happen (removals included) and
 * applied the same way. Pub/sub drops what is sent while a subscriber is disconnected, so after
 * a reconnect each live document is caught up from the database: the rows numbered above the
 * highest one seen a while before (numbers are taken at insert and may commit out of order).
 * Yjs updates are idempotent, so applying one twice does no harm.
 */
export class RedisRelay {
  readonly instanceId = randomUUID();
  private readonly followed = new Map<string, Followed>();
  private readonly timer: NodeJS.Timeout;
  private controlListener?: (message: string) => void;
  private readonly controlChannel: string;
  private readonly designChannel: (designId: string) => string;

  constructor(
    private readonly redis: RedisConnection,
    private readonly store: Pick<DesignDocStore, 'loadAfter'>,
    private readonly log: (error: unknown) => void,
  ) {
    this.controlChannel = `${redis.prefix}:collab-control`;
    this.designChannel = (designId) => `${redis.prefix}:design:${designId}`;
    redis.onResubscribed(() => void this.catchUp());
    this.timer = setInterval(() => this.settle(), SETTLE_MS);
    this.timer.unref();
  }

  /** Listens to the control channel; messages from this instance itself are skipped. */
  async onControl(handle: (message: ControlMessage) => void): Promise<void> {
    this.controlListener = (raw) => {
      const { from, ...message } = JSON.parse(raw) as ControlMessage & { from: string };
      if (from !== this.instanceId) handle(message as ControlMessage);
    };
    await this.redis.subscriber.subscribe(this.controlChannel, this.controlListener);
  }

  publishControl(message: ControlMessage): void {
    this.publish(this.controlChannel, { from: this.instanceId, ...message });
  }

  /** Before a live document is loaded: subscribes to its channel (messages wait for `doc.whenInitialized`). */
  async follow(designId: string, doc: WSSharedDoc): Promise<void> {
    const entry: Followed = {
      doc,
      seen: 0,
      previous: 0,
      settled: 0,
      listener: (raw) => void this.receive(designId, entry, raw).catch(this.log),
      onAwareness: ({ added, updated, removed }, origin) => {
        // Removals by this instance's outdated-state timer are not news to the instance that owns the client.
        if (origin === RELAY_ORIGIN || origin === 'timeout') return;
        const update = awarenessProtocol.encodeAwarenessUpdate(doc.awareness, added.concat(updated, removed));
        this.publish(this.designChannel(designId), { from: this.instanceId, awareness: Buffer.from(update).toString('base64') });
      },
    };
    // A document let go while a new one of the same design opened: its unfollow will find it replaced, so release it here.
    const previous = this.followed.get(designId);
    if (previous) await this.release(designId, previous);
    this.followed.set(designId, entry);
    doc.awareness.on('update', entry.onAwareness);
    await this.redis.subscriber.subscribe(this.designChannel(designId), entry.listener);
  }

  /** After the load: the highest sequence number it read. */
  loaded(designId: string, doc: WSSharedDoc, lastSeq: number): void {
    const entry = this.followed.get(designId);
    if (entry?.doc === doc) this.saw(entry, lastSeq);
  }

  /** The last client here left: stop following (a new live document of the same design follows on its own). */
  async unfollow(designId: string, doc: WSSharedDoc): Promise<void> {
    const entry = this.followed.get(designId);
    if (entry?.doc !== doc) return;
    this.followed.delete(designId);
    await this.release(designId, entry);
  }

  private async release(designId: string, entry: Followed) {
    entry.doc.awareness.off('update', entry.onAwareness);
    await this.redis.subscriber.unsubscribe(this.designChannel(designId), entry.listener).catch(this.log);
  }

  /** The store's append listener: publishes a stored update with its sequence number. */
  readonly published = (designId: string, seq: number, update: Uint8Array): void => {
    const entry = this.followed.get(designId);
    if (entry) this.saw(entry, seq);
    this.publish(this.designChannel(designId), { from: this.instanceId, seq, update: Buffer.from(update).toString('base64') });
  };

  private publish(channel: string, message: object) {
    this.redis.client.publish(channel, JSON.stringify(message)).catch(this.log);
  }

  private async receive(designId: string, entry: Followed, raw: string) {
    const message = JSON.parse(raw) as DesignMessage;
    if (message.from === this.instanceId) return;
    await entry.doc.whenInitialized;
    if (this.followed.get(designId) !== entry) return; // closed meanwhile
    if ('awareness' in message) {
      awarenessProtocol.applyAwarenessUpdate(entry.doc.awareness, Buffer.from(message.awareness, 'base64'), RELAY_ORIGIN);
      return;
    }
    // Checked on the instance that stored it (realtime/update-check.ts); applying relays it to the clients here.
    Y.applyUpdate(entry.doc, Buffer.from(message.update, 'base64'), RELAY_ORIGIN);
    this.saw(entry, message.seq);
  }

  private saw(entry: Followed, seq: number) {
    entry.seen = Math.max(entry.seen, seq);
  }

  private settle() {
    for (const entry of this.followed.values()) {
      entry.settled = entry.previous;
      entry.previous = entry.seen;
    }
  }

  /** After a reconnect: every live document gets the rows stored since a while before the connection was lost. */
  private async catchUp() {
    for (const [designId, entry] of this.followed) {
      try {
        await entry.doc.whenInitialized;
        const { update, lastSeq } = await this.store.loadAfter(designId, entry.settled);
        if (this.followed.get(designId) !== entry) continue;
        Y.applyUpdate(entry.doc, update, RELAY_ORIGIN);
        this.saw(entry, lastSeq);
      } catch (error) {
        this.log(error);
      }
    }
  }

  /** Live documents followed (for tests). */
  get size(): number {
    return this.followed.size;
  }

  async close(): Promise<void> {
    clearInterval(this.timer);
    for (const [designId, entry] of [...this.followed]) await this.unfollow(designId, entry.doc);
    if (this.controlListener) await this.redis.subscriber.unsubscribe(this.controlChannel, this.controlListener).catch(() => {});
  }
}
