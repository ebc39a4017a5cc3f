import { index, integer, jsonb, pgTable, real, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { studios, users } from './auth';
import { products } from './products';

export type ExportStatus = 'queued' | 'running' | 'done' | 'failed';
export type ExportKind = 'print-file' | 'bundle';
/** One file of an export, stored in S3 under the export's own prefix. */
export type ExportFile = { name: string; key: string; contentType: string; bytes: number };
export type ExportError = { code: string; message: string };

// One export of a product: print file or bundle, rendered by the 'export-product' job.
export const productExports = pgTable(
  'product_exports',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    productId: uuid('product_id').notNull().references(() => products.id, { onDelete: 'cascade' }),
    // the product's revision when asked for, so a later save does not change what is exported
    productRevision: integer('product_revision').notNull(),
    kind: text('kind').$type<ExportKind>().notNull(),
    // A4 or US Letter for the proof sheet
    paper: text('paper').$type<'a4' | 'letter'>().notNull().default('a4'),
    status: text('status').$type<ExportStatus>().notNull().default('queued'),
    progress: real('progress').notNull().default(0),
    files: jsonb('files').$type<ExportFile[]>().notNull().default([]),
    error: jsonb('error').$type<ExportError>(),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('product_exports_studio_idx').on(t.studioId, t.createdAt), index('product_exports_product_idx').on(t.productId)],
);
