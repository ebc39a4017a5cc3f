import { z } from 'zod';
import { compose, placementMatrix, scale, transformedBounds, type Affine, type Rect } from '../geometry';
import { motifPlacementFlags, motifPlacementMigrations, motifPlacementSchema, type MotifPlacement } from './motif-placement';
import type { PlacementFlags, PlacementMigration } from './placement-base';
import { repeatPlacementFlags, repeatPlacementMigrations, repeatPlacementSchema, type RepeatPlacement } from './repeat-placement';
import { textPlacementFlags, textPlacementMigrations, textPlacementSchema, type TextPlacement } from './text-placement';

export const placementSchema = z.discriminatedUnion('type', [motifPlacementSchema, textPlacementSchema, repeatPlacementSchema]);

export type Placement = MotifPlacement | TextPlacement | RepeatPlacement;
export type PlacementType = Placement['type'];

export const isMotifPlacement = (p: Placement): p is MotifPlacement => p.type === 'motif';
export const isTextPlacement = (p: Placement): p is TextPlacement => p.type === 'text';
export const isRepeatPlacement = (p: Placement): p is RepeatPlacement => p.type === 'repeat';

type PlacementKind = {
  readonly schema: z.ZodType;
  readonly flags: PlacementFlags;
  readonly migrations: readonly PlacementMigration[];
};

/** Each kind's validator, flags and migrations in one place, so old saved layouts still open. */
export const placementKinds: { readonly [K in PlacementType]: PlacementKind } = {
  motif: { schema: motifPlacementSchema, flags: motifPlacementFlags, migrations: motifPlacementMigrations },
  text: { schema: textPlacementSchema, flags: textPlacementFlags, migrations: textPlacementMigrations },
  repeat: { schema: repeatPlacementSchema, flags: repeatPlacementFlags, migrations: repeatPlacementMigrations },
};

export const isPlacementType = (t: unknown): t is PlacementType => typeof t === 'string' && Object.hasOwn(placementKinds, t);

/** The placement's own box: motif pixels for motifs and a repeat's tile, the measured text box for text. */
export function placementLocalSize(p: Placement): { width: number; height: number } {
  return p.type === 'text' ? { width: p.boxWidth, height: p.boxHeight } : { width: p.naturalWidth, height: p.naturalHeight };
}

/** Maps the placement's own box (0..width, 0..height) to template pixels; for a repeat, its anchor tile. */
export function placementToTemplate(p: Placement): Affine {
  // Literal objects, not spreads: this runs for every placement on every frame of a drag.
  if (p.type === 'text') {
    return placementMatrix({ x: p.x, y: p.y, width: p.boxWidth, height: p.boxHeight, scale: 1, rotationDeg: p.rotationDeg, flipX: p.flipX, flipY: p.flipY });
  }
  const stretchY = p.type === 'motif' ? p.stretchY : 1;
  const m = placementMatrix({ x: p.x, y: p.y, width: p.naturalWidth, height: p.naturalHeight * stretchY, scale: p.scale, rotationDeg: p.rotationDeg, flipX: p.flipX, flipY: p.flipY });
  // Stretching local y first, then centring the stretched box, is the same as a scale of (s, s·k).
  return stretchY === 1 ? m : compose(scale(1, stretchY), m);
}

/** Axis-aligned bounds in template pixels of the (possibly rotated) box. */
export function placementBounds(p: Placement): Rect {
  const { width, height } = placementLocalSize(p);
  return transformedBounds(placementToTemplate(p), width, height);
}
