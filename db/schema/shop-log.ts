import { sql } from 'drizzle-orm';
import { check, date, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { designs } from './boards';
import { entries } from './community';
import { users } from './users';

/**
 * Shop-log photos, on a published entry or on a board design. The files live under the uploads
 * directory with names the server made (`fileName`, `thumbName`); nothing of the upload's own
 * name or metadata is kept.
 */
export const photos = pgTable(
  'photos',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    entryId: uuid('entry_id').references(() => entries.id, { onDelete: 'cascade' }),
    designId: uuid('design_id').references(() => designs.id, { onDelete: 'cascade' }),
    uploaderId: uuid('uploader_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: ['trial', 'keeper'] }).notNull(),
    caption: text('caption').notNull().default(''),
    material: text('material').notNull().default(''),
    takenOn: date('taken_on', { mode: 'string' }).notNull(),
    mime: text('mime', { enum: ['image/jpeg', 'image/png', 'image/webp'] }).notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    bytes: integer('bytes').notNull(),
    fileName: text('file_name').notNull(),
    thumbName: text('thumb_name').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    /** Set by moderation (db/schema/moderation.ts): seen only by its uploader and moderators. Reversible. */
    hiddenAt: timestamp('hidden_at', { withTimezone: true }),
    hiddenReason: text('hidden_reason'),
  },
  (t) => [
    index('photos_entry_idx').on(t.entryId, t.createdAt),
    index('photos_design_idx').on(t.designId, t.createdAt),
    index('photos_uploader_idx').on(t.uploaderId, t.createdAt),
    check('photos_target_check', sql`num_nonnulls(${t.entryId}, ${t.designId}) = 1`),
  ],
);
export type PhotoRow = typeof photos.$inferSelect;
