import { eq } from 'drizzle-orm';
import type { Lineage, LineageNode, LineageTreeNode } from '@barwright/contracts';
import { entries, users, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { seesHidden } from '../publishing/entry-access';
import { thumbnailUrl } from '../publishing/entry-views';

/** Largest family read for one lineage view. */
const FAMILY_MAX = 2000;

type Member = {
  id: string;
  parentEntryId: string | null;
  title: string;
  authorId: string;
  authorName: string;
  publishedAt: Date;
  remixCount: number;
  hiddenAt: Date | null;
  deletedAt: Date | null;
};

function nodeOf(m: Member, viewer?: UserRow): LineageNode {
  const available = !m.deletedAt && (!m.hiddenAt || seesHidden(m, viewer));
  if (!available) return { id: m.id, available: false };
  return {
    id: m.id,
    available: true,
    title: m.title,
    author: { id: m.authorId, displayName: m.authorName },
    publishedAt: m.publishedAt.toISOString(),
    thumbnailUrl: thumbnailUrl(m.id),
    remixCount: m.remixCount,
  };
}

/**
 * The remix family of an entry, read in one query by the root every member shares: ancestors
 * from the root down, siblings (other remixes of the same parent), and descendants as a tree.
 * Hidden or deleted members stay as unavailable nodes where they carry visible descendants,
 * so the chain is never broken; leaves that are unavailable are left out.
 */
export async function lineageOf(db: Db, entryId: string, rootEntryId: string, viewer?: UserRow): Promise<Lineage> {
  const family: Member[] = await db
    .select({
      id: entries.id,
      parentEntryId: entries.parentEntryId,
      title: entries.title,
      authorId: entries.authorId,
      authorName: users.displayName,
      publishedAt: entries.publishedAt,
      remixCount: entries.remixCount,
      hiddenAt: entries.hiddenAt,
      deletedAt: entries.deletedAt,
    })
    .from(entries)
    .innerJoin(users, eq(users.id, entries.authorId))
    .where(eq(entries.rootEntryId, rootEntryId))
    .orderBy(entries.publishedAt)
    .limit(FAMILY_MAX);
  const byId = new Map(family.map((m) => [m.id, m]));
  const children = new Map<string, Member[]>();
  for (const m of family) if (m.parentEntryId) children.set(m.parentEntryId, [...(children.get(m.parentEntryId) ?? []), m]);
  const self = byId.get(entryId)!;

  const ancestors: LineageNode[] = [];
  const seen = new Set([entryId]);
  for (let p = self.parentEntryId; p && !seen.has(p) && byId.has(p); p = byId.get(p)!.parentEntryId) {
    seen.add(p);
    ancestors.unshift(nodeOf(byId.get(p)!, viewer));
  }
  const siblings = self.parentEntryId
    ? (children.get(self.parentEntryId) ?? []).filter((m) => m.id !== entryId).map((m) => nodeOf(m, viewer)).filter((n) => n.available)
    : [];
  const tree = (id: string, depth: number): LineageTreeNode[] =>
    depth > 100
      ? []
      : (children.get(id) ?? [])
          .map((m) => ({ ...nodeOf(m, viewer), children: tree(m.id, depth + 1) }))
          .filter((n) => n.available || n.children.length > 0);
  return { entry: nodeOf(self, viewer), rootEntryId, ancestors, siblings, descendants: tree(entryId, 0) };
}
