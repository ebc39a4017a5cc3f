
import { boolean, index, integer, json, jsonb, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid, varchar } from 'drizzle-orm/pg-core';
import type { StudioRole } from '../../../shared/auth/permissions';

export const users = pgTable(
  'users',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    // Stored lower-cased; the unique index is the duplicate-account guard.
    email: text('email').notNull(),
    name: text('name').notNull(),
    passwordHash: text('password_hash').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('users_email_key').on(t.email)],
);

export const studios = pgTable('studios', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull(),
  paletteLimit: integer('palette_limit').notNull().default(6),
  readyWeeksBeforeLaunch: integer('ready_weeks_before_launch').notNull().default(8),
  // the shop export's column names, mapped once by the user: { date: 'Sale Date', sku: 'SKU', ... }
  salesColumnMapping: jsonb('sales_column_mapping').$type<Record<string, string>>(),
  // how a product's sales are shared among its motifs: evenly, or by their printed area
  salesSplitRule: text('sales_split_rule').$type<'even' | 'area'>().notNull().default('even'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

export const memberships = pgTable(
  'memberships',
  {
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    role: text('role').$type<StudioRole>().notNull(),
    // per person and studio: review requests and outcomes by e-mail, and in the app
    notifyByEmail: boolean('notify_by_email').notNull().default(true),
    notifyInApp: boolean('notify_in_app').notNull().default(true),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.studioId, t.userId] }), index('memberships_user_idx').on(t.userId)],
);

export const invitations = pgTable(
  'invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role').$type<StudioRole>().notNull(),
    // Only a hash of the token is kept, so a database leak does not leak usable links.
    tokenHash: text('token_hash').notNull(),
    invitedBy: uuid('invited_by').notNull().references(() => users.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('invitations_token_key').on(t.tokenHash), index('invitations_studio_idx').on(t.studioId)],
);

export const passwordResets = pgTable(
  'password_resets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    tokenHash: text('token_hash').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('password_resets_token_key').on(t.tokenHash)],
);

// The table connect-pg-simple expects (its own schema, created by our migrations).
export const sessions = pgTable(
  'session',
  {
    sid: varchar('sid').primaryKey(),
    sess: json('sess').notNull(),
    expire: timestamp('expire', { precision: 6 }).notNull(),
  },
  (t) => [index('IDX_session_expire').on(t.expire)],
);

