import { sql } from 'drizzle-orm';
import { index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid, bigserial } from 'drizzle-orm/pg-core';
import { entries } from './community';
import { users } from './users';

/** What a report or a moderation action can be about (contracts' REPORT_TARGET_KINDS). */
const TARGET_KINDS = ['entry', 'comment', 'photo'] as const;

/**
 * The showcase: entries chosen by moderators, in the order they set (`position` ascending, 0 first).
 * A row outlives the entry being hidden (the showcase leaves it out meanwhile, and it comes back
 * in its place on restore); deleting the entry removes it.
 */
export const showcaseItems = pgTable(
  'showcase_items',
  {
    entryId: uuid('entry_id').primaryKey().references(() => entries.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    /** The curator's note shown beside the entry. */
    note: text('note').notNull(),
    featuredBy: uuid('featured_by').references(() => users.id, { onDelete: 'set null' }),
    featuredAt: timestamp('featured_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('showcase_items_position_idx').on(t.position)],
);
export type ShowcaseItemRow = typeof showcaseItems.$inferSelect;

/**
 * A member's report of an entry, a comment or a photo. One open report per member per item (the
 * partial unique index); a moderator closes every open report of an item at once, as dismissed or
 * upheld (the item was hidden). The target is named by kind and id, not by foreign key, so a report
 * keeps its history when its comment or photo is deleted.
 */
export const reports = pgTable(
  'reports',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    targetKind: text('target_kind', { enum: TARGET_KINDS }).notNull(),
    targetId: uuid('target_id').notNull(),
    /** The entry the item belongs to (the entry itself for an entry), for the desk's context. */
    entryId: uuid('entry_id').notNull().references(() => entries.id, { onDelete: 'cascade' }),
    reporterId: uuid('reporter_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    reason: text('reason', { enum: ['spam', 'unsafe', 'not_their_work', 'offensive', 'other'] }).notNull(),
    details: text('details').notNull().default(''),
    status: text('status', { enum: ['open', 'dismissed', 'upheld'] }).notNull().default('open'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    resolvedAt: timestamp('resolved_at', { withTimezone: true }),
    resolvedBy: uuid('resolved_by').references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [
    uniqueIndex('reports_one_open_idx').on(t.targetKind, t.targetId, t.reporterId).where(sql`status = 'open'`),
    index('reports_open_idx').on(t.createdAt).where(sql`status = 'open'`),
    index('reports_target_idx').on(t.targetKind, t.targetId, t.createdAt),
    index('reports_reporter_idx').on(t.reporterId, t.createdAt),
  ],
);
export type ReportRow = typeof reports.$inferSelect;

/**
 * Every moderation and role action: who, what, which item, why, when. Append-only: no route
 * changes or removes a row, and a trigger (migration 0003) refuses UPDATE and DELETE outright.
 * Names and titles are copied in at the moment (`actorName`, `targetLabel`, `subjectName`) so a
 * line still reads right after a rename or a deletion. The user columns carry no foreign key, so
 * nothing ever has to rewrite a row.
 */
export const auditLog = pgTable(
  'audit_log',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    /** The order lines were written in: lines of one transaction share `at`. */
    seq: bigserial('seq', { mode: 'number' }).notNull(),
    /** Null for actions taken outside the app (the command line). */
    actorId: uuid('actor_id'),
    actorName: text('actor_name').notNull(),
    action: text('action').notNull(),
    targetKind: text('target_kind', { enum: [...TARGET_KINDS, 'user', 'showcase'] }).notNull(),
    targetId: uuid('target_id'),
    targetLabel: text('target_label').notNull().default(''),
    /** The member the action concerns: the item's author, or the account changed. */
    subjectId: uuid('subject_id'),
    subjectName: text('subject_name'),
    reason: text('reason'),
    details: jsonb('details').$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [
    index('audit_log_at_idx').on(t.at.desc()),
    index('audit_log_action_idx').on(t.action, t.at.desc()),
    index('audit_log_actor_idx').on(t.actorId, t.at.desc()),
    index('audit_log_target_idx').on(t.targetId, t.at.desc()),
  ],
);
export type AuditRow = typeof auditLog.$inferSelect;
