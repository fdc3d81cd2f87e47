import { DOCUMENT } from '@angular/common';
import { computed, DestroyRef, inject, Injectable, linkedSignal, signal } from '@angular/core';
import { CLOSE_CODES, parseDesign, type Design } from '@barwright/contracts';
import { DESIGN_MAP, NOTES_TEXT, readDesign, setDesignField } from '@barwright/contracts/design-doc';
import { WebsocketProvider } from 'y-websocket';
import * as Y from 'yjs';
import { errorsByField } from '../fields/field-errors';
import { connectionStatus, type SocketFacts } from './connection-status';
import { addItem, clearField, removeItem, writeChangedLeaves } from './design-writes';
import { colourAvoiding, colourFor, coloursTaken, peersFrom, type Peer, type PresenceState } from './presence';

/** Pointer updates sent at most this often (ms); awareness relays every one to everybody. */
const POINTER_INTERVAL_MS = 40;

/**
 * One bar design's live document for the lifetime of the editor that provides it: the Yjs doc, its
 * y-websocket connection at `/collab/<designId>`, presence (awareness) and this tab's own undo history.
 * Everything the page reads is a signal; every edit goes into the document with this session's origin.
 */
@Injectable()
export class CollabSession {
  private readonly document = inject(DOCUMENT);
  readonly doc = new Y.Doc();
  /** The origin of this tab's edits: the undo manager tracks these and nobody else's. */
  readonly origin = { tab: 'local edits' };
  readonly notes = this.doc.getText(NOTES_TEXT);
  private readonly designMap = this.doc.getMap(DESIGN_MAP);
  private readonly undoManager = new Y.UndoManager([this.designMap, this.notes], { trackedOrigins: new Set([this.origin]), captureTimeout: 500 });
  private provider: WebsocketProvider | null = null;

  private readonly facts = signal<SocketFacts>({ socket: 'connecting', synced: false, closedWith: null, browserOffline: false });
  private readonly everSynced = signal(false);
  private readonly raw = signal<Record<string, unknown>>({});
  private readonly others = signal<readonly Peer[]>([]);
  private readonly stacks = signal({ undo: 0, redo: 0 });
  private readonly writable = signal(false);
  private readonly me = signal<PresenceState['user'] | null>(null);
  private readonly roleChangeCount = signal(0);
  /** Counts the times the server said this member's role changed; the page reloads the role on each. */
  readonly roleChanges = this.roleChangeCount.asReadonly();
  private pointerTimer: ReturnType<typeof setTimeout> | null = null;
  private pendingPointer: PresenceState['pointer'] | undefined;
  /** Each listener with the design it was last told, so it hears each design once. */
  private readonly validListeners = new Set<{ listener: (design: Design) => void; heard: Design | null }>();

  /** The design as the document holds it now (not validated). */
  readonly design = this.raw.asReadonly();
  readonly parsed = computed(() => parseDesign(this.raw()));
  /** The newest valid design: the views keep drawing it while a field holds an invalid value. */
  readonly lastValid = linkedSignal<ReturnType<typeof parseDesign>, Design | null>({
    source: this.parsed,
    computation: (result, previous) => (result.ok ? result.design : (previous?.value ?? null)),
  });
  readonly fieldErrors = computed(() => {
    const result = this.parsed();
    return result.ok ? new Map<string, string>() : errorsByField(result.errors);
  });
  readonly status = computed(() => connectionStatus(this.facts(), CLOSE_CODES));
  /** True once the document has arrived from the server at least once. */
  readonly loaded = this.everSynced.asReadonly();
  readonly peers = this.others.asReadonly();
  readonly self = this.me.asReadonly();
  readonly readOnly = computed(() => !this.writable());
  readonly canUndo = computed(() => this.writable() && this.stacks().undo > 0);
  readonly canRedo = computed(() => this.writable() && this.stacks().redo > 0);

  constructor() {
    this.designMap.observeDeep(() => {
      this.raw.set(readDesign(this.doc));
      this.tellValid();
    });
    const countStacks = () => this.stacks.set({ undo: this.undoManager.undoStack.length, redo: this.undoManager.redoStack.length });
    for (const event of ['stack-item-added', 'stack-item-popped', 'stack-cleared'] as const) this.undoManager.on(event, countStacks);
    const view = this.document.defaultView;
    const onlineChanged = () => this.facts.update((f) => ({ ...f, browserOffline: view?.navigator.onLine === false }));
    view?.addEventListener('online', onlineChanged);
    view?.addEventListener('offline', onlineChanged);
    inject(DestroyRef).onDestroy(() => {
      view?.removeEventListener('online', onlineChanged);
      view?.removeEventListener('offline', onlineChanged);
      this.close();
    });
  }

