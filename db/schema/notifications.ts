import { sql } from 'drizzle-orm';
import { boolean, index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { boards } from './boards';
import { comments, entries } from './community';
import { users } from './users';

/** What happened, for whom. `data` keeps the words of the moment (titles, names) for the sentence. */
export const notifications = pgTable(
  'notifications',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: ['remix', 'rating', 'comment', 'invitation', 'vote-opened', 'vote-closed', 'item-hidden', 'item-restored', 'entry-featured'] }).notNull(),
    actorId: uuid('actor_id').references(() => users.id, { onDelete: 'set null' }),
    entryId: uuid('entry_id').references(() => entries.id, { onDelete: 'cascade' }),
    boardId: uuid('board_id').references(() => boards.id, { onDelete: 'cascade' }),
    /** The comment a `comment` notification tells of, so it leaves the list while that comment is hidden. */
    commentId: uuid('comment_id').references(() => comments.id, { onDelete: 'cascade' }),
    data: jsonb('data').$type<{ entryTitle?: string; boardName?: string; actorName?: string; stars?: number; role?: string; voteId?: string; question?: string; itemKind?: 'bar' | 'comment' | 'photo'; reason?: string; note?: string }>().notNull().default({}),
    readAt: timestamp('read_at', { withTimezone: true }),
    /** Waiting for the member's daily digest e-mail. */
    digestPending: boolean('digest_pending').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('notifications_user_idx').on(t.userId, t.createdAt.desc()),
    index('notifications_unread_idx').on(t.userId).where(sql`read_at IS NULL`),
    index('notifications_digest_idx').on(t.userId).where(sql`digest_pending`),
  ],
);
export type NotificationRow = typeof notifications.$inferSelect;

/** E-mail preference per member; no row means `immediate`. */
export const notificationSettings = pgTable('notification_settings', {
  userId: uuid('user_id').primaryKey().references(() => users.id, { onDelete: 'cascade' }),
  email: text('email', { enum: ['immediate', 'digest', 'off'] }).notNull().default('immediate'),
  lastDigestAt: timestamp('last_digest_at', { withTimezone: true }),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});
