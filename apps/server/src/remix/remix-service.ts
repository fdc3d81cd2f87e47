import { and, desc, eq, getTableColumns, isNull } from 'drizzle-orm';
import { DESIGN_TITLE_MAX, diffDesigns, type EntryCard, type EntryChanges, type RemixResult } from '@barwright/contracts';
import { designOrigins, designs, entries, entryRevisions, users, type EntryRow, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { requireBoardRole } from '../boards/board-access';
import { createDesign } from '../designs/designs-service';
import { requireRevision } from '../publishing/entry-access';
import { toEntryCard } from '../publishing/entry-views';

/**
 * Copies the entry's latest revision into a new design on one of the member's boards, and
 * records where it came from; its entry, once published, takes that revision as its parent.
 */
export async function remixEntry(db: Db, entry: EntryRow, user: UserRow, boardId: string): Promise<RemixResult> {
  await requireBoardRole(db, boardId, user.id, 'editor');
  const revision = await requireRevision(db, entry, undefined);
  const title = `${revision.title} (remix)`.slice(0, DESIGN_TITLE_MAX);
  const design = await createDesign(db, { boardId, title, createdBy: user.id, file: revision.design });
  try {
    await db.insert(designOrigins).values({ designId: design.id, parentRevisionId: revision.id, rootEntryId: entry.rootEntryId, remixedBy: user.id });
  } catch (error) {
    await db.delete(designs).where(eq(designs.id, design.id)); // nothing half-made
    throw error;
  }
  return { designId: design.id, boardId, parentEntryId: entry.id, parentRevision: revision.number };
}

const { search: _search, ...cardColumns } = getTableColumns(entries);

/** The published remixes of an entry that everyone may see, newest first. */
export async function remixesOf(db: Db, entryId: string): Promise<EntryCard[]> {
  const rows = await db
    .select({ entry: cardColumns, authorName: users.displayName })
    .from(entries)
    .innerJoin(users, eq(users.id, entries.authorId))
    .where(and(eq(entries.parentEntryId, entryId), isNull(entries.deletedAt), isNull(entries.hiddenAt)))
    .orderBy(desc(entries.publishedAt))
    .limit(500);
  return rows.map((r) => toEntryCard(r.entry, { id: r.entry.authorId, displayName: r.authorName }));
}

/** What the latest revision changed against the revision it was remixed from. */
export async function changesOf(db: Db, entry: EntryRow): Promise<EntryChanges> {
  const latest = await requireRevision(db, entry, undefined);
  if (!entry.parentRevisionId) return { parent: null, revision: latest.number, changes: [] };
  const [parent] = await db
    .select({ revision: entryRevisions, parentEntry: entries })
    .from(entryRevisions)
    .innerJoin(entries, eq(entries.id, entryRevisions.entryId))
    .where(eq(entryRevisions.id, entry.parentRevisionId));
  if (!parent) return { parent: null, revision: latest.number, changes: [] };
  const open = !parent.parentEntry.deletedAt && !parent.parentEntry.hiddenAt;
  return {
    parent: { entryId: parent.parentEntry.id, revision: parent.revision.number, title: open ? parent.revision.title : null },
    revision: latest.number,
    changes: diffDesigns(parent.revision.design, latest.design),
  };
}