  /** Connects to the design's document as `user`. Call once. */
  open(designId: string, user: { id: string; name: string }): void {
    const location = this.document.location;
    const serverUrl = `${location.protocol === 'https:' ? 'wss' : 'ws'}://${location.host}/collab`;
    // No BroadcastChannel: every update goes through the server, which drops a viewer's writes.
    const provider = new WebsocketProvider(serverUrl, designId, this.doc, { disableBc: true });
    this.provider = provider;
    provider.on('status', ({ status }) => this.facts.update((f) => ({ ...f, socket: status, synced: status === 'connected' && f.synced })));
    provider.on('sync', (synced: boolean) => {
      this.facts.update((f) => ({ ...f, synced }));
      if (synced) this.everSynced.set(true);
    });
    provider.on('closed', ({ code }) => {
      // 44xx closes are final for y-websocket; a role change is the one we come straight back from.
      if (code === CLOSE_CODES.roleChanged) {
        this.roleChangeCount.update((n) => n + 1);
        provider.connect();
      } else this.facts.update((f) => ({ ...f, closedWith: code }));
    });
    const colour = colourFor(user.id);
    this.me.set({ ...user, colour });
    provider.awareness.setLocalState({ user: { ...user, colour }, field: null, pointer: null } satisfies PresenceState);
    provider.awareness.on('change', () => {
      const peers = peersFrom(provider.awareness.getStates(), this.doc.clientID);
      this.others.set(peers);
      this.keepColourDistinct(peers);
    });
  }

  /**
   * Calls `listener` with each new valid design, local edit or remote, in the task that changed the
   * document (and at once with the current one): the views' worker starts on a keystroke without
   * waiting for the page's change detection, which runs in the next frame (5–12 ms later in the studio
   * bench). Returns the way to stop.
   */
  onValidDesign(listener: (design: Design) => void): () => void {
    const entry = { listener, heard: null as Design | null };
    this.validListeners.add(entry);
    this.tellValid();
    return () => this.validListeners.delete(entry);
  }

  private tellValid(): void {
    const design = this.lastValid();
    if (!design) return;
    for (const entry of this.validListeners) {
      if (entry.heard === design) continue;
      entry.heard = design;
      // In Yjs's observer (for a remote update, inside the socket's message handler): one listener's
      // failure must not stop the document or the other listeners.
      try {
        entry.listener(design);
      } catch (error) {
        console.error(error);
      }
      // A listener that wrote to the document has had the newer design told to everyone: stop here.
      if (this.lastValid() !== design) return;
    }
  }

  /** Editors write; viewers only follow (the server drops their writes anyway). */
  setWritable(writable: boolean): void {
    this.writable.set(writable);
  }

  /** Sets one field by path, e.g. `['rosette', 'layers', 0, 'lobes']`. */
  setField(path: readonly (string | number)[], value: unknown): void {
    if (this.writable()) setDesignField(this.doc, path, value, this.origin);
  }

  /** Removes an optional field, e.g. `['plan', 'surfaceSpeed']`. */
  clearField(path: readonly (string | number)[]): void {
    if (this.writable()) clearField(this.doc, path, this.origin);
  }

  /** Appends to a list of the design: a rosette layer, a Fourier term. */
  addItem(listPath: readonly (string | number)[], item: unknown): void {
    if (this.writable()) addItem(this.doc, listPath, item, this.origin);
  }

  /** Removes one item of a list, keeping at least one. */
  removeItem(listPath: readonly (string | number)[], index: number): void {
    if (this.writable()) removeItem(this.doc, listPath, index, this.origin);
  }

  /** Writes a whole design over the current one, changing only the fields that differ (a units switch). */
  replaceDesign(next: Design): void {
    if (this.writable()) writeChangedLeaves(this.doc, this.raw(), next, this.origin);
  }

  undo(): void {
    if (this.canUndo()) this.undoManager.undo();
  }

  redo(): void {
    if (this.canRedo()) this.undoManager.redo();
  }

  /** Says which field this tab is editing (null: none); a new field starts a new undo step. */
  focusField(field: string | null): void {
    this.undoManager.stopCapturing();
    this.provider?.awareness.setLocalStateField('field', field);
  }

  /** The pointer over a view, as fractions of its size; null when it leaves. Sent at most every 40 ms. */
  movePointer(pointer: PresenceState['pointer']): void {
    this.pendingPointer = pointer;
    if (this.pointerTimer !== null) return;
    this.sendPointer();
    this.pointerTimer = setTimeout(() => {
      this.pointerTimer = null;
      if (this.pendingPointer !== undefined) this.sendPointer();
    }, POINTER_INTERVAL_MS);
  }

  /** Two people never wear one colour: whoever came later (higher client id) moves to a free one. */
  private keepColourDistinct(peers: readonly Peer[]): void {
    const me = this.me();
    if (!me || !this.provider) return;
    const colour = colourAvoiding(me.id, coloursTaken(peers, { clientId: this.doc.clientID, userId: me.id }));
    if (colour === me.colour) return;
    this.me.set({ ...me, colour });
    this.provider.awareness.setLocalStateField('user', { ...me, colour });
  }

  private sendPointer(): void {
    this.provider?.awareness.setLocalStateField('pointer', this.pendingPointer ?? null);
    this.pendingPointer = undefined;
  }

  private close(): void {
    if (this.pointerTimer !== null) clearTimeout(this.pointerTimer);
    this.undoManager.destroy();
    this.provider?.destroy();
    this.provider = null;
    this.doc.destroy();
  }
}
