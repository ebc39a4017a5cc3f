import { z } from 'zod';
import { motifFactsSchema, paletteGroupSchema, PREFLIGHT_RULES, softProofSchema } from '../preflight/types';
import { WRAP_VIEWS } from '../wrap/wrap-views';

export const exportKindSchema = z.enum(['print-file', 'bundle']);
export const paperSchema = z.enum(['a4', 'letter']);

export const createExportRequestSchema = z.object({
  // print-file: just the printer's file; bundle: print file, previews, proof sheet, manifest, cautions in one zip
  kind: exportKindSchema.default('print-file'),
  paper: paperSchema.default('a4'),
});
export type CreateExportRequest = z.infer<typeof createExportRequestSchema>;

export const exportFileSchema = z.object({ name: z.string(), contentType: z.string(), bytes: z.number() });

export const exportStatusSchema = z.object({
  id: z.string(),
  productId: z.string(),
  kind: exportKindSchema,
  status: z.enum(['queued', 'running', 'done', 'failed']),
  // 0..1
  progress: z.number(),
  files: z.array(exportFileSchema),
  error: z.object({ code: z.string(), message: z.string() }).nullable(),
  // the product's layout revision the files were made from
  productRevision: z.number().int(),
  createdAt: z.string(),
});
export type ExportStatusView = z.infer<typeof exportStatusSchema>;

/** GET /api/products/:id/exports: the product's latest exports, newest first. */
export const PRODUCT_EXPORTS_LISTED = 8;
export const productExportsSchema = z.object({ exports: z.array(exportStatusSchema) });

export const downloadQuerySchema = z.object({ file: z.string().min(1).max(200) });

export const PREVIEW_VIEWS = [...WRAP_VIEWS, 'flat'] as const;
export const previewViewSchema = z.enum(PREVIEW_VIEWS);
export type PreviewView = z.infer<typeof previewViewSchema>;

export const previewQuerySchema = z.object({ variant: z.string().max(64).optional() });
export const preflightQuerySchema = z.object({ variant: z.string().max(64).optional() });

// The editor asks for about its canvas's size; the longer side of the returned PNG.
export const SOFT_PROOF_SIDE = { min: 200, max: 2600, default: 1000 } as const;
export const softProofQuerySchema = z.object({
  mask: z.enum(['0', '1']).default('0').transform((v) => v === '1'),
  side: z.coerce.number().int().min(SOFT_PROOF_SIDE.min).max(SOFT_PROOF_SIDE.max).default(SOFT_PROOF_SIDE.default),
});

export const findingSchema = z.object({
  id: z.string(),
  rule: z.enum(PREFLIGHT_RULES),
  severity: z.enum(['ok', 'warning', 'problem']),
  message: z.string(),
  placementId: z.string().optional(),
  fix: z.string(),
});

/** GET /api/products/:id/preflight: the report and the facts the server measured from the pixels. */
export const productPreflightSchema = z.object({
  report: z.object({ findings: z.array(findingSchema), summary: z.object({ problems: z.number(), warnings: z.number() }) }),
  motifs: z.array(motifFactsSchema),
  palette: z.array(paletteGroupSchema),
  softProof: softProofSchema.extend({ deltaE: z.number(), renderWidth: z.number(), renderHeight: z.number() }),
  /** The studio's colour-group limit the palette was checked against. */
  paletteLimit: z.number().int().min(1).max(64),
  /** The product's own variants' blanks that text contrast was also checked against. */
  productBlanks: z.array(z.object({ name: z.string(), body: z.string() })),
});
export type ProductPreflightView = z.infer<typeof productPreflightSchema>;
