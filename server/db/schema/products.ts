import { sql } from 'drizzle-orm';
import { index, integer, jsonb, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { Template } from '../../../shared/templates/template-schema';
import { studios, users } from './auth';
import { collections } from './library';
import { motifs } from './originals';

// A studio's own templates, entered from their printer's figures (built-ins live in shared/).
export const studioTemplates = pgTable(
  'studio_templates',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    spec: jsonb('spec').$type<Template>().notNull(),
    // The printer's guide image, shown over the canvas and never printed.
    guideImageKey: text('guide_image_key'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('studio_templates_studio_idx').on(t.studioId)],
);

export type ProductStage = 'idea' | 'drafting' | 'proofing' | 'sampling' | 'ready' | 'listed' | 'retired';

export const products = pgTable(
  'products',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    // A built-in template id ('mug-11oz') or a studio template's uuid.
    templateId: text('template_id').notNull(),
    layout: jsonb('layout').notNull(),
    // Bumped by every save; a save naming an older revision is a stale tab and is refused.
    revision: integer('revision').notNull().default(1),
    stage: text('stage').$type<ProductStage>().notNull().default('drafting'),
    notes: text('notes').notNull().default(''),
    // the studio's own words for finding products ('mug', 'gift', 'bestseller')
    tags: text('tags').array().notNull().default(sql`'{}'::text[]`),
    // the collection it is launched with (its season window and launch date drive the calendar)
    collectionId: uuid('collection_id').references(() => collections.id, { onDelete: 'set null' }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('products_studio_idx').on(t.studioId, t.updatedAt), index('products_collection_idx').on(t.collectionId)],
);

// "Where used": rewritten from the layout at every save.
export const productMotifs = pgTable(
  'product_motifs',
  {
    productId: uuid('product_id').notNull().references(() => products.id, { onDelete: 'cascade' }),
    motifId: uuid('motif_id').notNull().references(() => motifs.id, { onDelete: 'restrict' }),
    placementId: text('placement_id').notNull(),
    version: integer('version').notNull(),
  },
  (t) => [primaryKey({ columns: [t.productId, t.placementId] }), index('product_motifs_motif_idx').on(t.motifId)],
);
