import { bigint, index, integer, jsonb, pgTable, real, text, timestamp, uniqueIndex, uuid, boolean } from 'drizzle-orm/pg-core';
import { studios, users } from './auth';

export type OriginalStatus = 'queued' | 'importing' | 'ready' | 'failed';
export type ImportPhase = 'queued' | 'reading' | 'cutting' | 'encoding' | 'storing' | 'finishing' | 'done';
export type CutMode = 'groups' | 'layers';

export type ImportReport = {
  skipped: { sourcePath: string; reason: string }[];
  unsupported: { sourcePath: string; feature: string }[];
  notes: string[];
  /** Parts of an SVG removed before drawing (scripts, outside links, …); absent on older rows. */
  leftOut?: string[];
  linkedExisting: { sourcePath: string; motifId: string; motifName: string }[];
  newVersions: { sourcePath: string; motifId: string; version: number }[];
  unchanged: { sourcePath: string; motifId: string }[];
  removed: { sourcePath: string; motifId: string; motifName: string }[];
  created: number;
};

export const originals = pgTable(
  'originals',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    fileKind: text('file_kind').$type<'psd' | 'png' | 'jpeg' | 'webp' | 'svg'>().notNull(),
    byteSize: bigint('byte_size', { mode: 'number' }).notNull(),
    fileSha256: text('file_sha256').notNull(),
    storageKey: text('storage_key').notNull(),
    status: text('status').$type<OriginalStatus>().notNull().default('queued'),
    phase: text('phase').$type<ImportPhase>().notNull().default('queued'),
    percent: integer('percent').notNull().default(0),
    cut: text('cut').$type<CutMode>().notNull().default('groups'),
    width: integer('width'),
    height: integer('height'),
    layerCount: integer('layer_count'),
    report: jsonb('report').$type<ImportReport>(),
    error: jsonb('error').$type<{ code: string; message: string }>(),
    attempts: integer('attempts').notNull().default(0),
    // "New version of …": the earlier original this upload replaces; lineage groups them.
    previousOriginalId: uuid('previous_original_id'),
    lineageId: uuid('lineage_id').notNull(),
    uploadedBy: uuid('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    importedAt: timestamp('imported_at', { withTimezone: true }),
  },
  (t) => [index('originals_studio_idx').on(t.studioId, t.createdAt)],
);

export type MotifText = { content: string; fontName?: string; sizePt?: number };
export type MotifColour = { hex: string; share: number; oklab: { l: number; a: number; b: number } };
export type RightsStatus = 'own_work' | 'licensed' | 'public_domain' | 'unknown';

export const motifs = pgTable(
  'motifs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    originalId: uuid('original_id').notNull().references(() => originals.id, { onDelete: 'restrict' }),
    name: text('name').notNull(),
    sourcePath: text('source_path').notNull(),
    kind: text('kind').$type<'group' | 'layer' | 'text' | 'image'>().notNull(),
    hiddenInOriginal: boolean('hidden_in_original').notNull().default(false),
    archived: boolean('archived').notNull().default(false),
    currentVersion: integer('current_version').notNull().default(1),
    tags: text('tags').array().notNull().default([]),
    suggestedTags: text('suggested_tags').array().notNull().default([]),
    notes: text('notes').notNull().default(''),
    rightsStatus: text('rights_status').$type<RightsStatus>().notNull().default('own_work'),
    rightsSource: text('rights_source').notNull().default(''),
    rightsLicence: text('rights_licence').notNull().default(''),
    attributionRequired: boolean('attribution_required').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('motifs_studio_idx').on(t.studioId, t.createdAt), index('motifs_original_idx').on(t.originalId)],
);

export const motifVersions = pgTable(
  'motif_versions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    motifId: uuid('motif_id').notNull().references(() => motifs.id, { onDelete: 'cascade' }),
    studioId: uuid('studio_id').notNull().references(() => studios.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    originalId: uuid('original_id').notNull().references(() => originals.id, { onDelete: 'restrict' }),
    contentHash: text('content_hash').notNull(),
    dhash: text('dhash').notNull(),
    pngKey: text('png_key').notNull(),
    thumbKey: text('thumb_key').notNull(),
    pngBytes: integer('png_bytes').notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    offsetX: integer('offset_x').notNull(),
    offsetY: integer('offset_y').notNull(),
    opacity: real('opacity').notNull(),
    blendMode: text('blend_mode').notNull(),
    text: jsonb('text').$type<MotifText>(),
    colours: jsonb('colours').$type<MotifColour[]>().notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('motif_versions_motif_version_key').on(t.motifId, t.version),
    index('motif_versions_studio_hash_idx').on(t.studioId, t.contentHash),
  ],
);

// Which motifs an original yielded (including ones linked to an existing identical motif).
export const originalMotifs = pgTable(
  'original_motifs',
  {
    originalId: uuid('original_id').notNull().references(() => originals.id, { onDelete: 'cascade' }),
    motifId: uuid('motif_id').notNull().references(() => motifs.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    sourcePath: text('source_path').notNull(),
    position: integer('position').notNull(),
    linkedExisting: boolean('linked_existing').notNull().default(false),
  },
  (t) => [uniqueIndex('original_motifs_key').on(t.originalId, t.motifId, t.sourcePath)],
);
