import { z } from 'zod';
import { recolourSchema } from '../colour';
import { placementBaseShape, type PlacementFlags, type PlacementMigration } from './placement-base';
import type { DeepReadonly } from './readonly';

export const repeatPlacementDefaults = {
  scale: 1,
  spacingX: 0,
  spacingY: 0,
  halfDrop: false,
  recolour: { kind: 'none' },
} as const;

/** A motif tiled across the print area; x, y (the base fields) place one tile's centre, i.e. the pattern's offset. */
export const repeatPlacementSchema = z.object({
  type: z.literal('repeat'),
  ...placementBaseShape,
  motifId: z.string().min(1).max(64),
  version: z.number().int().positive(),
  naturalWidth: z.number().int().positive().max(30_000),
  naturalHeight: z.number().int().positive().max(30_000),
  // size of every tile, template pixels per motif pixel
  scale: z.number().positive().max(1_000).default(repeatPlacementDefaults.scale),
  // gaps between neighbouring tiles' boxes in template pixels
  spacingX: z.number().min(0).max(100_000).default(repeatPlacementDefaults.spacingX),
  spacingY: z.number().min(0).max(100_000).default(repeatPlacementDefaults.spacingY),
  // every other column drops by half a step, the usual textile repeat
  halfDrop: z.boolean().default(repeatPlacementDefaults.halfDrop),
  recolour: recolourSchema.default(repeatPlacementDefaults.recolour),
});

export type RepeatPlacement = DeepReadonly<z.output<typeof repeatPlacementSchema>>;
export type RepeatPlacementInit = z.input<typeof repeatPlacementSchema>;

export const repeatPlacementFlags: PlacementFlags = { aspectLockDefault: true, hasPixels: true, recolourable: true };

// Repeats arrived with layout v2, so no older saved form exists yet.
export const repeatPlacementMigrations: readonly PlacementMigration[] = [];

export function createRepeatPlacement(init: Omit<RepeatPlacementInit, 'type'>): RepeatPlacement {
  return repeatPlacementSchema.parse({ ...init, type: 'repeat' });
}
