import * as z from 'zod';
import type { DesignChange } from './design-diff';

/**
 * Remix and lineage.
 *   POST /api/entries/:id/remix      RemixBody → 201 RemixResult  (editor or owner on that board; 409 for a hidden entry)
 *   GET  /api/entries/:id/lineage    → Lineage
 *   GET  /api/entries/:id/remixes    → EntryCard[] (published remixes of this entry, newest first)
 *   GET  /api/entries/:id/changes    → EntryChanges (latest revision against the revision it was remixed from)
 * A remix is a new board design holding a copy of the latest revision's file; when it is
 * published, its entry records that revision as its parent and keeps the chain's root.
 */
export const remixBody = z.strictObject({ boardId: z.uuid('must be a board id') });
export type RemixBody = z.input<typeof remixBody>;

export interface RemixResult {
  designId: string;
  boardId: string;
  /** The revision copied. */
  parentEntryId: string;
  parentRevision: number;
}

/** An entry in the lineage view; an entry that is hidden or deleted shows as unavailable, keeping the tree's shape. */
export type LineageNode =
  | {
      id: string;
      available: true;
      title: string;
      author: { id: string; displayName: string };
      publishedAt: string;
      thumbnailUrl: string;
      remixCount: number;
    }
  | { id: string; available: false };

export type LineageTreeNode = LineageNode & { children: LineageTreeNode[] };

export interface Lineage {
  entry: LineageNode;
  rootEntryId: string;
  /** From the root down to the parent (empty for an original). */
  ancestors: LineageNode[];
  /** Other published remixes of the same parent. */
  siblings: LineageNode[];
  /** The entry's remixes and theirs, as a tree. */
  descendants: LineageTreeNode[];
}

export interface EntryChanges {
  /** Null for an original: nothing to compare against. */
  parent: { entryId: string; revision: number; title: string | null } | null;
  /** The latest revision's number. */
  revision: number;
  changes: DesignChange[];
}
