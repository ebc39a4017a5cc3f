import { z } from 'zod';
import { studioRoleSchema } from './auth';
import { rightsStatusSchema } from './motifs';
import { productStageSchema } from './products';

// The studio's data as one JSON document: every record's metadata and the list of stored objects
// they refer to (the objects themselves are not inside). Records keep their ids; an import gives
// every record a new id and rewrites every reference, inside layouts and reports too.
//
// Record schemas are loose: a column added later travels along unchecked rather than being
// dropped, and the version says which shape the known fields have.
export const STUDIO_DATA_FORMAT = 'motifold.studio-data';
export const STUDIO_DATA_VERSION = 1;

const id = z.string().uuid('Expected an id (uuid)');
const personRef = id.nullable();
const instant = z.string().datetime({ offset: true, message: 'Expected a date-time (ISO 8601)' });
const day = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Write dates as YYYY-MM-DD');
const storageKey = z.string().min(1).max(1024);
const json = z.unknown();

export const studioDataOriginalSchema = z.looseObject({
  id,
  name: z.string(),
  fileKind: z.enum(['psd', 'png', 'jpeg', 'webp', 'svg']),
  byteSize: z.number().int().nonnegative(),
  fileSha256: z.string(),
  storageKey,
  status: z.enum(['queued', 'importing', 'ready', 'failed']),
  previousOriginalId: id.nullable(),
  lineageId: id,
  uploadedBy: personRef,
  createdAt: instant,
});

export const studioDataMotifSchema = z.looseObject({
  id,
  originalId: id,
  name: z.string(),
  sourcePath: z.string(),
  kind: z.enum(['group', 'layer', 'text', 'image']),
  currentVersion: z.number().int().positive(),
  tags: z.array(z.string()),
  rightsStatus: rightsStatusSchema,
  createdAt: instant,
});

export const studioDataMotifVersionSchema = z.looseObject({
  id,
  motifId: id,
  version: z.number().int().positive(),
  originalId: id,
  contentHash: z.string(),
  pngKey: storageKey,
  thumbKey: storageKey,
  pngBytes: z.number().int().nonnegative(),
  colours: z.array(json),
  createdAt: instant,
});

export const studioDataOriginalMotifSchema = z.looseObject({
  originalId: id,
  motifId: id,
  version: z.number().int(),
  sourcePath: z.string(),
  position: z.number().int(),
});

export const studioDataCollectionSchema = z.looseObject({
  id,
  name: z.string().min(1),
  seasonStart: day.nullable(),
  seasonEnd: day.nullable(),
  launchDate: day.nullable(),
  createdAt: instant,
});

export const studioDataCollectionMotifSchema = z.looseObject({ collectionId: id, motifId: id, addedAt: instant });

export const studioDataTemplateSchema = z.looseObject({ id, spec: z.record(z.string(), json), guideImageKey: storageKey.nullable(), createdAt: instant });

export const studioDataProductSchema = z.looseObject({
  id,
  name: z.string(),
  templateId: z.string().min(1),
  layout: z.looseObject({ placements: z.array(z.looseObject({ id: z.string() })) }),
  revision: z.number().int().positive(),
  stage: productStageSchema,
  tags: z.array(z.string()),
  collectionId: id.nullable(),
  createdBy: personRef,
  createdAt: instant,
});

export const studioDataProductMotifSchema = z.looseObject({ productId: id, motifId: id, placementId: z.string(), version: z.number().int() });

export const studioDataVariantSchema = z.looseObject({ id, productId: id, name: z.string(), sku: z.string().nullable(), options: z.record(z.string(), z.string()), createdAt: instant });

export const studioDataStageMoveSchema = z.looseObject({
  id,
  productId: id,
  fromStage: productStageSchema.nullable(),
  toStage: productStageSchema,
  movedBy: personRef,
  override: z.boolean(),
  createdAt: instant,
});

export const studioDataSampleSchema = z.looseObject({
  id,
  productId: id,
  orderedOn: day,
  verdict: z.enum(['pending', 'approved', 'changes_needed']),
  verdictBy: personRef,
  createdBy: personRef,
  createdAt: instant,
});

export const studioDataSamplePhotoSchema = z.looseObject({
  id,
  sampleId: id,
  fileName: z.string(),
  contentType: z.string(),
  byteSize: z.number().int().nonnegative(),
  originalKey: storageKey,
  displayKey: storageKey,
  thumbKey: storageKey,
  createdBy: personRef,
  createdAt: instant,
});

