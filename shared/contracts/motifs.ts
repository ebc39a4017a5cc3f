import { z } from 'zod';
import { colourSchema, motifSummarySchema } from './originals';

export const rightsStatuses = ['own_work', 'licensed', 'public_domain', 'unknown'] as const;
export const rightsStatusSchema = z.enum(rightsStatuses);
export type RightsStatusDto = z.infer<typeof rightsStatusSchema>;

// Tags are compared as people read them: trimmed, single-spaced, lower case.
export const tagSchema = z
  .string()
  .transform((t) => t.normalize('NFC').trim().replace(/\s+/g, ' ').toLowerCase())
  .pipe(z.string().min(1, 'A tag cannot be empty').max(40, 'Keep tags under 40 characters').regex(/^[^,]+$/, 'Tags cannot contain commas'));
export const tagListSchema = z.array(tagSchema).max(40, 'At most 40 tags').transform((tags) => [...new Set(tags)]);

// Query strings carry lists as repeated keys (tags=a&tags=b) or comma-separated (tags=a,b).
const listParam = <T extends z.ZodType>(item: T) =>
  z.preprocess((v) => (v === undefined ? undefined : (Array.isArray(v) ? v : [v]).flatMap((x) => String(x).split(',')).filter((x) => x.trim() !== '')), z.array(item).max(40).optional());

const booleanParam = z.preprocess((v) => (v === 'true' || v === '1' ? true : v === 'false' || v === '0' ? false : v), z.boolean().optional());

