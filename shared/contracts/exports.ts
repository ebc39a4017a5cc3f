import { z } from 'zod';
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
  createdAt: z.string(),
});
export type ExportStatusView = z.infer<typeof exportStatusSchema>;

export const downloadQuerySchema = z.object({ file: z.string().min(1).max(200) });

export const PREVIEW_VIEWS = [...WRAP_VIEWS, 'flat'] as const;
export const previewViewSchema = z.enum(PREVIEW_VIEWS);
export type PreviewView = z.infer<typeof previewViewSchema>;

export const previewQuerySchema = z.object({ variant: z.string().max(64).optional() });
export const preflightQuerySchema = z.object({ variant: z.string().max(64).optional() });
