import { randomUUID } from 'node:crypto';
import { and, eq, isNull, sql, type SQL } from 'drizzle-orm';
import type { Design, EntryFacts, PublishResult } from '@barwright/contracts';
import { toMmValue } from '@barwright/engine';
import { designOrigins, entries, entryRevisions, type DesignRow, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { refreshRemixCount } from './entry-counts';
import { entryThumbnailSvg } from './entry-thumbnail';

/** The searchable facts of a design file and what the publisher said about it. */
export type PublishText = Pick<EntryFacts, 'title' | 'description' | 'tags'>;

export function entryFacts(design: Design, body: PublishText): EntryFacts {
  const layer = design.rosette.layers[0];
  return {
    title: body.title,
    description: body.description,
    tags: body.tags,
    lobes: layer.lobes,
    wave: layer.wave.shape,
    material: design.bar.material,
    cutterDiameterMm: toMmValue(design.cutter.diameter, design.units),
  };
}

/** The text-search document: title and tags weigh more than the description. */
export const searchDocument = (f: PublishText): SQL =>
  sql`setweight(to_tsvector('english', ${f.title}), 'A') || setweight(to_tsvector('english', ${f.tags.join(' ')}), 'A') || setweight(to_tsvector('english', ${f.description}), 'B')`;

/**
 * Publishes the design's current, validated file as a new immutable revision: of the design's
 * live entry when it has one, else of a new entry (which records the revision a remix came from).
 */
export async function publishDesign(
  db: Db, source: DesignRow, design: Design, user: UserRow, body: PublishText,
  /** The server passes its compute pool's; the demo seed draws its known-small bars in process. */
  thumbnail: (design: Design) => string | Promise<string> = entryThumbnailSvg,
): Promise<PublishResult> {
  const facts = entryFacts(design, body);
  const thumbnailSvg = await thumbnail(design);
  const revisionValues = { ...facts, design, authorId: user.id, thumbnailSvg };
  const result = await db.transaction(async (tx) => {
    const [live] = await tx
      .select()
      .from(entries)
      .where(and(eq(entries.designId, source.id), isNull(entries.deletedAt)))
      .for('update');
    const now = new Date();
    if (live) {
      const number = live.latestRevision + 1;
      await tx.insert(entryRevisions).values({ ...revisionValues, entryId: live.id, number, createdAt: now });
      await tx.update(entries).set({ ...facts, search: searchDocument(facts), latestRevision: number, updatedAt: now, boardId: source.boardId }).where(eq(entries.id, live.id));
      return { entryId: live.id, revision: number, created: false, parentEntryId: null };
    }
    const id = randomUUID();
    const origin = await originOf(tx, source.id);
    await tx.insert(entries).values({
      id,
      designId: source.id,
      boardId: source.boardId,
      authorId: user.id,
      parentRevisionId: origin?.parentRevisionId ?? null,
      parentEntryId: origin?.parentEntryId ?? null,
      rootEntryId: origin?.rootEntryId ?? id,
      ...facts,
      search: searchDocument(facts),
      publishedAt: now,
      updatedAt: now,
    });
    await tx.insert(entryRevisions).values({ ...revisionValues, entryId: id, number: 1, createdAt: now });
    return { entryId: id, revision: 1, created: true, parentEntryId: origin?.parentEntryId ?? null };
  });
  await refreshRemixCount(db, result.parentEntryId);
  return { entryId: result.entryId, revision: result.revision, created: result.created };
}

/** Where a remixed design came from: the revision copied, its entry, and the chain's root. */
async function originOf(db: Db, designId: string) {
  const [row] = await db
    .select({ parentRevisionId: designOrigins.parentRevisionId, rootEntryId: designOrigins.rootEntryId, parentEntryId: entryRevisions.entryId })
    .from(designOrigins)
    .innerJoin(entryRevisions, eq(entryRevisions.id, designOrigins.parentRevisionId))
    .where(eq(designOrigins.designId, designId));
  return row;
}

/** Deletes an entry for everyone (its revisions stay in the database; remixes keep their chain). */
export async function deleteEntry(db: Db, entry: { id: string; parentEntryId: string | null }): Promise<void> {
  await db.update(entries).set({ deletedAt: new Date() }).where(eq(entries.id, entry.id));
  await refreshRemixCount(db, entry.parentEntryId);
}
