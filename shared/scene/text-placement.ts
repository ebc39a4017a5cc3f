import { z } from 'zod';
import { hexColourSchema } from '../colour';
import { placementBaseShape, type PlacementFlags, type PlacementMigration } from './placement-base';
import type { DeepReadonly } from './readonly';
import { rotationRadiansToDegrees } from './rotation-migration';

export const textPlacementDefaults = {
  colour: '#1d2433',
  align: 'centre',
  letterSpacing: 0,
  arcDeg: 0,
  isQuote: false,
  quoteSource: '',
} as const;

export const textPlacementSchema = z.object({
  type: z.literal('text'),
  ...placementBaseShape,
  content: z.string().max(2_000),
  // one of the fonts shipped with the app, drawn from its glyph outlines on both sides
  fontId: z.string().min(1).max(64),
  // at print size, so the 8 pt preflight rule reads it directly; scaling text changes this
  sizePt: z.number().positive().max(2_000),
  colour: hexColourSchema.default(textPlacementDefaults.colour),
  align: z.enum(['left', 'centre', 'right']).default(textPlacementDefaults.align),
  // thousandths of an em, so the spacing grows with the size
  letterSpacing: z.number().min(-500).max(2_000).default(textPlacementDefaults.letterSpacing),
  // angle the baseline bends through along an arc; 0 is straight, positive bows the middle upwards
  arcDeg: z.number().min(-360).max(360).default(textPlacementDefaults.arcDeg),
  // the laid-out text's box in template pixels, measured from the outlines by the editor;
  // hit-testing, alignment and snapping use it without loading fonts
  boxWidth: z.number().positive().max(1_000_000),
  boxHeight: z.number().positive().max(1_000_000),
  // a quotation needs its source recorded before the product can be sold
  isQuote: z.boolean().default(textPlacementDefaults.isQuote),
  quoteSource: z.string().max(300).default(textPlacementDefaults.quoteSource),
});

export type TextPlacement = DeepReadonly<z.output<typeof textPlacementSchema>>;
export type TextPlacementInit = z.input<typeof textPlacementSchema>;

export const textPlacementFlags: PlacementFlags = { aspectLockDefault: true, hasPixels: false, recolourable: false };

export const textPlacementMigrations: readonly PlacementMigration[] = [rotationRadiansToDegrees];

export function createTextPlacement(init: Omit<TextPlacementInit, 'type'>): TextPlacement {
  return textPlacementSchema.parse({ ...init, type: 'text' });
}
