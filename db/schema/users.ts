import { pgTable, text, timestamp, uuid, index } from 'drizzle-orm/pg-core';

/** Accounts. E-mail is stored lower-cased; the role is one of contracts' ROLES. */
export const users = pgTable('users', {
  id: uuid('id').primaryKey().defaultRandom(),
  email: text('email').notNull().unique(),
  displayName: text('display_name').notNull(),
  passwordHash: text('password_hash').notNull(),
  role: text('role', { enum: ['member', 'moderator', 'admin'] }).notNull().default('member'),
  units: text('units', { enum: ['mm', 'in'] }).notNull().default('mm'),
  emailVerifiedAt: timestamp('email_verified_at', { withTimezone: true }),
  suspendedAt: timestamp('suspended_at', { withTimezone: true }),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  lastSignInAt: timestamp('last_sign_in_at', { withTimezone: true }),
});
export type UserRow = typeof users.$inferSelect;

/** Single-use tokens sent by e-mail; only their SHA-256 is kept. */
export const accountTokens = pgTable(
  'account_tokens',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    purpose: text('purpose', { enum: ['verify', 'reset'] }).notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('account_tokens_user_idx').on(t.userId)],
);
export type AccountTokenRow = typeof accountTokens.$inferSelect;
