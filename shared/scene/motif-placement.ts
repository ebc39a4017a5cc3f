import { z } from 'zod';
import { recolourSchema } from '../colour';
import { placementBaseShape, type PlacementFlags, type PlacementMigration } from './placement-base';
import type { DeepReadonly } from './readonly';
import { rotationRadiansToDegrees } from './rotation-migration';

export const motifPlacementDefaults = {
  scale: 1,
  stretchY: 1,
  aspectLocked: true,
  recolour: { kind: 'none' },
} as const;

export const motifPlacementSchema = z.object({
  type: z.literal('motif'),
  ...placementBaseShape,
  // the library's motif; with `version`, what "where used" records
  motifId: z.string().min(1).max(64),
  // pinned, so a new version of the motif never changes a product until the user accepts it
  version: z.number().int().positive(),
  // the motif's own pixel size: the matrix and effective resolution start from it
  naturalWidth: z.number().int().positive().max(30_000),
  naturalHeight: z.number().int().positive().max(30_000),
  // template pixels per motif pixel, horizontally
  scale: z.number().positive().max(1_000).default(motifPlacementDefaults.scale),
  // vertical scale relative to `scale`; stays 1 unless the user unlocks the aspect and stretches
  stretchY: z.number().positive().max(1_000).default(motifPlacementDefaults.stretchY),
  // scale handles keep the aspect ratio while true
  aspectLocked: z.boolean().default(motifPlacementDefaults.aspectLocked),
  // hue shift, fill or colour swap, computed by the same pixel functions on client and server
  recolour: recolourSchema.default(motifPlacementDefaults.recolour),
});

export type MotifPlacement = DeepReadonly<z.output<typeof motifPlacementSchema>>;
export type MotifPlacementInit = z.input<typeof motifPlacementSchema>;

export const motifPlacementFlags: PlacementFlags = { aspectLockDefault: true, hasPixels: true, recolourable: true };

export const motifPlacementMigrations: readonly PlacementMigration[] = [rotationRadiansToDegrees];

/** Fills the defaults; throws on invalid input (use motifPlacementSchema.safeParse for untrusted data). */
export function createMotifPlacement(init: Omit<MotifPlacementInit, 'type'>): MotifPlacement {
  return motifPlacementSchema.parse({ ...init, type: 'motif' });
}
