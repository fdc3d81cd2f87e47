import type { RosetteLayer } from '@barwright/contracts';
import { DESIGN_MAP, setDesignField, toYValue } from '@barwright/contracts/design-doc';
import * as Y from 'yjs';

/** The node at a path of the document's design (a Y.Map, a Y.Array or a plain value), if there is one. */
function nodeAt(doc: Y.Doc, path: readonly (string | number)[]): unknown {
  let node: unknown = doc.getMap(DESIGN_MAP);
  for (const key of path) node = node instanceof Y.Map ? node.get(String(key)) : node instanceof Y.Array ? node.get(Number(key)) : undefined;
  return node;
}

/** Appends an item to a list of the design (`['rosette', 'layers']`, a wave's `terms`). */
export function addItem(doc: Y.Doc, listPath: readonly (string | number)[], item: unknown, origin: unknown): boolean {
  const list = nodeAt(doc, listPath);
  if (!(list instanceof Y.Array)) return false;
  doc.transact(() => list.push([toYValue(item)]), origin);
  return true;
}

/** Removes item `index` of a list, keeping at least `keep` items (a rosette needs a layer). */
export function removeItem(doc: Y.Doc, listPath: readonly (string | number)[], index: number, origin: unknown, keep = 1): boolean {
  const list = nodeAt(doc, listPath);
  if (!(list instanceof Y.Array) || list.length <= keep || index < 0 || index >= list.length) return false;
  doc.transact(() => list.delete(index, 1), origin);
  return true;
}

/** Adds a rosette layer at the end (a compound rosette is the sum of its layers). */
export function addLayer(doc: Y.Doc, layer: RosetteLayer, origin: unknown): boolean {
  return addItem(doc, ['rosette', 'layers'], layer, origin);
}

/** Removes layer `index`; the last layer stays. */
export function removeLayer(doc: Y.Doc, index: number, origin: unknown): boolean {
  return removeItem(doc, ['rosette', 'layers'], index, origin);
}

/**
 * Writes `next` over the document's design leaf by leaf, only where it differs from `current`, in one
 * transaction: a units switch touches every length but leaves the document's structure (and anyone
 * else's edit of a field it did not change) alone. Lists other than the layers are written whole.
 */
export function writeChangedLeaves(doc: Y.Doc, current: unknown, next: unknown, origin: unknown): void {
  doc.transact(() => walk(doc, [], current, next, origin), origin);
}

function walk(doc: Y.Doc, path: (string | number)[], current: unknown, next: unknown, origin: unknown): void {
  const key = path[path.length - 1];
  if (Array.isArray(next) && key === 'layers' && Array.isArray(current) && current.length === next.length) {
    next.forEach((item, i) => walk(doc, [...path, i], current[i], item, origin));
  } else if (isObject(next) && isObject(current)) {
    for (const [k, v] of Object.entries(next)) walk(doc, [...path, k], current[k], v, origin);
  } else if (JSON.stringify(current) !== JSON.stringify(next) && path.length > 0) {
    setDesignField(doc, path, next, origin);
  }
}

function isObject(value: unknown): value is Record<string, unknown> {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

/** Removes an optional field (`plan.surfaceSpeed`): the engine then uses the material's figure. */
export function clearField(doc: Y.Doc, path: readonly (string | number)[], origin: unknown): boolean {
  const node = nodeAt(doc, path.slice(0, -1));
  if (!(node instanceof Y.Map)) return false;
  const map = node;
  doc.transact(() => map.delete(String(path[path.length - 1])), origin);
  return true;
}
