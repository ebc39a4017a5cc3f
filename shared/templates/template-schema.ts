import { z } from 'zod';
import { hexColourSchema } from '../colour';
import { lengthUnitSchema, toPixels, wholePixels } from './units';

// Bounded so a hostile or mistyped template cannot ask for a gigantic print file; 30 000 px is
// also the PSD format's own side limit.
export const MAX_PRINT_FILE_SIDE_PX = 30_000;
export const MAX_PRINT_FILE_PIXELS = 400_000_000;

const length = z.number().positive().max(10_000);
const offset = z.number().min(-10_000).max(10_000);

/** A rect in the template's unit, measured from the trim's top-left corner. */
export const physicalRectSchema = z.object({ x: offset, y: offset, width: length, height: length });
export type PhysicalRect = z.infer<typeof physicalRectSchema>;

export const keepOutSchema = z.object({
  id: z.string().min(1).max(64),
  label: z.string().min(1).max(120),
  // handle: hidden or cut by the mug's handle; fold: a card's crease
  reason: z.enum(['handle', 'fold', 'other']),
  rect: physicalRectSchema,
});
export type KeepOut = z.infer<typeof keepOutSchema>;

/** Strip x positions are measured from the trim's left edge, around the blank; they may lie in the unprinted gap (x < 0 or x > width). */
export const wrapSpecSchema = z.object({
  diameter: length,
  height: length,
  handleX: offset,
  seamX: offset,
});
export type WrapSpec = z.infer<typeof wrapSpecSchema>;

export const outputSpecSchema = z.object({
  format: z.enum(['png', 'jpeg']),
  colour: z.literal('rgb'),
  // flatten: the printer wants no transparency, so the file is flattened onto white
  transparency: z.enum(['keep', 'flatten']),
  dpi: z.number().int().min(72).max(1200),
  maxFileSizeMb: z.number().positive().max(2_000),
});
export type OutputSpec = z.infer<typeof outputSpecSchema>;

export const blankColoursSchema = z.object({
  body: hexColourSchema,
  inside: hexColourSchema.optional(),
  handle: hexColourSchema.optional(),
  rim: hexColourSchema.optional(),
});
export type BlankColours = z.infer<typeof blankColoursSchema>;

export const templateVariantSchema = z.object({
  id: z.string().min(1).max(64),
  name: z.string().min(1).max(120),
  blank: blankColoursSchema.partial(),
  // a blank whose coating hides the print (a heat-changing mug while cold): previews leave the
  // design off and text is not checked against it
  hidesPrint: z.boolean().optional(),
});
export type TemplateVariant = z.infer<typeof templateVariantSchema>;

export const templateKindSchema = z.enum(['mug-wrap', 'card', 'tote', 'print', 'sticker-sheet', 'custom']);
export type TemplateKind = z.infer<typeof templateKindSchema>;

export const templateSchema = z
  .object({
    id: z.string().min(1).max(80),
    name: z.string().min(1).max(120),
    kind: templateKindSchema,
    unit: lengthUnitSchema,
    // trimmed (finished) size; the print file adds the bleed on every side
    size: z.object({ width: length, height: length }),
    dpi: z.number().int().min(72).max(1200),
    bleed: z.number().min(0).max(1_000),
    safeMargin: z.number().min(0).max(1_000),
    // where ink can go; null = the whole print file
    printArea: physicalRectSchema.nullable(),
    keepOuts: z.array(keepOutSchema).max(32),
    wrap: wrapSpecSchema.nullable(),
    output: outputSpecSchema,
    blank: blankColoursSchema,
    variants: z.array(templateVariantSchema).max(50),
  })
  .superRefine((t, ctx) => {
    const width = wholePixels(toPixels(t.size.width + 2 * t.bleed, t.unit, t.dpi));
    const height = wholePixels(toPixels(t.size.height + 2 * t.bleed, t.unit, t.dpi));
    if (width > MAX_PRINT_FILE_SIDE_PX || height > MAX_PRINT_FILE_SIDE_PX || width * height > MAX_PRINT_FILE_PIXELS) {
      ctx.addIssue({ code: 'custom', path: ['size'], message: `The print file would be ${width} x ${height} px; lower the size or the DPI (at most ${MAX_PRINT_FILE_SIDE_PX} px a side)` });
    }
    if (t.output.dpi !== t.dpi) {
      ctx.addIssue({ code: 'custom', path: ['output', 'dpi'], message: 'The print file must be tagged with the template’s DPI, or the printer would scale it' });
    }
    if (t.output.format === 'jpeg' && t.output.transparency === 'keep') {
      ctx.addIssue({ code: 'custom', path: ['output', 'transparency'], message: 'JPEG files cannot keep transparency; choose PNG or flatten' });
    }
    if (2 * t.safeMargin >= Math.min(t.size.width, t.size.height)) {
      ctx.addIssue({ code: 'custom', path: ['safeMargin'], message: 'The safe margin leaves no safe area; make it smaller than half the shorter side' });
    }
    if ((t.kind === 'mug-wrap') !== (t.wrap !== null)) {
      ctx.addIssue({ code: 'custom', path: ['wrap'], message: 'Mug wraps need the blank’s diameter, height and handle position; other kinds have none' });
    }
    if (t.wrap && t.size.height > t.wrap.height) {
      ctx.addIssue({ code: 'custom', path: ['size', 'height'], message: 'The wrap is taller than the blank' });
    }
    const variantIds = t.variants.map((v) => v.id);
    if (new Set(variantIds).size !== variantIds.length) {
      ctx.addIssue({ code: 'custom', path: ['variants'], message: 'Each variant needs its own id' });
    }
  });

export type Template = z.infer<typeof templateSchema>;

export type TemplateError = { code: 'template.invalid'; message: string; fields: Record<string, string> };

/** Parses a studio's own template (form or API input) into a value or an error with per-field messages. */
export function parseTemplate(input: unknown): { ok: true; template: Template } | { ok: false; error: TemplateError } {
  const parsed = templateSchema.safeParse(input);
  if (parsed.success) return { ok: true, template: parsed.data };
  const fields: Record<string, string> = {};
  for (const issue of parsed.error.issues) fields[issue.path.join('.') || '(template)'] ??= issue.message;
  const first = parsed.error.issues[0];
  return { ok: false, error: { code: 'template.invalid', message: first?.message ?? 'The template is not valid', fields } };
}
