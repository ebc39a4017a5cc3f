import { z } from 'zod';

const hex = z.string().regex(/^#[0-9a-fA-F]{6}$/, 'Use a colour like #1f3a5f');

// What tells one variant from another; templateVariantId names one of the template's blank
// variants, so previews and preflight can show that blank.
export const variantOptionsSchema = z
  .object({
    templateVariantId: z.string().min(1).max(64).optional(),
    blankColour: hex.optional(),
    handleColour: hex.optional(),
    size: z.string().trim().min(1).max(40).optional(),
  })
  .strict();
export type VariantOptions = z.infer<typeof variantOptionsSchema>;

// Shop codes: letters, digits and - _ . / ; an empty field means "no SKU yet".
export const skuSchema = z
  .string()
  .trim()
  .max(64, 'Keep the SKU under 64 characters')
  .regex(/^[A-Za-z0-9._/-]*$/, 'Use letters, digits and - _ . / only in a SKU')
  .transform((s) => (s === '' ? null : s));

export const variantSchema = z.object({
  id: z.string(),
  productId: z.string(),
  name: z.string(),
  sku: z.string().nullable(),
  options: variantOptionsSchema,
  position: z.number(),
});
export type ProductVariant = z.infer<typeof variantSchema>;
export const variantsListSchema = z.object({ variants: z.array(variantSchema) });

export const createVariantRequestSchema = z.object({
  name: z.string().trim().min(1, 'Name the variant').max(120),
  sku: skuSchema.nullable().optional(),
  options: variantOptionsSchema.default({}),
});
export type CreateVariantRequest = z.input<typeof createVariantRequestSchema>;

export const updateVariantRequestSchema = createVariantRequestSchema.partial().extend({
  options: variantOptionsSchema.optional(),
  position: z.number().int().min(0).max(1000).optional(),
});
export type UpdateVariantRequest = z.input<typeof updateVariantRequestSchema>;
