import * as Y from 'yjs';
import { parseDesign } from '@barwright/contracts';
import { DESIGN_MAP, readDesign } from '@barwright/contracts/design-doc';

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
  private readonly follow = (update: Uint8Array) => {
    try {
      Y.applyUpdate(this.shadow, update);
    } catch {
      this.reset();
    }
  };

  constructor(private readonly live: Y.Doc) {
    this.reset();
    live.on('update', this.follow);
  }

  /** Why the update must be refused, or undefined when it applies and leaves the design readable. */
  refusal(update: Uint8Array): string | undefined {
    this.designTouched = false;
    try {
      Y.applyUpdate(this.shadow, update, 'check');
      if (this.designTouched) {
        const map = this.shadow.getMap(DESIGN_MAP);
        if (depthOf(map) > MAX_DESIGN_DEPTH) throw new Error(`the design nests deeper than ${MAX_DESIGN_DEPTH} levels`);
        // An invalid value (a field being typed) is allowed: the editor flags it and reads refuse it with 422.
        parseDesign(readDesign(this.shadow));
      }
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
    this.shadow.getMap(DESIGN_MAP).observeDeep(() => (this.designTouched = true));
  }

  dispose(): void {
    this.live.off('update', this.follow);
    this.shadow.destroy();
  }
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
