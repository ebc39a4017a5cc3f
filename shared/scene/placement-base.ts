import { z } from 'zod';
import type { Vec } from '../geometry';

// The separable blend modes of W3C Compositing and Blending Level 1 §10.1, under the names the
// PSD format uses; canvas globalCompositeOperation and the server's compositor both draw them.
export const blendModeSchema = z.enum([
  'normal', 'multiply', 'screen', 'overlay', 'darken', 'lighten',
  'color dodge', 'color burn', 'hard light', 'soft light', 'difference', 'exclusion',
]);
export type BlendMode = z.infer<typeof blendModeSchema>;

// Bounded so hostile saved layouts cannot carry absurd numbers into the matrix maths.
export const coordinateSchema = z.number().min(-1_000_000).max(1_000_000);
export const MAX_PLACEMENTS = 2_000;

/** Fields every placement kind shares: its id, transform and display flags. */
export const placementBaseShape = {
  // stable across saves, so selections, comments and preflight findings can point at it
  id: z.string().min(1).max(64),
  // centre in template pixels, so rotating and scaling never move it
  x: coordinateSchema,
  y: coordinateSchema,
  // clockwise on screen about the centre; people and the API speak degrees, only the matrix uses radians
  rotationDeg: z.number().min(-3600).max(3600).default(0),
  // mirrored in the placement's own axes, so a flip stays left-right of the artwork when rotated
  flipX: z.boolean().default(false),
  flipY: z.boolean().default(false),
  // 0..1, multiplied into the artwork's own alpha when drawn
  opacity: z.number().min(0).max(1).default(1),
  // how it mixes with what lies beneath, as in the original PSD
  blendMode: blendModeSchema.default('normal'),
  // a locked placement keeps its transform: moves, scales and aligns pass it by
  locked: z.boolean().default(false),
  // hidden placements stay in the layout but are neither drawn, printed nor preflighted
  hidden: z.boolean().default(false),
} as const;

/** Each kind's constants, read by the editor's tools and by preflight. */
export type PlacementFlags = {
  /** Scale handles keep the aspect ratio unless the user unlocks it. */
  readonly aspectLockDefault: boolean;
  /** Drawn from motif pixels, so effective resolution applies. */
  readonly hasPixels: boolean;
  readonly recolourable: boolean;
};

/** A saved placement as found in an old layout, before its kind's migrations run. */
export type SavedRecord = Record<string, unknown>;

/** One named, versioned step that rewrites an older saved form of a placement kind. */
export type PlacementMigration = {
  readonly name: string;
  /** The layout version this step produces. */
  readonly toVersion: number;
  readonly up: (saved: SavedRecord) => SavedRecord;
};

// Branded so a pointer position in template pixels is not confused with a point in a placement's own box.
export type TemplatePoint = Vec & { readonly __space: 'template' };
export type LocalPoint = Vec & { readonly __space: 'local' };
export const templatePoint = (x: number, y: number): TemplatePoint => ({ x, y }) as TemplatePoint;
export const localPoint = (x: number, y: number): LocalPoint => ({ x, y }) as LocalPoint;
