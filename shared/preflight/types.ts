import { z } from 'zod';
import { hexColourSchema } from '../colour';
import type { Scene } from '../scene';
import type { Template } from '../templates';

// The same values as the library's motif rights status.
export const rightsStatusSchema = z.enum(['own_work', 'licensed', 'public_domain', 'unknown']);

/** What preflight needs to know about a motif version, from the library. */
export const motifFactsSchema = z.object({
  id: z.string(),
  version: z.number().int().positive(),
  name: z.string().max(200).optional(),
  width: z.number().int().positive(),
  height: z.number().int().positive(),
  rightsStatus: rightsStatusSchema,
  hasTransparency: z.boolean(),
});
export type MotifFacts = z.infer<typeof motifFactsSchema>;

/** Measured by a renderer: the colour behind a text placement, when it sits on artwork rather than the bare blank. */
export const textFactsSchema = z.object({
  placementId: z.string(),
  backdropColour: hexColourSchema.optional(),
});
export type TextFacts = z.infer<typeof textFactsSchema>;

/** One colour group of the rendered design (the pixel analysis happens elsewhere). */
export const paletteGroupSchema = z.object({ hex: hexColourSchema, share: z.number().min(0).max(1) });
export type PaletteGroup = z.infer<typeof paletteGroupSchema>;

/** Computed by the server through a CMYK ICC profile: RGB → CMYK → RGB, compared in ΔE00. */
export const softProofSchema = z.object({
  shareOverDeltaE5: z.number().min(0).max(1),
  profileName: z.string().max(200).optional(),
});
export type SoftProof = z.infer<typeof softProofSchema>;

export const preflightOptionsSchema = z.object({
  // the studio's limit of distinct colour groups
  paletteLimit: z.number().int().min(1).max(64).default(6),
  // below this a placement is a problem; 150 PPI is common practice, not a standard
  minimumPpi: z.number().positive().max(1200).default(150),
  // common practice: smaller text is hard to read and may fill in on press
  minimumTextPt: z.number().positive().max(72).default(8),
  // a team default, not a trade figure: a soft proof moving more of the design than this is a warning
  softProofWarnShare: z.number().min(0).max(1).default(0.02),
});
export type PreflightOptions = z.infer<typeof preflightOptionsSchema>;

export type Severity = 'ok' | 'warning' | 'problem';

// In the order findings of equal severity are listed.
export const PREFLIGHT_RULES = [
  'missing-motif', 'resolution', 'outside-print-area', 'keep-out', 'seam', 'safe-area',
  'transparency', 'text-size', 'text-contrast', 'rights', 'quote-source', 'palette', 'soft-proof',
] as const;
export type PreflightRule = (typeof PREFLIGHT_RULES)[number];

export type Finding = {
  /** Stable across runs, so the editor can keep a finding's row while the user fixes it. */
  id: string;
  rule: PreflightRule;
  severity: Severity;
  message: string;
  /** The placement it concerns; clicking the finding selects it. */
  placementId?: string;
  /** What to do about it, in plain words. */
  fix: string;
};

/** A blank one of the product's own variants is printed on. */
export type ProductBlank = { name: string; body: string };

export type PreflightInput = {
  scene: Scene;
  template: Template;
  motifs: readonly MotifFacts[];
  texts?: readonly TextFacts[];
  /** The blank variant previewed, for the body colour text is checked against. */
  variantId?: string | null;
  /**
   * The product's own variants' blanks (a custom body colour, say), also checked against when no
   * variant is chosen; blanks whose coating hides the print are left out by the caller.
   */
  productBlanks?: readonly ProductBlank[];
  paletteGroups?: readonly PaletteGroup[];
  softProof?: SoftProof | null;
  options?: Partial<PreflightOptions>;
};

export type PreflightReport = {
  findings: Finding[];
  summary: { problems: number; warnings: number };
};
