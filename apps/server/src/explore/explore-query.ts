import { and, arrayContains, count, eq, getTableColumns, gte, isNull, lte, sql, type SQL } from 'drizzle-orm';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import { SCHEDULE_KINDS, type ExplorePage, type ExploreQuery, type ExploreSort, type ScheduleKind } from '@barwright/contracts';
import { entries, entryRevisions, users } from '../../../../db/schema';
import type { Db } from '../database/database';
import { toEntryCard } from '../publishing/entry-views';

/** Cutter sizes are stored as computed from inches too (4.7625 mm = 3/16 in): compare with a hair of slack. */
const MM_SLACK = 1e-6;

/** Everything a card shows; the text-search document stays in the database. */
const { search: _search, ...cardColumns } = getTableColumns(entries);

const tsQuery = (q: string) => sql`websearch_to_tsquery('english', ${q})`;

/**
 * The latest revision's phase schedule, read from its design file (the entries table keeps no copy;
 * the revision is found through the unique (entry, number) index).
 */
const scheduleKind = sql<ScheduleKind>`(SELECT ${entryRevisions.design} -> 'study' -> 'schedule' ->> 'kind' FROM ${entryRevisions}
  WHERE ${entryRevisions.entryId} = ${entries.id} AND ${entryRevisions.number} = ${entries.latestRevision})`;
/** Plain first, then barleycorn, basket weave, moiré, twist, a list: the order of SCHEDULE_KINDS. */
const scheduleRank = sql`array_position(ARRAY[${sql.join(SCHEDULE_KINDS.map((k) => sql`${k}`), sql`, `)}]::text[], ${scheduleKind})`;

/** The WHERE of a query: listed entries (not hidden, not deleted) matching every filter given. */
export function exploreConditions(q: ExploreQuery): SQL {
  const where: SQL[] = [isNull(entries.deletedAt), isNull(entries.hiddenAt)];
  if (q.lobes !== undefined) where.push(eq(entries.lobes, q.lobes));
  if (q.wave) where.push(eq(entries.wave, q.wave));
  if (q.material) where.push(eq(entries.material, q.material));
  if (q.schedule) where.push(sql`${scheduleKind} = ${q.schedule}`);
  if (q.cutterMin !== undefined) where.push(gte(entries.cutterDiameterMm, q.cutterMin - MM_SLACK));
  if (q.cutterMax !== undefined) where.push(lte(entries.cutterDiameterMm, q.cutterMax + MM_SLACK));
  if (q.tags?.length) where.push(arrayContains(entries.tags, q.tags));
  if (q.author) where.push(eq(entries.authorId, q.author));
  if (q.q) where.push(sql`${entries.search} @@ ${tsQuery(q.q)}`);
  return and(...where)!;
}

/**
 * Descending as the indexes are built (drizzle writes DESC NULLS LAST). A plain DESC means NULLS
 * FIRST in PostgreSQL, which the planner will not serve from such an index even on NOT NULL columns.
 */
const descending = (column: AnyPgColumn) => sql`${column} DESC NULLS LAST`;

/**
 * Each sort matches one partial index of the entries table (see db/schema/community.ts), ending
 * with the newest first and the id so that the order is total and pages never overlap.
 */
function orderFor(sort: ExploreSort, q: ExploreQuery): SQL[] {
  const tail = [descending(entries.publishedAt), descending(entries.id)];
  switch (sort) {
    case 'top':
      return [descending(entries.ratingScore), ...tail];
    case 'remixed':
      return [descending(entries.remixCount), ...tail];
    case 'discussed':
      return [descending(entries.commentCount), ...tail];
    case 'schedule':
      return [sql`${scheduleRank} ASC NULLS LAST`, ...tail];
    case 'relevance':
      return [sql`ts_rank(${entries.search}, ${tsQuery(q.q ?? '')}) DESC`, ...tail];
    case 'newest':
      return tail;
  }
}

export const sortOf = (q: ExploreQuery): ExploreSort => q.sort ?? (q.q ? 'relevance' : 'newest');

/** The query of one page's rows (exposed so the benchmark can EXPLAIN it). */
export function exploreItemsQuery(db: Db, q: ExploreQuery) {
  return db
    .select({ entry: cardColumns, authorName: users.displayName, schedule: scheduleKind })
    .from(entries)
    .innerJoin(users, eq(users.id, entries.authorId))
    .where(exploreConditions(q))
    .orderBy(...orderFor(sortOf(q), q))
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
}

/** One page of Explore, with the total over all pages. */
export async function explorePage(db: Db, q: ExploreQuery): Promise<ExplorePage> {
  const rows = await exploreItemsQuery(db, q);
  const [{ total }] = await db.select({ total: count() }).from(entries).where(exploreConditions(q));
  return {
    items: rows.map((r) => ({ ...toEntryCard(r.entry, { id: r.entry.authorId, displayName: r.authorName }), ...(r.schedule ? { schedule: r.schedule } : {}) })),
    total,
    page: q.page,
    pageSize: q.pageSize,
    sort: sortOf(q),
  };
}
