import type { Lineage, LineageNode, LineageTreeNode } from '@barwright/contracts';

/** One row of the lineage as drawn: an entry and how far it sits from the chain's root. */
export interface LineageRow {
  node: LineageNode;
  /** 0 for the root. */
  depth: number;
  role: 'ancestor' | 'self' | 'descendant';
}

/** The tree as rows, depth first, children in the server's order (pure). */
export function flattenTree(nodes: readonly LineageTreeNode[], depth: number): LineageRow[] {
  return nodes.flatMap(({ children, ...node }) => [{ node: node as LineageNode, depth, role: 'descendant' as const }, ...flattenTree(children, depth + 1)]);
}

/**
 * The chain from the root down to this entry, then its remixes and theirs below it (pure).
 * Unavailable entries (hidden or deleted) keep their place, so the shape of the tree stays true.
 */
export function lineageRows(lineage: Lineage): LineageRow[] {
  const ancestors = lineage.ancestors.map((node, depth) => ({ node, depth, role: 'ancestor' as const }));
  const self = { node: lineage.entry, depth: ancestors.length, role: 'self' as const };
  return [...ancestors, self, ...flattenTree(lineage.descendants, ancestors.length + 1)];
}

/** How many published entries the tree shows besides this one (siblings included). */
export function relativesCount(lineage: Lineage): number {
  return lineageRows(lineage).length - 1 + lineage.siblings.length;
}
