/** One splice of a text: at `index`, remove `remove` characters and insert `insert`. */
export interface TextSplice {
  index: number;
  remove: number;
  insert: string;
}

/** A Yjs text delta: retain, insert or delete, in order from the start. */
export type TextDelta = readonly { retain?: number; insert?: unknown; delete?: number }[];

/**
 * The single splice that turns `before` into `after`: the common start and end are kept, the middle
 * replaced. A textarea edit is one such splice (typing, deleting, pasting over a selection), so the
 * shared text receives exactly what the user did. `cursor` (where the caret is now) settles ties in
 * repeated characters: typing "a" into "aa" at the end inserts at the end, not the start.
 */
export function textSplice(before: string, after: string, cursor = after.length): TextSplice | null {
  if (before === after) return null;
  const longest = Math.min(before.length, after.length);
  let start = 0;
  while (start < longest && before[start] === after[start]) start++;
  let end = 0;
  while (end < longest - start && before[before.length - 1 - end] === after[after.length - 1 - end]) end++;
  // Prefer the splice ending at the caret when the repeated characters allow it.
  const inserted = after.length - before.length;
  if (inserted > 0 && cursor - inserted >= 0 && cursor - inserted < start && after.slice(0, cursor - inserted) + after.slice(cursor) === before) {
    return { index: cursor - inserted, remove: 0, insert: after.slice(cursor - inserted, cursor) };
  }
  return { index: start, remove: before.length - start - end, insert: after.slice(start, after.length - end) };
}

/**
 * Where a caret at `position` sits after a remote delta: text inserted before it pushes it on,
 * text deleted before it pulls it back; an insertion exactly at the caret stays after it.
 */
export function mapPosition(position: number, delta: TextDelta): number {
  let index = 0; // position in the old text
  let moved = position;
  for (const op of delta) {
    if (index > position) break;
    if (op.retain) index += op.retain;
    else if (op.insert !== undefined) {
      const length = typeof op.insert === 'string' ? op.insert.length : 1;
      if (index < position) moved += length;
    } else if (op.delete) {
      const removed = Math.min(op.delete, Math.max(0, position - index));
      moved -= removed;
      index += op.delete;
    }
  }
  return Math.max(0, moved);
}
