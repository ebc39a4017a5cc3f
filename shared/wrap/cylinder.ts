import { radians, type Radians } from '../geometry';
import type { TemplateGeometry } from '../templates';

/** A wrap strip on its blank, all in template pixels. */
export type WrapCylinder = {
  radiusPx: number;
  circumferencePx: number;
  /** Strip x that faces the viewer in the front view (opposite the handle). */
  frontCentreX: number;
  handleX: number;
  /** The printed part of the strip: the trim. */
  stripLeft: number;
  stripRight: number;
};

export function wrapCylinder(geometry: TemplateGeometry): WrapCylinder | null {
  if (!geometry.wrap) return null;
  return {
    radiusPx: geometry.wrap.radiusPx,
    circumferencePx: geometry.wrap.circumferencePx,
    frontCentreX: geometry.wrap.frontCentreX,
    handleX: geometry.wrap.handleX,
    stripLeft: geometry.trim.x,
    stripRight: geometry.trim.x + geometry.trim.width,
  };
}

export type ArcProjection = {
  /** Angle of the point from the line of sight, in (-π, π]. */
  theta: Radians;
  /** Screen x from the cylinder's axis, in the same unit as s and r. */
  x: number;
  /** Towards the viewer from the axis; negative on the far side. */
  depth: number;
  visible: boolean;
  /** How much a short piece of strip shrinks on screen (dx/ds). */
  foreshortening: number;
};

/**
 * Elementary geometry of a strip wrapped on a cylinder of radius r, seen from far away: the point
 * at arc length s from the front centre lies at θ = s/r, appears at x = r·sin θ and depth r·cos θ,
 * is visible while |θ| < π/2, and is foreshortened by cos θ. `viewAngle` turns the mug.
 */
export function projectArc(s: number, radius: number, viewAngle: Radians = radians(0)): ArcProjection {
  const theta = wrapAngle(s / radius - viewAngle);
  const cos = Math.cos(theta);
  return { theta, x: radius * Math.sin(theta), depth: radius * cos, visible: Math.abs(theta) < Math.PI / 2, foreshortening: cos };
}

/** Where strip x (template px) appears in a view, e.g. to draw the seam or a placement's outline on a preview; x is scaled to output pixels. */
export function projectStripX(cyl: WrapCylinder, viewAngle: Radians, stripX: number, scale = 1): ArcProjection {
  const p = projectArc(stripX - cyl.frontCentreX, cyl.radiusPx, viewAngle);
  return { ...p, x: p.x * scale, depth: p.depth * scale };
}

/** Into (-π, π]. */
export function wrapAngle(a: number): Radians {
  const t = a - 2 * Math.PI * Math.floor((a + Math.PI) / (2 * Math.PI));
  return radians(t === -Math.PI ? Math.PI : t);
}

/** The strip x that appears at screen x `u` (from the axis) on the near side, or null beyond the silhouette or in the unprinted gap. */
export function stripXAtScreenX(cyl: WrapCylinder, viewAngle: Radians, u: number): number | null {
  const r = cyl.radiusPx;
  if (Math.abs(u) > r) return null;
  const arc = (viewAngle + Math.asin(u / r)) * r;
  const x = cyl.stripLeft + mod(cyl.frontCentreX + arc - cyl.stripLeft, cyl.circumferencePx);
  return x <= cyl.stripRight ? x : null;
}

export const mod = (a: number, n: number): number => ((a % n) + n) % n;
