import { sql } from 'drizzle-orm';
import { bigint, date, index, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { studios } from './auth';
import { motifs } from './originals';

// Named groups of motifs (products join later through their own table), with an optional
// season window and launch date for the calendar.
export const collections = pgTable(
  'collections',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    notes: text('notes').notNull().default(''),
    // Calendar dates without a time of day: a season starts on a day, not at an instant.
    seasonStart: date('season_start', { mode: 'string' }),
    seasonEnd: date('season_end', { mode: 'string' }),
    launchDate: date('launch_date', { mode: 'string' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  // "Coastal Spring" and "coastal spring" would be the same collection to people.
  (t) => [uniqueIndex('collections_studio_name_key').on(t.studioId, sql`lower(${t.name})`)],
);

export const collectionMotifs = pgTable(
  'collection_motifs',
  {
    collectionId: uuid('collection_id').notNull().references(() => collections.id, { onDelete: 'cascade' }),
    motifId: uuid('motif_id').notNull().references(() => motifs.id, { onDelete: 'cascade' }),
    addedAt: timestamp('added_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.collectionId, t.motifId] }), index('collection_motifs_motif_idx').on(t.motifId)],
);

// The library's change counter, one row per studio. Every transaction that changes what the
// library shows bumps it as its last statement; web processes compare it with the version
// their in-memory search index was built at (see features/motifs/library-changes.ts).
export const libraryState = pgTable('library_state', {
  studioId: uuid('studio_id').primaryKey().references(() => studios.id, { onDelete: 'cascade' }),
  version: bigint('version', { mode: 'number' }).notNull(),
});

// What changed at each version: the motifs to re-read, or null for "re-read everything".
export const libraryChanges = pgTable(
  'library_changes',
  {
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    version: bigint('version', { mode: 'number' }).notNull(),
    motifIds: uuid('motif_ids').array(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.studioId, t.version] })],
);
