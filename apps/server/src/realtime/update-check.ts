import * as Y from 'yjs';
import { WebSocket } from 'ws';
import { DESIGN_MAP, NOTES_TEXT, readDesign } from '@barwright/contracts/design-doc';
import type { RealtimeLimits } from './realtime-limits';

/**
 * Why an update that builds on edits this server has not received is refused. The gateway asks an
 * honest client for them instead of closing (see CollabGateway.receive).
 */
export const MISSING_EDITS = 'an update that depends on edits the server does not have';

/** The only top-level types a design document has; an update that adds another is refused. */
const TOP_LEVEL = new Set([DESIGN_MAP, NOTES_TEXT]);

/**
 * Deepest nesting of Yjs types allowed in the design map. A valid design nests 5 levels
 * (design → rosette → layers → layer → wave → points); a pasted key nested thousands deep
 * would overflow the stack of every later reader.
 */
export const MAX_DESIGN_DEPTH = 16;

/**
 * Tries each incoming update on a shadow copy of a live document before it is stored. The shadow
 * follows the live document's own updates, so a check costs about as much as the update itself;
 * the design map is re-read only when an update touched it.
 */
export class UpdateCheck {
  private shadow!: Y.Doc;
  private designTouched = false;
  private notesTouched = false;
  /** Size of the design's JSON as last checked: a stored design already over the limit may shrink, not grow. */
  private designBytes = 0;
  private notesChars = 0;
  private readonly follow = (update: Uint8Array, origin: unknown) => {
    // A client socket's update was applied here by refusal() before the live document got it.
    if (origin instanceof WebSocket) return;
    try {
      Y.applyUpdate(this.shadow, update);
    } catch {
      this.reset();
    }
  };

  constructor(
    private readonly live: Y.Doc,
    private readonly limits: Pick<RealtimeLimits, 'maxDesignJsonBytes' | 'maxNotesChars'>,
  ) {
    this.reset();
    live.on('update', this.follow);
  }

  /** Why the update must be refused, or undefined when it applies and leaves the design readable. */
  refusal(update: Uint8Array): string | undefined {
    this.designTouched = false;
    this.notesTouched = false;
    try {
      const namesBefore = new Set(this.shadow.share.keys());
      const pendingBefore = pendingBytes(this.shadow);
      Y.applyUpdate(this.shadow, update, 'check');
      // An update that waits for one the server never had (the client's refused or lost edit) would be
      // stored, and sent to everyone, whole and unread; no check here can see inside it.
      if (pendingBytes(this.shadow) > pendingBefore) throw new Error(MISSING_EDITS);
      // Only names this update adds: a document stored before the check may hold others, and must stay editable.
      for (const name of this.shadow.share.keys()) {
        if (!TOP_LEVEL.has(name) && !namesBefore.has(name)) throw new Error(`a top-level type "${name.slice(0, 40)}" that a design does not have`);
      }
      if (this.designTouched) {
        const map = this.shadow.getMap(DESIGN_MAP);
        if (depthOf(map) > MAX_DESIGN_DEPTH) throw new Error(`the design nests deeper than ${MAX_DESIGN_DEPTH} levels`);
        const design = readDesign(this.shadow);
        const bytes = Buffer.byteLength(JSON.stringify(design));
        if (bytes > this.limits.maxDesignJsonBytes && bytes > this.designBytes) throw new Error(`the design is larger than ${this.limits.maxDesignJsonBytes} bytes`);
        this.designBytes = bytes;
        // An invalid value (a field being typed) is kept: the editor flags it and reads refuse it with 422.
      }
      const notes = this.shadow.getText(NOTES_TEXT).length;
      if (this.notesTouched && notes > this.limits.maxNotesChars && notes > this.notesChars) {
        throw new Error(`the notes are longer than ${this.limits.maxNotesChars} characters`);
      }
      this.notesChars = notes;
      return undefined;
    } catch (error) {
      this.reset(); // the shadow may hold half of the refused update
      return error instanceof Error ? error.message : String(error);
    }
  }

  /** Copies the live document afresh (after a refusal, or when an accepted update could not be stored). */
  reset(): void {
    this.shadow?.destroy();
    this.shadow = new Y.Doc();
    Y.applyUpdate(this.shadow, Y.encodeStateAsUpdate(this.live));
    try {
      this.designBytes = Buffer.byteLength(JSON.stringify(readDesign(this.shadow)));
    } catch {
      this.designBytes = Infinity; // a stored design too deep to read: it may only shrink
    }
    this.notesChars = this.shadow.getText(NOTES_TEXT).length;
    this.shadow.getMap(DESIGN_MAP).observeDeep(() => (this.designTouched = true));
    this.shadow.getText(NOTES_TEXT).observe(() => (this.notesTouched = true));
  }

  dispose(): void {
    this.live.off('update', this.follow);
    this.shadow.destroy();
  }
}

/** Bytes of updates a document holds back because what they build on has not arrived. */
function pendingBytes(doc: Y.Doc): number {
  return (doc.store.pendingStructs?.update.length ?? 0) + (doc.store.pendingDs?.length ?? 0);
}

/** Nesting depth of Yjs types under `root`, without recursion. */
function depthOf(root: Y.Map<unknown>): number {
  let deepest = 0;
  const stack: [unknown, number][] = [[root, 1]];
  while (stack.length) {
    const [node, depth] = stack.pop()!;
    deepest = Math.max(deepest, depth);
    if (deepest > MAX_DESIGN_DEPTH) return deepest;
    const children = node instanceof Y.Map ? [...node.values()] : node instanceof Y.Array ? node.toArray() : [];
    for (const child of children) if (child instanceof Y.Map || child instanceof Y.Array) stack.push([child, depth + 1]);
  }
  return deepest;
}
