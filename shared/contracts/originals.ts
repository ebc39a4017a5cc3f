import { z } from 'zod';

export const cutModeSchema = z.enum(['groups', 'layers']);
export const originalStatusSchema = z.enum(['queued', 'importing', 'ready', 'failed']);
export const importPhaseSchema = z.enum(['queued', 'reading', 'cutting', 'encoding', 'storing', 'finishing', 'done']);

export const importReportSchema = z.object({
  skipped: z.array(z.object({ sourcePath: z.string(), reason: z.string() })),
  unsupported: z.array(z.object({ sourcePath: z.string(), feature: z.string() })),
  notes: z.array(z.string()),
  /** Parts of an SVG drawing removed before it was drawn because they could run or reach outside the file. */
  leftOut: z.array(z.string()).default([]),
  linkedExisting: z.array(z.object({ sourcePath: z.string(), motifId: z.string(), motifName: z.string() })),
  newVersions: z.array(z.object({ sourcePath: z.string(), motifId: z.string(), version: z.number() })),
  unchanged: z.array(z.object({ sourcePath: z.string(), motifId: z.string() })),
  removed: z.array(z.object({ sourcePath: z.string(), motifId: z.string(), motifName: z.string() })),
  created: z.number(),
});
export type ImportReportDto = z.infer<typeof importReportSchema>;

export const colourSchema = z.object({
  hex: z.string(),
  share: z.number(),
  oklab: z.object({ l: z.number(), a: z.number(), b: z.number() }),
});

export const motifSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  sourcePath: z.string(),
  kind: z.enum(['group', 'layer', 'text', 'image']),
  hiddenInOriginal: z.boolean(),
  archived: z.boolean(),
  version: z.number(),
  width: z.number(),
  height: z.number(),
  offsetX: z.number(),
  offsetY: z.number(),
  opacity: z.number(),
  blendMode: z.string(),
  colours: z.array(colourSchema),
  tags: z.array(z.string()),
  suggestedTags: z.array(z.string()),
  text: z.object({ content: z.string(), fontName: z.string().optional(), sizePt: z.number().optional() }).nullable(),
  originalId: z.string(),
  thumbUrl: z.string(),
  imageUrl: z.string(),
  createdAt: z.string(),
  // Added with the library; every summary carries them.
  rightsStatus: z.enum(['own_work', 'licensed', 'public_domain', 'unknown']),
  attributionRequired: z.boolean(),
  updatedAt: z.string(),
});
export type MotifSummary = z.infer<typeof motifSummarySchema>;

export const originalSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  fileKind: z.enum(['psd', 'png', 'jpeg', 'webp', 'svg']),
  byteSize: z.number(),
  status: originalStatusSchema,
  phase: importPhaseSchema,
  percent: z.number(),
  cut: cutModeSchema,
  width: z.number().nullable(),
  height: z.number().nullable(),
  layerCount: z.number().nullable(),
  motifCount: z.number(),
  error: z.object({ code: z.string(), message: z.string() }).nullable(),
  previousOriginalId: z.string().nullable(),
  uploadedBy: z.string().nullable(),
  createdAt: z.string(),
  importedAt: z.string().nullable(),
});
export type OriginalSummary = z.infer<typeof originalSummarySchema>;

export const originalDetailSchema = originalSummarySchema.extend({
  report: importReportSchema.nullable(),
  motifs: z.array(motifSummarySchema.extend({ linkedExisting: z.boolean() })),
});
export type OriginalDetail = z.infer<typeof originalDetailSchema>;

export const originalsListSchema = z.object({ originals: z.array(originalSummarySchema) });

export const uploadOriginalFieldsSchema = z.object({
  cut: cutModeSchema.default('groups'),
  // "New version of …": the earlier original this file replaces.
  previousOriginalId: z.string().uuid().optional(),
});

export const uploadOriginalResponseSchema = z.object({ id: z.string(), status: originalStatusSchema });

export const recutOriginalRequestSchema = z.object({ cut: cutModeSchema });
