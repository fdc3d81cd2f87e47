import { eq, inArray } from 'drizzle-orm';
import type { ReportTarget, ReportTargetKind } from '@barwright/contracts';
import { comments, entries, photos } from '../../../../db/schema';
import type { Db } from '../database/database';
import { thumbnailUrl } from '../publishing/entry-views';
import { isUuid } from '../http/uuid';

/** What the desk needs to know of a reported item, whatever its kind. */
export interface TargetFacts {
  kind: ReportTargetKind;
  id: string;
  /** The entry it belongs to (itself for an entry). */
  entryId: string;
  entryTitle: string;
  /** For a comment or a photo: the entry it sits on is hidden or deleted, so nobody but moderators reaches it anyway. */
  entryClosed: boolean;
  authorId: string;
  excerpt: string;
  thumbnailUrl: string | null;
  link: string;
  createdAt: Date;
  hiddenAt: Date | null;
  hiddenReason: string | null;
  /** Deleted by its author since. */
  gone: boolean;
  /** For an entry: the entry it remixes, whose remix count follows its visibility. */
  parentEntryId: string | null;
}

export const targetKey = (t: Pick<ReportTarget, 'kind' | 'id'>) => `${t.kind}:${t.id}`;
const EXCERPT_MAX = 400;
const excerpt = (text: string) => (text.length > EXCERPT_MAX ? `${text.slice(0, EXCERPT_MAX - 1)}…` : text);

async function entryTargets(db: Db, ids: string[]): Promise<TargetFacts[]> {
  if (!ids.length) return [];
  const rows = await db
    .select({ id: entries.id, title: entries.title, description: entries.description, authorId: entries.authorId, publishedAt: entries.publishedAt, hiddenAt: entries.hiddenAt, hiddenReason: entries.hiddenReason, deletedAt: entries.deletedAt, parentEntryId: entries.parentEntryId })
    .from(entries)
    .where(inArray(entries.id, ids));
  return rows.map((e) => ({
    kind: 'entry',
    id: e.id,
    entryId: e.id,
    entryTitle: e.title,
    entryClosed: false,
    authorId: e.authorId,
    excerpt: excerpt(e.description),
    thumbnailUrl: thumbnailUrl(e.id),
    link: `/entries/${e.id}`,
    createdAt: e.publishedAt,
    hiddenAt: e.hiddenAt,
    hiddenReason: e.hiddenReason,
    gone: e.deletedAt !== null,
    parentEntryId: e.parentEntryId,
  }));
}

async function commentTargets(db: Db, ids: string[]): Promise<TargetFacts[]> {
  if (!ids.length) return [];
  const rows = await db
    .select({ comment: comments, title: entries.title, entryHidden: entries.hiddenAt, entryDeleted: entries.deletedAt })
    .from(comments)
    .innerJoin(entries, eq(entries.id, comments.entryId))
    .where(inArray(comments.id, ids));
  return rows.map(({ comment: c, ...e }) => ({
    kind: 'comment',
    id: c.id,
    entryId: c.entryId,
    entryTitle: e.title,
    entryClosed: e.entryHidden !== null || e.entryDeleted !== null,
    authorId: c.authorId,
    excerpt: excerpt(c.body),
    thumbnailUrl: null,
    link: `/entries/${c.entryId}#comments`,
    createdAt: c.createdAt,
    hiddenAt: c.hiddenAt,
    hiddenReason: c.hiddenReason,
    gone: c.deletedAt !== null || e.entryDeleted !== null,
    parentEntryId: null,
  }));
}

async function photoTargets(db: Db, ids: string[]): Promise<TargetFacts[]> {
  if (!ids.length) return [];
  // Only photos on published entries are public, and so reportable; board photos stay among the board's members.
  const rows = await db
    .select({ photo: photos, title: entries.title, entryHidden: entries.hiddenAt, entryDeleted: entries.deletedAt })
    .from(photos)
    .innerJoin(entries, eq(entries.id, photos.entryId))
    .where(inArray(photos.id, ids));
  return rows.map(({ photo: p, ...e }) => ({
    kind: 'photo',
    id: p.id,
    entryId: p.entryId!,
    entryTitle: e.title,
    entryClosed: e.entryHidden !== null || e.entryDeleted !== null,
    authorId: p.uploaderId,
    excerpt: excerpt(p.caption),
    thumbnailUrl: `/api/photos/${p.id}/thumb`,
    link: `/entries/${p.entryId}`,
    createdAt: p.createdAt,
    hiddenAt: p.hiddenAt,
    hiddenReason: p.hiddenReason,
    gone: e.entryDeleted !== null,
    parentEntryId: null,
  }));
}

/** The items named, by `targetKey`; an item that no longer exists (a deleted photo) is missing from the map. */
export async function loadTargets(db: Db, targets: Pick<ReportTarget, 'kind' | 'id'>[]): Promise<Map<string, TargetFacts>> {
  const idsOf = (kind: ReportTargetKind) => [...new Set(targets.filter((t) => t.kind === kind && isUuid(t.id)).map((t) => t.id))];
  const found = [...(await entryTargets(db, idsOf('entry'))), ...(await commentTargets(db, idsOf('comment'))), ...(await photoTargets(db, idsOf('photo')))];
  return new Map(found.map((t) => [targetKey(t), t]));
}

export async function loadTarget(db: Db, target: Pick<ReportTarget, 'kind' | 'id'>): Promise<TargetFacts | undefined> {
  return (await loadTargets(db, [target])).get(targetKey(target));
}
