/** One entry's change of place in the showcase; positions count from 1, as the curation page shows them. */
export interface ShowcaseMove {
  entryId: string;
  title: string;
  from: number;
  to: number;
}

/**
 * What a new order changed, for the audit log (pure). A single entry taken out and put back
 * elsewhere (what a drag or an arrow does) is one move, although every entry between its two
 * places shifts by one; any other reordering lists each entry whose place changed. Nothing when
 * the order is the same. `moved`, the entry the curator says they moved, is named when a single move
 * of it explains the new order (a swap of neighbours is a move of either).
 */
export function showcaseMoves(before: readonly string[], after: readonly string[], titles: ReadonlyMap<string, string>, moved?: string): ShowcaseMove[] {
  const move = (entryId: string): ShowcaseMove => ({ entryId, title: titles.get(entryId) ?? '', from: before.indexOf(entryId) + 1, to: after.indexOf(entryId) + 1 });
  const changed = after.filter((id, i) => before[i] !== id);
  if (changed.length === 0) return [];
  const alone = (id: string) => {
    const rest = (list: readonly string[]) => list.filter((x) => x !== id).join();
    return rest(before) === rest(after);
  };
  const single = moved !== undefined && changed.includes(moved) && alone(moved) ? moved : changed.find(alone);
  return single ? [move(single)] : changed.map(move);
}
