import { index, integer, jsonb, pgTable, primaryKey, text, timestamp, uuid, check } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import type { CandidateKey, RackShop, RosetteObject, SweepChoices, VotePick } from '@barwright/contracts';
import { boards, designs } from './boards';
import { users } from './users';

/** A rosette a member owns: the design file's `rosette` object, in its own units. */
export const rackRosettes = pgTable(
  'rack_rosettes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ownerId: uuid('owner_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    units: text('units', { enum: ['mm', 'in'] }).notNull(),
    rosette: jsonb('rosette').$type<RosetteObject>().notNull(),
    tags: jsonb('tags').$type<string[]>().notNull().default([]),
    notes: text('notes').notNull().default(''),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('rack_rosettes_owner_idx').on(t.ownerId, t.createdAt)],
);
export type RackRosetteRow = typeof rackRosettes.$inferSelect;

/** The rest of a member's shop (rubbers, travels, cutters, followers, V-cutters), one row per member. */
export const rackShops = pgTable('rack_shops', {
  ownerId: uuid('owner_id').primaryKey().references(() => users.id, { onDelete: 'cascade' }),
  shop: jsonb('shop').$type<RackShop>().notNull(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

/** A saved sweep: its choices and shortlist, never its results. */
export const savedSweeps = pgTable(
  'saved_sweeps',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    ownerId: uuid('owner_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    choices: jsonb('choices').$type<SweepChoices>().notNull(),
    shortlist: jsonb('shortlist').$type<CandidateKey[]>().notNull().default([]),
    candidates: integer('candidates').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('saved_sweeps_owner_idx').on(t.ownerId, t.updatedAt)],
);

/** The rack rosette a board design was created from (a shortlist sent to a board). */
export const designRackOrigins = pgTable('design_rack_origins', {
  designId: uuid('design_id').primaryKey().references(() => designs.id, { onDelete: 'cascade' }),
  rackRosetteId: uuid('rack_rosette_id').references(() => rackRosettes.id, { onDelete: 'set null' }),
  /** The rosette's name when the design was made (the rack rosette may be renamed or deleted later). */
  rosetteName: text('rosette_name').notNull(),
});

/** "Which would you cut?" over 3 to 30 designs of a board. */
export const votes = pgTable(
  'votes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    boardId: uuid('board_id').notNull().references(() => boards.id, { onDelete: 'cascade' }),
    question: text('question').notNull(),
    designIds: jsonb('design_ids').$type<string[]>().notNull(),
    createdBy: uuid('created_by').notNull().references(() => users.id),
    closesAt: timestamp('closes_at', { withTimezone: true }).notNull(),
    /** Set when closed by hand or, lazily, once closesAt has passed (the close notification went out). */
    closedAt: timestamp('closed_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('votes_board_idx').on(t.boardId, t.createdAt)],
);
export type VoteRow = typeof votes.$inferSelect;

/** One answer per member per pair; the pair is stored in order (lowId, highId) and `pick` is said of that order. */
export const voteAnswers = pgTable(
  'vote_answers',
  {
    voteId: uuid('vote_id').notNull().references(() => votes.id, { onDelete: 'cascade' }),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    lowId: uuid('low_id').notNull(),
    highId: uuid('high_id').notNull(),
    pick: text('pick', { enum: ['a', 'b', 'tie'] }).$type<VotePick>().notNull(),
    answeredAt: timestamp('answered_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.voteId, t.userId, t.lowId, t.highId] }), check('vote_answers_order', sql`${t.lowId} < ${t.highId}`)],
);
