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
  collectionId: z.string().nullable(),
  collectionName: z.string().nullable(),
  tags: z.array(z.string()),
  variantCount: z.number(),
  // the verdict of the most recent sample (ordered last); null when none was recorded
  latestSampleVerdict: z.enum(['pending', 'approved', 'changes_needed']).nullable(),
});
export type ProductSummary = z.infer<typeof productSummarySchema>;
export const productsListSchema = z.object({ products: z.array(productSummarySchema) });

export const productMotifUseSchema = z.object({
  motifId: z.string(),
  name: z.string(),
  // the original it was cut from, so the editor can offer that original first
  originalId: z.string(),
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

// Product list filters; every one optional, combined with "and".
export const productListQuerySchema = z.object({
  stage: productStageSchema.optional(),
  collectionId: z.string().uuid().optional(),
  templateId: z.string().min(1).max(80).optional(),
  tag: z.string().trim().min(1).max(40).optional(),
});
export type ProductListQuery = z.infer<typeof productListQuerySchema>;

const productTagSchema = z.string().trim().min(1).max(40, 'Keep each tag under 40 characters');

// The product's own facts outside its layout: no layout revision needed, the editor's autosave is not disturbed.
export const updateProductDetailsRequestSchema = z
  .object({
    name: z.string().trim().min(1, 'Name the product').max(160).optional(),
    notes: z.string().max(20_000, 'Keep the notes under 20,000 characters').optional(),
    tags: z.array(productTagSchema).max(30, 'At most 30 tags').optional(),
    collectionId: z.string().uuid('Choose a collection of this studio').nullable().optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), 'Change at least one detail');
export type UpdateProductDetailsRequest = z.input<typeof updateProductDetailsRequestSchema>;
