import type { BoardSummary } from '@barwright/contracts';

/** The boards a member may remix onto: owner or editor, not archived; their own first, then by name (pure). */
export function editableBoards(lists: { mine: readonly BoardSummary[]; shared: readonly BoardSummary[] }): BoardSummary[] {
  const byName = (a: BoardSummary, b: BoardSummary) => a.name.localeCompare(b.name);
  const ok = (b: BoardSummary) => !b.archived && (b.role === 'owner' || b.role === 'editor');
  return [...lists.mine.filter(ok).sort(byName), ...lists.shared.filter(ok).sort(byName)];
}
