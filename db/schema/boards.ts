import { customType, index, pgTable, primaryKey, text, timestamp, uuid, bigserial, integer } from 'drizzle-orm/pg-core';
import { users } from './users';

/** Binary columns (Yjs updates and snapshots) as Uint8Array on both drivers. */
export const bytea = customType<{ data: Uint8Array; driverData: Uint8Array | Buffer }>({
  dataType: () => 'bytea',
  toDriver: (value) => (typeof Buffer !== 'undefined' ? Buffer.from(value.buffer, value.byteOffset, value.byteLength) : value),
  fromDriver: (value) => new Uint8Array(value),
});

export const boards = pgTable('boards', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull(),
  ownerId: uuid('owner_id').notNull().references(() => users.id),
  archivedAt: timestamp('archived_at', { withTimezone: true }),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});
export type BoardRow = typeof boards.$inferSelect;

/** One row per member; the owner is a member with role `owner`. */
export const boardMembers = pgTable(
  'board_members',
  {
    boardId: uuid('board_id').notNull().references(() => boards.id, { onDelete: 'cascade' }),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    role: text('role', { enum: ['owner', 'editor', 'viewer'] }).notNull(),
    addedAt: timestamp('added_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.boardId, t.userId] }), index('board_members_user_idx').on(t.userId)],
);

export const boardInvitations = pgTable(
  'board_invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    boardId: uuid('board_id').notNull().references(() => boards.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role', { enum: ['editor', 'viewer'] }).notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: uuid('invited_by').notNull().references(() => users.id),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('board_invitations_board_idx').on(t.boardId)],
);

/** A bar design on a board; its content is the Yjs document in `design_updates`. */
export const designs = pgTable(
  'designs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    boardId: uuid('board_id').notNull().references(() => boards.id, { onDelete: 'cascade' }),
    title: text('title').notNull(),
    createdBy: uuid('created_by').notNull().references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    /** Deleted designs are kept for 30 days and can be restored until then. */
    deletedAt: timestamp('deleted_at', { withTimezone: true }),
  },
  (t) => [index('designs_board_idx').on(t.boardId)],
);
export type DesignRow = typeof designs.$inferSelect;

/** Every Yjs update as it arrived (or a compacted state that replaced many of them), in order. */
export const designUpdates = pgTable(
  'design_updates',
  {
    seq: bigserial('seq', { mode: 'number' }).primaryKey(),
    designId: uuid('design_id').notNull().references(() => designs.id, { onDelete: 'cascade' }),
    update: bytea('update').notNull(),
    /** How many arrived updates this row stands for (1, or more after compaction). */
    merged: integer('merged').notNull().default(1),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('design_updates_design_idx').on(t.designId, t.seq)],
);

/** Named versions: a full Yjs state with its author and time. */
export const designVersions = pgTable(
  'design_versions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    designId: uuid('design_id').notNull().references(() => designs.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    authorId: uuid('author_id').notNull().references(() => users.id),
    state: bytea('state').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('design_versions_design_idx').on(t.designId)],
);
