import { sql } from 'drizzle-orm';
import { bigint, bigserial, boolean, date, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { studios, users } from './auth';
import { products, type ProductStage } from './products';

// What a product is sold as: a blank or handle colour, a size. The SKU ties shop sales back.
export const productVariants = pgTable(
  'product_variants',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    productId: uuid('product_id').notNull().references(() => products.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    // the shop's stock-keeping code; unique in a studio (case-insensitive) so sales map to one variant
    sku: text('sku'),
    // e.g. { blankColour: '#1f3a5f', handleColour: '#ffffff', size: '11 oz' }
    options: jsonb('options').$type<Record<string, string>>().notNull().default({}),
    position: integer('position').notNull().default(0),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('product_variants_product_idx').on(t.productId),
    uniqueIndex('product_variants_studio_sku_key').on(t.studioId, sql`lower(${t.sku})`).where(sql`${t.sku} is not null`),
  ],
);

// Every stage move, in order: who, when, why, and whether an owner overrode the sample gate.
export const stageMoves = pgTable(
  'stage_moves',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    productId: uuid('product_id').notNull().references(() => products.id, { onDelete: 'cascade' }),
    fromStage: text('from_stage').$type<ProductStage>(),
    toStage: text('to_stage').$type<ProductStage>().notNull(),
    movedBy: uuid('moved_by').references(() => users.id, { onDelete: 'set null' }),
    note: text('note').notNull().default(''),
    override: boolean('override').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('stage_moves_product_idx').on(t.productId, t.createdAt)],
);

export type SampleVerdict = 'pending' | 'approved' | 'changes_needed';

// A sample ordered from the printer, and what the studio thought of it.
export const samples = pgTable(
  'samples',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    productId: uuid('product_id').notNull().references(() => products.id, { onDelete: 'cascade' }),
    orderedOn: date('ordered_on', { mode: 'string' }).notNull(),
    printer: text('printer').notNull().default(''),
    // minor units (cents, pence) of `currency` (ISO 4217 code), so sums stay exact
    costMinor: integer('cost_minor'),
    currency: text('currency'),
    expectedOn: date('expected_on', { mode: 'string' }),
    receivedOn: date('received_on', { mode: 'string' }),
    // the studio's own words about the order (tracking number, what was changed since the last one)
    notes: text('notes').notNull().default(''),
    verdict: text('verdict').$type<SampleVerdict>().notNull().default('pending'),
    verdictNotes: text('verdict_notes').notNull().default(''),
    verdictBy: uuid('verdict_by').references(() => users.id, { onDelete: 'set null' }),
    verdictAt: timestamp('verdict_at', { withTimezone: true }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('samples_product_idx').on(t.productId, t.orderedOn)],
);

// The studio's own photos of a sample: kept whole, plus a display size and a thumbnail.
export const samplePhotos = pgTable(
  'sample_photos',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    sampleId: uuid('sample_id').notNull().references(() => samples.id, { onDelete: 'cascade' }),
    fileName: text('file_name').notNull(),
    contentType: text('content_type').notNull(),
    byteSize: bigint('byte_size', { mode: 'number' }).notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    originalKey: text('original_key').notNull(),
    displayKey: text('display_key').notNull(),
    thumbKey: text('thumb_key').notNull(),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('sample_photos_sample_idx').on(t.sampleId)],
);

// Where a comment thread is pinned: a point of the layout (template pixels) or of a preview view.
export type CommentAnchor =
  | { surface: 'layout'; x: number; y: number; placementId?: string }
  | { surface: 'preview'; view: string; x: number; y: number };

export const commentThreads = pgTable(
  'comment_threads',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    productId: uuid('product_id').notNull().references(() => products.id, { onDelete: 'cascade' }),
    anchor: jsonb('anchor').$type<CommentAnchor>(),
    // the product revision the thread was opened on, so a pin on a changed layout can say so
    productRevision: integer('product_revision').notNull(),
    resolvedAt: timestamp('resolved_at', { withTimezone: true }),
    resolvedBy: uuid('resolved_by').references(() => users.id, { onDelete: 'set null' }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('comment_threads_product_idx').on(t.productId, t.createdAt)],
);