// "#c8283c", "c8283c" (a "#" must be sent as %23) or "#c23".
const hexParam = z
  .string()
  .transform((v) => (v.startsWith('#') ? v : `#${v}`).toLowerCase())
  .pipe(z.string().regex(/^#(?:[0-9a-f]{3}|[0-9a-f]{6})$/, 'Colour must be written as #rgb or #rrggbb'));

// ΔE00 of 12: clearly "the same colour family" without drifting into neighbours (common practice
// puts a just-noticeable difference near 1–2 and "similar" below about 10–15; from memory).
export const DEFAULT_COLOUR_DISTANCE = 12;

// Everything that narrows the library; the same object selects motifs for bulk edits.
export const motifFilterSchema = z.object({
  q: z.string().max(200).optional(),
  tags: listParam(tagSchema),
  collectionId: z.string().uuid().optional(),
  originalId: z.string().uuid().optional(),
  colour: hexParam.optional(),
  maxDistance: z.coerce.number().min(0).max(100).default(DEFAULT_COLOUR_DISTANCE),
  rights: listParam(rightsStatusSchema),
  usage: z.enum(['any', 'used', 'unused']).default('any'),
  hiddenInOriginal: booleanParam,
  // Archived motifs leave the library view unless asked for.
  archived: z.enum(['exclude', 'include', 'only']).default('exclude'),
});
export type MotifFilter = z.infer<typeof motifFilterSchema>;

// `best`: relevance when searching by words, nearest first by colour, newest otherwise.
export const motifSortSchema = z.enum(['best', 'newest', 'name', 'most_used']);
export type MotifSort = z.infer<typeof motifSortSchema>;

export const motifListQuerySchema = motifFilterSchema.extend({
  sort: motifSortSchema.default('best'),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});
export type MotifListQuery = z.infer<typeof motifListQuerySchema>;

export const colourMatchSchema = z.object({ hex: z.string(), share: z.number(), deltaE: z.number() });
export type ColourMatch = z.infer<typeof colourMatchSchema>;

export const libraryMotifSchema = motifSummarySchema.extend({
  originalName: z.string(),
  collectionIds: z.array(z.string()),
  usageCount: z.number(),
  // How well it answered the query: text relevance 0–1, and the nearest colour when searching by colour.
  score: z.number().nullable(),
  colourMatch: colourMatchSchema.nullable(),
});
export type LibraryMotif = z.infer<typeof libraryMotifSchema>;

const countSchema = z.object({ count: z.number() });
export const motifFacetsSchema = z.object({
  tags: z.array(countSchema.extend({ tag: z.string() })),
  rights: z.record(rightsStatusSchema, z.number()),
  collections: z.array(countSchema.extend({ id: z.string(), name: z.string() })),
  originals: z.array(countSchema.extend({ id: z.string(), name: z.string() })),
  used: z.number(),
  unused: z.number(),
  hiddenInOriginal: z.number(),
  archived: z.number(),
});
export type MotifFacets = z.infer<typeof motifFacetsSchema>;

export const motifListResponseSchema = z.object({
  motifs: z.array(libraryMotifSchema),
  // All motifs matching the query and filters; `facets` count within them.
  total: z.number(),
  offset: z.number(),
  limit: z.number(),
  nextOffset: z.number().nullable(),
  facets: motifFacetsSchema,
});
export type MotifListResponse = z.infer<typeof motifListResponseSchema>;

export const printSizeSchema = z.object({ ppi: z.number(), widthIn: z.number(), heightIn: z.number(), widthMm: z.number(), heightMm: z.number() });
export type PrintSize = z.infer<typeof printSizeSchema>;

export const motifVersionSchema = z.object({
  version: z.number(),
  current: z.boolean(),
  width: z.number(),
  height: z.number(),
  pngBytes: z.number(),
  colours: z.array(colourSchema),
  originalId: z.string(),
  originalName: z.string(),
  // An earlier version with the same pixels (a restore copies one as the newest version).
  samePixelsAs: z.number().nullable(),
  imageUrl: z.string(),
  thumbUrl: z.string(),
  createdAt: z.string(),
});
export type MotifVersion = z.infer<typeof motifVersionSchema>;
export const motifVersionsResponseSchema = z.object({ versions: z.array(motifVersionSchema) });

// Where a motif is placed. Products arrive later; until then the list is always empty.
export const motifUsageSchema = z.object({
  productId: z.string(),
  productName: z.string(),
  stage: z.string(),
  placementId: z.string(),
  version: z.number(),
});
export type MotifUsage = z.infer<typeof motifUsageSchema>;

export const motifDetailSchema = libraryMotifSchema.omit({ score: true, colourMatch: true }).extend({
  notes: z.string(),
  rights: z.object({ status: rightsStatusSchema, source: z.string(), licence: z.string(), attributionRequired: z.boolean() }),
  collections: z.array(z.object({ id: z.string(), name: z.string() })),
  versions: z.array(motifVersionSchema),
  // Where it sits in the original it came from: the layer's place in the stack and its offset.
  original: z.object({ id: z.string(), name: z.string(), width: z.number().nullable(), height: z.number().nullable(), position: z.number().nullable(), sourcePath: z.string(), offsetX: z.number(), offsetY: z.number() }),
  printSizes: z.array(printSizeSchema),
  usage: z.array(motifUsageSchema),
});
export type MotifDetail = z.infer<typeof motifDetailSchema>;

export const updateMotifRequestSchema = z
  .object({
    name: z.string().trim().min(1, 'A motif needs a name').max(200),
    tags: tagListSchema,
    notes: z.string().max(5000),
    rightsStatus: rightsStatusSchema,
    rightsSource: z.string().trim().max(500),
    rightsLicence: z.string().trim().max(2000),
    attributionRequired: z.boolean(),
    archived: z.boolean(),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Send at least one field to change');
export type UpdateMotifRequest = z.infer<typeof updateMotifRequestSchema>;

export const bulkActionSchema = z.discriminatedUnion('type', [
  z.object({ type: z.literal('tag'), tags: tagListSchema.pipe(z.array(z.string()).min(1)) }),
  z.object({ type: z.literal('untag'), tags: tagListSchema.pipe(z.array(z.string()).min(1)) }),
  z.object({ type: z.literal('add-to-collection'), collectionId: z.string().uuid() }),
  z.object({ type: z.literal('remove-from-collection'), collectionId: z.string().uuid() }),
  z.object({
    type: z.literal('set-rights'),
    rights: z
      .object({ status: rightsStatusSchema, source: z.string().trim().max(500), licence: z.string().trim().max(2000), attributionRequired: z.boolean() })
      .partial()
      .refine((v) => Object.keys(v).length > 0, 'Choose at least one rights field'),
  }),
  z.object({ type: z.literal('archive') }),
  z.object({ type: z.literal('unarchive') }),
]);
export type BulkAction = z.infer<typeof bulkActionSchema>;

// A selection is either the ids picked by hand or "everything this filter shows".
export const bulkMotifsRequestSchema = z
  .object({
    ids: z.array(z.string().uuid()).min(1).max(10_000).optional(),
    filter: motifFilterSchema.optional(),
    action: bulkActionSchema,
  })
  .refine((v) => (v.ids === undefined) !== (v.filter === undefined), 'Send either ids or a filter');
export type BulkMotifsRequest = z.infer<typeof bulkMotifsRequestSchema>;

export const bulkMotifsResponseSchema = z.object({
  // Motifs of this studio the selection named, and how many of them the action changed.
  matched: z.number(),
  changed: z.number(),
});
export type BulkMotifsResponse = z.infer<typeof bulkMotifsResponseSchema>;

export const looksLikeResponseSchema = z.object({
  maxDistance: z.number(),
  motifs: z.array(libraryMotifSchema.extend({ distance: z.number() })),
});
export type LooksLikeResponse = z.infer<typeof looksLikeResponseSchema>;
