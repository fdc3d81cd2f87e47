import { and, asc, count, eq, getTableColumns, isNull, max, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { SHOWCASE_MAX, type CuratedItem, type ShowcaseItem } from '@barwright/contracts';
import { entries, showcaseItems, users, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { recordAudit } from '../audit/audit-log';
import { HttpError, notFound } from '../http/http-error';
import { isUuid } from '../http/uuid';
import { findLiveEntry } from '../publishing/entry-access';
import { toEntryCard } from '../publishing/entry-views';
import { showcaseMoves } from './showcase-moves';

const { search: _search, ...cardColumns } = getTableColumns(entries);
const curator = alias(users, 'curator');

/** The showcase rows with their entries, first shown first; `withHidden` for the curators. Deleted entries never appear. */
async function showcaseRows(db: Db, withHidden: boolean) {
  return db
    .select({ item: showcaseItems, entry: cardColumns, authorName: users.displayName, curatorName: curator.displayName })
    .from(showcaseItems)
    .innerJoin(entries, eq(entries.id, showcaseItems.entryId))
    .innerJoin(users, eq(users.id, entries.authorId))
    .leftJoin(curator, eq(curator.id, showcaseItems.featuredBy))
    .where(and(isNull(entries.deletedAt), withHidden ? undefined : isNull(entries.hiddenAt)))
    .orderBy(asc(showcaseItems.position), asc(showcaseItems.featuredAt));
}

type Row = Awaited<ReturnType<typeof showcaseRows>>[number];

const toShowcaseItem = (r: Row, position: number): ShowcaseItem => ({
  entry: toEntryCard(r.entry, { id: r.entry.authorId, displayName: r.authorName }),
  note: r.item.note,
  featuredAt: r.item.featuredAt.toISOString(),
  featuredBy: r.item.featuredBy ? { id: r.item.featuredBy, displayName: r.curatorName ?? '' } : null,
  position,
});

/** `GET /api/showcase`: what members and visitors see (hidden entries left out, positions counted among those shown). */
export async function publicShowcase(db: Db): Promise<ShowcaseItem[]> {
  return (await showcaseRows(db, false)).map(toShowcaseItem);
}

/** The curators' list: every featured entry, hidden ones flagged. */
export async function curatedShowcase(db: Db): Promise<CuratedItem[]> {
  return (await showcaseRows(db, true)).map((r, i) => ({ ...toShowcaseItem(r, i), hidden: r.entry.hiddenAt !== null, hiddenReason: r.entry.hiddenReason }));
}

async function curatedItem(db: Db, entryId: string): Promise<CuratedItem> {
  const item = (await curatedShowcase(db)).find((i) => i.entry.id === entryId);
  if (!item) throw notFound('showcase entry');
  return item;
}

/** Adds an entry at the end of the showcase. */
export async function featureEntry(db: Db, viewer: UserRow, entryId: string, note: string): Promise<CuratedItem> {
  const entry = await findLiveEntry(db, entryId);
  if (!entry) throw notFound('entry');
  if (entry.hiddenAt) throw new HttpError(409, 'entry_hidden', 'This bar is hidden by the moderators; restore it before featuring it.');
  await db.transaction(async (tx) => {
    const [{ n, last }] = await tx.select({ n: count(), last: max(showcaseItems.position) }).from(showcaseItems);
    if (n >= SHOWCASE_MAX) throw new HttpError(409, 'showcase_full', `The showcase holds at most ${SHOWCASE_MAX} bars; take one out first.`);
    const [row] = await tx.insert(showcaseItems).values({ entryId, note, featuredBy: viewer.id, position: (last ?? -1) + 1 }).onConflictDoNothing().returning();
    if (!row) throw new HttpError(409, 'already_featured', 'This bar is in the showcase already; edit its note instead.');
    await recordAudit(tx, { actor: viewer, action: 'showcase.feature', target: { kind: 'entry', id: entryId, label: entry.title }, subject: null, reason: note });
  });
  return curatedItem(db, entryId);
}

async function featured(db: Db, entryId: string) {
  const [row] = isUuid(entryId)
    ? await db.select({ item: showcaseItems, title: entries.title }).from(showcaseItems).innerJoin(entries, eq(entries.id, showcaseItems.entryId)).where(and(eq(showcaseItems.entryId, entryId), isNull(entries.deletedAt)))
    : [];
  if (!row) throw notFound('showcase entry');
  return row;
}

export async function editNote(db: Db, viewer: UserRow, entryId: string, note: string): Promise<CuratedItem> {
  const { item, title } = await featured(db, entryId);
  await db.transaction(async (tx) => {
    await tx.update(showcaseItems).set({ note, updatedAt: new Date() }).where(eq(showcaseItems.entryId, entryId));
    await recordAudit(tx, { actor: viewer, action: 'showcase.note', target: { kind: 'entry', id: entryId, label: title }, reason: note, details: { before: item.note } });
  });
  return curatedItem(db, entryId);
}

export async function unfeature(db: Db, viewer: UserRow, entryId: string): Promise<void> {
  const { item, title } = await featured(db, entryId);
  await db.transaction(async (tx) => {
    await tx.delete(showcaseItems).where(eq(showcaseItems.entryId, entryId));
    await recordAudit(tx, { actor: viewer, action: 'showcase.unfeature', target: { kind: 'entry', id: entryId, label: title }, details: { note: item.note } });
  });
}

/**
 * Sets the order: `entryIds` must name every featured entry once (409 when the showcase changed
 * meanwhile). The audit line says what moved: one entry and its places (target: that entry, so the
 * item's own history shows it), or every entry that changed place; the same order writes no line.
 */
export async function reorder(db: Db, viewer: UserRow, entryIds: string[], moved?: string): Promise<CuratedItem[]> {
  const curated = await curatedShowcase(db);
  const current = curated.map((i) => i.entry.id);
  if (current.length !== entryIds.length || current.some((id) => !entryIds.includes(id))) {
    throw new HttpError(409, 'showcase_changed', 'The showcase changed while you were ordering it (someone added or removed a bar). Reload and order it again.');
  }
  const moves = showcaseMoves(current, entryIds, new Map(curated.map((i) => [i.entry.id, i.entry.title])), moved);
  if (moves.length === 0) return curated;
  await db.transaction(async (tx) => {
    for (const [position, entryId] of entryIds.entries()) {
      await tx.update(showcaseItems).set({ position, updatedAt: sql`now()` }).where(eq(showcaseItems.entryId, entryId));
    }
    const [one] = moves;
    const target = moves.length === 1 ? { kind: 'entry' as const, id: one.entryId, label: one.title } : { kind: 'showcase' as const, id: null, label: 'the showcase' };
    await recordAudit(tx, { actor: viewer, action: 'showcase.reorder', target, details: { moves, order: entryIds, before: current } });
  });
  return curatedShowcase(db);
}