export const comments = pgTable(
  'comments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    threadId: uuid('thread_id').notNull().references(() => commentThreads.id, { onDelete: 'cascade' }),
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    body: text('body').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    editedAt: timestamp('edited_at', { withTimezone: true }),
  },
  (t) => [index('comments_thread_idx').on(t.threadId, t.createdAt)],
);

// Someone asked for a review of a product (reviewerId null: any reviewer of the studio).
export const reviewRequests = pgTable(
  'review_requests',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    productId: uuid('product_id').notNull().references(() => products.id, { onDelete: 'cascade' }),
    requestedBy: uuid('requested_by').references(() => users.id, { onDelete: 'set null' }),
    reviewerId: uuid('reviewer_id').references(() => users.id, { onDelete: 'set null' }),
    note: text('note').notNull().default(''),
    productRevision: integer('product_revision').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('review_requests_product_idx').on(t.productId, t.createdAt)],
);

export type ReviewDecision = 'approved' | 'changes_requested';

export const reviewDecisions = pgTable(
  'review_decisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    productId: uuid('product_id').notNull().references(() => products.id, { onDelete: 'cascade' }),
    reviewerId: uuid('reviewer_id').references(() => users.id, { onDelete: 'set null' }),
    decision: text('decision').$type<ReviewDecision>().notNull(),
    note: text('note').notNull().default(''),
    productRevision: integer('product_revision').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('review_decisions_product_idx').on(t.productId, t.createdAt)],
);

// In-app notifications, one row per recipient.
export const notifications = pgTable(
  'notifications',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    kind: text('kind').notNull(),
    title: text('title').notNull(),
    body: text('body').notNull().default(''),
    // an in-app path such as /products/<id>?thread=<id>
    link: text('link'),
    readAt: timestamp('read_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('notifications_user_idx').on(t.userId, t.studioId, t.createdAt)],
);

// The studio's activity feed: what happened, by whom, about what. Written by recordActivity().
export const activityEvents = pgTable(
  'activity_events',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    actorId: uuid('actor_id').references(() => users.id, { onDelete: 'set null' }),
    kind: text('kind').notNull(),
    subjectType: text('subject_type').notNull(),
    subjectId: uuid('subject_id'),
    summary: text('summary').notNull(),
    data: jsonb('data').$type<Record<string, unknown>>().notNull().default({}),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('activity_events_studio_idx').on(t.studioId, t.createdAt), index('activity_events_actor_idx').on(t.studioId, t.actorId)],
);

// One imported sales file. The file's hash is unique per studio: the same file twice is refused.
export const salesImports = pgTable(
  'sales_imports',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    fileName: text('file_name').notNull(),
    fileSha256: text('file_sha256').notNull(),
    rowCount: integer('row_count').notNull(),
    skippedRows: integer('skipped_rows').notNull().default(0),
    mapping: jsonb('mapping').$type<Record<string, string>>().notNull(),
    // what the import left out and why (bad rows skipped on request, rows another import already had)
    report: jsonb('report').$type<Record<string, unknown>>().notNull().default({}),
    importedBy: uuid('imported_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('sales_imports_studio_file_key').on(t.studioId, t.fileSha256)],
);

export const salesRows = pgTable(
  'sales_rows',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    importId: uuid('import_id').notNull().references(() => salesImports.id, { onDelete: 'cascade' }),
    line: integer('line').notNull(),
    soldOn: date('sold_on', { mode: 'string' }).notNull(),
    sku: text('sku').notNull(),
    variantId: uuid('variant_id').references(() => productVariants.id, { onDelete: 'set null' }),
    productId: uuid('product_id').references(() => products.id, { onDelete: 'set null' }),
    quantity: integer('quantity').notNull(),
    revenueMinor: bigint('revenue_minor', { mode: 'number' }).notNull(),
    currency: text('currency').notNull(),
    // a key of the shop's own (order id + SKU) when the file has one: overlapping exports do not double-count
    rowKey: text('row_key'),
  },
  (t) => [
    index('sales_rows_studio_day_idx').on(t.studioId, t.soldOn),
    index('sales_rows_product_idx').on(t.productId),
    uniqueIndex('sales_rows_studio_key').on(t.studioId, t.rowKey).where(sql`${t.rowKey} is not null`),
  ],
);
