import type { WrapCylinder } from './cylinder';
import { stripXAtScreenX } from './cylinder';
import { viewAngle, type WrapView } from './wrap-views';

export type ColumnMap = {
  width: number;
  /** Output pixels per template pixel across the silhouette. */
  scale: number;
  /** For each output column, the strip x to sample (template px, fractional), or -1 where the unprinted blank shows. */
  sourceX: Float64Array;
  /** Brightness factor 0..1 for each column: simple diffuse shading towards the silhouette. */
  shade: Float32Array;
};

export type ColumnMapOptions = {
  /** Columns across the mug body's silhouette (its diameter on screen). */
  outputWidth: number;
  /** Light that reaches the silhouette edge; a look, not a measurement. */
  ambient?: number;
};

// Bounded so a typo cannot allocate gigabytes.
const MAX_COLUMNS = 20_000;

/**
 * The column map of a wrap seen from one side: a canvas or sharp renderer copies, for each output
 * column, the strip's column at sourceX (full height, orthographic view) and multiplies by shade.
 */
export function wrapToCylinder(cyl: WrapCylinder, view: WrapView, options: ColumnMapOptions): ColumnMap {
  const width = Math.max(1, Math.min(MAX_COLUMNS, Math.round(options.outputWidth)));
  const ambient = Math.min(1, Math.max(0, options.ambient ?? 0.35));
  const r = cyl.radiusPx;
  const angle = viewAngle(cyl, view);
  const sourceX = new Float64Array(width);
  const shade = new Float32Array(width);
  for (let i = 0; i < width; i++) {
    const u = ((i + 0.5) / width) * 2 * r - r; // column centre, from the axis
    sourceX[i] = stripXAtScreenX(cyl, angle, u) ?? -1;
    const cos = Math.sqrt(Math.max(0, 1 - (u / r) ** 2)); // cos of the angle from the line of sight
    shade[i] = ambient + (1 - ambient) * cos;
  }
  return { width, scale: width / (2 * r), sourceX, shade };
}
