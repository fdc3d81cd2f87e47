import * as Y from 'yjs';
import type { Design } from './design';

/**
 * The layout of a bar design's Yjs document (the realtime contract): the design file's fields in
 * a Y.Map named `design`, nested objects as nested Y.Maps, lists as Y.Arrays (objects in them as
 * Y.Maps, a measured reading as a plain `[degrees, radius]` pair); the notes in a Y.Text `notes`.
 */
export const DESIGN_MAP = 'design';
export const NOTES_TEXT = 'notes';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Turns a JSON value into the Yjs value stored for it. */
export function toYValue(value: unknown, key?: string): unknown {
  if (Array.isArray(value)) {
    const array = new Y.Array<unknown>();
    // A reading pair stays a plain value: it is edited as a whole, never one half at a time.
    array.push(value.map((item) => (key === 'points' ? item : toYValue(item))));
    return array;
  }
  if (value !== null && typeof value === 'object') {
    const map = new Y.Map<unknown>();
    for (const [k, v] of Object.entries(value)) if (v !== undefined) map.set(k, toYValue(v, k));
    return map;
  }
  return value;
}

/** Replaces the document's design with `design` in one transaction. */
export function writeDesign(doc: Y.Doc, design: Design | Record<string, Json>, origin?: unknown): void {
  doc.transact(() => {
    const map = doc.getMap(DESIGN_MAP);
    for (const key of [...map.keys()]) if (!(key in design)) map.delete(key);
    for (const [k, v] of Object.entries(design)) if (v !== undefined) map.set(k, toYValue(v, k));
  }, origin);
}

/** The document's design as plain JSON (not yet validated: pass it to `parseDesign`). */
export function readDesign(doc: Y.Doc): Record<string, unknown> {
  return doc.getMap(DESIGN_MAP).toJSON();
}

/** Sets one field by path (`['rosette', 'layers', 0, 'lobes']`), creating nothing: the parent must exist. */
export function setDesignField(doc: Y.Doc, path: readonly (string | number)[], value: unknown, origin?: unknown): boolean {
  let node: unknown = doc.getMap(DESIGN_MAP);
  for (const key of path.slice(0, -1)) {
    node = node instanceof Y.Map ? node.get(String(key)) : node instanceof Y.Array ? node.get(Number(key)) : undefined;
    if (node === undefined) return false;
  }
  const last = path[path.length - 1];
  doc.transact(() => {
    if (node instanceof Y.Map) node.set(String(last), toYValue(value, String(last)));
    else if (node instanceof Y.Array) {
      node.delete(Number(last), 1);
      node.insert(Number(last), [toYValue(value)]);
    }
  }, origin);
  return node instanceof Y.Map || node instanceof Y.Array;
}
