import { sql } from 'drizzle-orm';
import {
  check,
  customType,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  smallint,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  type AnyPgColumn,
} from 'drizzle-orm/pg-core';
import type { Design } from '@barwright/contracts';
import { boards, designs } from './boards';
import { users } from './users';

/** PostgreSQL's text-search document type; written by the server with to_tsvector('english', …). */
export const tsvector = customType<{ data: string }>({ dataType: () => 'tsvector' });

/** Entries Explore may list: neither deleted nor hidden. The partial indexes below share this predicate. */
const LISTED = sql`deleted_at IS NULL AND hidden_at IS NULL`;

/**
 * A published bar: a series of immutable revisions of one board design. The latest revision's
 * searchable facts are copied here, and its counters (ratings, remixes, comments) are kept up to
 * date, so Explore filters and sorts on this table alone, by index.
 */
export const entries = pgTable(
  'entries',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    /** The board design it is published from; null once that design is purged. */
    designId: uuid('design_id').references(() => designs.id, { onDelete: 'set null' }),
    boardId: uuid('board_id').references(() => boards.id, { onDelete: 'set null' }),
    /** Who published it first; the one who may delete it, and who cannot rate it. */
    authorId: uuid('author_id').notNull().references(() => users.id),
    /** For a remix: the revision it was copied from, that revision's entry, and the chain's root (itself for an original). */
    parentRevisionId: uuid('parent_revision_id').references((): AnyPgColumn => entryRevisions.id, { onDelete: 'set null' }),
    parentEntryId: uuid('parent_entry_id').references((): AnyPgColumn => entries.id, { onDelete: 'set null' }),
    rootEntryId: uuid('root_entry_id').notNull(),
    latestRevision: integer('latest_revision').notNull().default(1),
    title: text('title').notNull(),
    description: text('description').notNull().default(''),
    tags: text('tags').array().notNull().default(sql`'{}'::text[]`),
    lobes: integer('lobes').notNull(),
    wave: text('wave').notNull(),
    material: text('material').notNull(),
    cutterDiameterMm: doublePrecision('cutter_diameter_mm').notNull(),
    search: tsvector('search').notNull(),
    ratingCount: integer('rating_count').notNull().default(0),
    ratingSum: integer('rating_sum').notNull().default(0),
    /** Ratings of 4 or 5 stars. */
    ratingPositive: integer('rating_positive').notNull().default(0),
    /** Lower bound of the 95 % Wilson interval of ratingPositive / ratingCount (0 without ratings). */
    ratingScore: doublePrecision('rating_score').notNull().default(0),
    remixCount: integer('remix_count').notNull().default(0),
    commentCount: integer('comment_count').notNull().default(0),
    publishedAt: timestamp('published_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    /** Set by moderation; a hidden entry is seen only by its author and moderators. Reversible. */
    hiddenAt: timestamp('hidden_at', { withTimezone: true }),
    hiddenReason: text('hidden_reason'),
    deletedAt: timestamp('deleted_at', { withTimezone: true }),
  },
  (t) => [
    // One live entry per design: republishing adds revisions to it.
    uniqueIndex('entries_design_live_idx').on(t.designId).where(sql`deleted_at IS NULL`),
    index('entries_newest_idx').on(t.publishedAt.desc(), t.id.desc()).where(LISTED),
    index('entries_top_idx').on(t.ratingScore.desc(), t.publishedAt.desc(), t.id.desc()).where(LISTED),
    index('entries_remixed_idx').on(t.remixCount.desc(), t.publishedAt.desc(), t.id.desc()).where(LISTED),
    index('entries_discussed_idx').on(t.commentCount.desc(), t.publishedAt.desc(), t.id.desc()).where(LISTED),
    index('entries_author_idx').on(t.authorId, t.publishedAt.desc()),
    index('entries_lobes_idx').on(t.lobes).where(LISTED),
    index('entries_wave_material_idx').on(t.wave, t.material).where(LISTED),
    index('entries_cutter_idx').on(t.cutterDiameterMm).where(LISTED),
    index('entries_tags_idx').using('gin', t.tags),
    index('entries_search_idx').using('gin', t.search),
    index('entries_parent_idx').on(t.parentEntryId),
    index('entries_root_idx').on(t.rootEntryId),
  ],
);
export type EntryRow = typeof entries.$inferSelect;

/** One immutable published revision: the validated design file and what was said about it. */
export const entryRevisions = pgTable(
  'entry_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    entryId: uuid('entry_id').notNull().references((): AnyPgColumn => entries.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    authorId: uuid('author_id').notNull().references(() => users.id),
    design: jsonb('design').$type<Design>().notNull(),
    title: text('title').notNull(),
    description: text('description').notNull(),
    tags: text('tags').array().notNull(),
    lobes: integer('lobes').notNull(),
    wave: text('wave').notNull(),
    material: text('material').notNull(),
    cutterDiameterMm: doublePrecision('cutter_diameter_mm').notNull(),
    /** The line study drawn by the server at publication (SVG 1.1). */
    thumbnailSvg: text('thumbnail_svg').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('entry_revisions_number_idx').on(t.entryId, t.number)],
);
export type EntryRevisionRow = typeof entryRevisions.$inferSelect;

/** Where a remixed board design came from, so its entry records its parent when published. */
export const designOrigins = pgTable('design_origins', {
  designId: uuid('design_id').primaryKey().references(() => designs.id, { onDelete: 'cascade' }),
  parentRevisionId: uuid('parent_revision_id').notNull().references(() => entryRevisions.id, { onDelete: 'cascade' }),
  rootEntryId: uuid('root_entry_id').notNull().references(() => entries.id, { onDelete: 'cascade' }),
  remixedBy: uuid('remixed_by').notNull().references(() => users.id),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

/** One rating per member per entry. */
export const entryRatings = pgTable(
  'entry_ratings',
  {
    entryId: uuid('entry_id').notNull().references(() => entries.id, { onDelete: 'cascade' }),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    stars: smallint('stars').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.entryId, t.userId] }), index('entry_ratings_user_idx').on(t.userId), check('entry_ratings_stars_check', sql`${t.stars} BETWEEN 1 AND 5`)],
);

/** Plain-text comments, one level of replies; deleting keeps the row (its place in the thread). */
export const comments = pgTable(
  'comments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    entryId: uuid('entry_id').notNull().references(() => entries.id, { onDelete: 'cascade' }),
    authorId: uuid('author_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    parentId: uuid('parent_id').references((): AnyPgColumn => comments.id, { onDelete: 'cascade' }),
    body: text('body').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    editedAt: timestamp('edited_at', { withTimezone: true }),
    deletedAt: timestamp('deleted_at', { withTimezone: true }),
    /** Set by moderation (db/schema/moderation.ts): seen only by its author and moderators. Reversible. */
    hiddenAt: timestamp('hidden_at', { withTimezone: true }),
    hiddenReason: text('hidden_reason'),
  },
  (t) => [index('comments_entry_idx').on(t.entryId, t.createdAt), index('comments_author_idx').on(t.authorId, t.createdAt)],
);
export type CommentRow = typeof comments.$inferSelect;
