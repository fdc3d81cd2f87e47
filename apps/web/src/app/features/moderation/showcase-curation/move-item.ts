/** The list with the item at `from` moved to `to` (both clamped to the list); the list itself is left alone. */
export function moveItem<T>(list: readonly T[], from: number, to: number): T[] {
  const copy = [...list];
  if (from < 0 || from >= copy.length) return copy;
  const target = Math.max(0, Math.min(copy.length - 1, to));
  const [item] = copy.splice(from, 1);
  copy.splice(target, 0, item);
  return copy;
}

/** What a screen reader hears after a move: "Sine 24 moved to position 2 of 5." */
export const movedText = (title: string, index: number, count: number) => `${title} moved to position ${index + 1} of ${count}.`;
