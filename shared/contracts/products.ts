import { z } from 'zod';
import { layoutSchema } from '../scene/layout';
import { templateSchema } from '../templates/template-schema';

export const productStages = ['idea', 'drafting', 'proofing', 'sampling', 'ready', 'listed', 'retired'] as const;
export const productStageSchema = z.enum(productStages);

export const templateEntrySchema = z.object({
  template: templateSchema,
  // built-in presets are read-only; studio templates carry the studio's own figures
  source: z.enum(['built-in', 'studio']),
  guideImageUrl: z.string().nullable(),
  productCount: z.number(),
});
export type TemplateEntry = z.infer<typeof templateEntrySchema>;
export const templatesListSchema = z.object({ templates: z.array(templateEntrySchema) });

// The id of a studio template is chosen by the server.
export const createTemplateRequestSchema = z.object({ template: z.unknown() });

export const productSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  templateId: z.string(),
  templateName: z.string(),
  stage: productStageSchema,
  revision: z.number(),
  placementCount: z.number(),
  updatedAt: z.string(),
  createdAt: z.string(),
});
export type ProductSummary = z.infer<typeof productSummarySchema>;
export const productsListSchema = z.object({ products: z.array(productSummarySchema) });

export const productMotifUseSchema = z.object({
  motifId: z.string(),
  name: z.string(),
  usedVersion: z.number(),
  currentVersion: z.number(),
  placementIds: z.array(z.string()),
  rightsStatus: z.string(),
  archived: z.boolean(),
});

export const productDetailSchema = productSummarySchema.extend({
  notes: z.string(),
  template: templateSchema,
  layout: layoutSchema,
  motifs: z.array(productMotifUseSchema),
});
export type ProductDetail = z.infer<typeof productDetailSchema>;

export const createProductRequestSchema = z.object({
  name: z.string().trim().min(1, 'Name the product').max(160),
  templateId: z.string().min(1).max(80),
});

export const updateProductRequestSchema = z.object({
  // the revision this save was based on; a different current revision means another tab saved first
  revision: z.number().int().positive(),
  name: z.string().trim().min(1).max(160).optional(),
  notes: z.string().max(20_000).optional(),
  layout: z.unknown().optional(),
});