export const studioDataCommentThreadSchema = z.looseObject({ id, productId: id, productRevision: z.number().int(), resolvedBy: personRef, createdBy: personRef, createdAt: instant });
export const studioDataCommentSchema = z.looseObject({ id, threadId: id, authorId: personRef, body: z.string(), createdAt: instant });
export const studioDataReviewRequestSchema = z.looseObject({ id, productId: id, requestedBy: personRef, reviewerId: personRef, productRevision: z.number().int(), createdAt: instant });
export const studioDataReviewDecisionSchema = z.looseObject({
  id,
  productId: id,
  reviewerId: personRef,
  decision: z.enum(['approved', 'changes_requested']),
  productRevision: z.number().int(),
  createdAt: instant,
});

export const studioDataSalesImportSchema = z.looseObject({
  id,
  fileName: z.string(),
  fileSha256: z.string(),
  rowCount: z.number().int(),
  mapping: z.record(z.string(), z.string()),
  importedBy: personRef,
  createdAt: instant,
});

export const studioDataSalesRowSchema = z.looseObject({
  importId: id,
  line: z.number().int(),
  soldOn: day,
  sku: z.string(),
  variantId: id.nullable(),
  productId: id.nullable(),
  quantity: z.number().int(),
  revenueMinor: z.number().int(),
  currency: z.string(),
  rowKey: z.string().nullable(),
});

export const studioDataActivitySchema = z.looseObject({
  id,
  actorId: personRef,
  kind: z.string(),
  subjectType: z.string(),
  subjectId: id.nullable(),
  summary: z.string(),
  data: z.record(z.string(), json),
  createdAt: instant,
});

export const studioDataMemberSchema = z.object({ userId: id, name: z.string(), email: z.string(), role: studioRoleSchema });

export const studioDataObjectSchema = z.object({
  key: storageKey,
  // known from the records (originals, motif PNGs, photos); null where no record says
  bytes: z.number().int().nonnegative().nullable(),
});

export const studioDataDocumentSchema = z.object({
  format: z.literal(STUDIO_DATA_FORMAT, { error: `Not a studio data file (format should be "${STUDIO_DATA_FORMAT}")` }),
  version: z.literal(STUDIO_DATA_VERSION, { error: `This file's version is not one this server reads (it reads version ${STUDIO_DATA_VERSION})` }),
  exportedAt: instant,
  source: z.object({ studioId: id, studioName: z.string() }),
  studio: z.object({
    name: z.string(),
    paletteLimit: z.number().int().min(1).max(64),
    readyWeeksBeforeLaunch: z.number().int().min(0).max(52),
    salesColumnMapping: z.record(z.string(), z.string()).nullable(),
    salesSplitRule: z.enum(['even', 'area']),
  }),
  members: z.array(studioDataMemberSchema),
  // every tag in use, for reading; an import takes tags from the motifs and products themselves
  tags: z.array(z.object({ tag: z.string(), motifs: z.number().int(), products: z.number().int() })),
  originals: z.array(studioDataOriginalSchema),
  motifs: z.array(studioDataMotifSchema),
  motifVersions: z.array(studioDataMotifVersionSchema),
  originalMotifs: z.array(studioDataOriginalMotifSchema),
  collections: z.array(studioDataCollectionSchema),
  collectionMotifs: z.array(studioDataCollectionMotifSchema),
  templates: z.array(studioDataTemplateSchema),
  products: z.array(studioDataProductSchema),
  productMotifs: z.array(studioDataProductMotifSchema),
  variants: z.array(studioDataVariantSchema),
  stageMoves: z.array(studioDataStageMoveSchema),
  samples: z.array(studioDataSampleSchema),
  samplePhotos: z.array(studioDataSamplePhotoSchema),
  commentThreads: z.array(studioDataCommentThreadSchema),
  comments: z.array(studioDataCommentSchema),
  reviewRequests: z.array(studioDataReviewRequestSchema),
  reviewDecisions: z.array(studioDataReviewDecisionSchema),
  salesImports: z.array(studioDataSalesImportSchema),
  salesRows: z.array(studioDataSalesRowSchema),
  activity: z.array(studioDataActivitySchema),
  objects: z.array(studioDataObjectSchema),
});
export type StudioDataDocument = z.infer<typeof studioDataDocumentSchema>;
export type StudioDataRecordSection = Exclude<keyof StudioDataDocument, 'format' | 'version' | 'exportedAt' | 'source' | 'studio' | 'members' | 'tags' | 'objects'>;

export const studioDataImportReportSchema = z.object({
  imported: z.record(z.string(), z.number()),
  // people of the file matched by e-mail to members of this studio
  matchedPeople: z.array(z.object({ email: z.string(), name: z.string() })),
  // people who are not members here: what they did stays, with nobody named
  unmatchedPeople: z.array(z.object({ email: z.string(), name: z.string() })),
  objectsCopied: z.number(),
  missingObjects: z.array(z.object({ key: z.string(), reason: z.string() })),
  notes: z.array(z.string()),
});
export type StudioDataImportReport = z.infer<typeof studioDataImportReportSchema>;
