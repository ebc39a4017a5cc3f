import { toRadians, degrees, type Radians } from './angle';
import type { Vec } from './vec';

/**
 * 2D affine transform in canvas setTransform order [a, b, c, d, e, f]:
 * x' = a·x + c·y + e, y' = b·x + d·y + f.
 */
export type Affine = readonly [a: number, b: number, c: number, d: number, e: number, f: number];

export const identity: Affine = [1, 0, 0, 1, 0, 0];

/** The transform that applies `m` first, then `n` (in matrix terms N·M). */
export function multiply(m: Affine, n: Affine): Affine {
  const [a1, b1, c1, d1, e1, f1] = m;
  const [a2, b2, c2, d2, e2, f2] = n;
  return [
    a2 * a1 + c2 * b1,
    b2 * a1 + d2 * b1,
    a2 * c1 + c2 * d1,
    b2 * c1 + d2 * d1,
    a2 * e1 + c2 * f1 + e2,
    b2 * e1 + d2 * f1 + f2,
  ];
}

/** Applies the transforms left to right: compose(p, q, r) does p, then q, then r. */
export function compose(...steps: readonly Affine[]): Affine {
  return steps.reduce(multiply, identity);
}

/** null when the transform squashes the plane to a line or point (e.g. scale 0). */
export function invert(m: Affine): Affine | null {
  const [a, b, c, d, e, f] = m;
  const det = a * d - b * c;
  if (!Number.isFinite(det) || Math.abs(det) < 1e-12) return null;
  return [d / det, -b / det, -c / det, a / det, (c * f - d * e) / det, (b * e - a * f) / det];
}

export function applyToPoint(m: Affine, p: Vec): Vec {
  return { x: m[0] * p.x + m[2] * p.y + m[4], y: m[1] * p.x + m[3] * p.y + m[5] };
}

export const translate = (tx: number, ty: number): Affine => [1, 0, 0, 1, tx, ty];
export const scale = (sx: number, sy: number = sx): Affine => [sx, 0, 0, sy, 0, 0];

/** With y pointing down, a positive angle turns clockwise on screen, as canvas rotate() does. */
export function rotate(angle: Radians): Affine {
  const cos = Math.cos(angle);
  const sin = Math.sin(angle);
  return [cos, sin, -sin, cos, 0, 0];
}

export type PlacementTransform = {
  /** Centre of the placement in template pixels. */
  x: number;
  y: number;
  /** The motif's own pixel size. */
  width: number;
  height: number;
  /** 1 = one motif pixel per template pixel. */
  scale: number;
  /** Clockwise on screen, about the centre. */
  rotationDeg: number;
  /** Mirrored in the motif's own axes, so a flip stays left–right of the artwork when rotated. */
  flipX: boolean;
  flipY: boolean;
};

/** Maps a motif's local pixel (0..width, 0..height) to template pixels. */
export function placementMatrix(p: PlacementTransform): Affine {
  return compose(
    translate(-p.width / 2, -p.height / 2),
    scale(p.flipX ? -p.scale : p.scale, p.flipY ? -p.scale : p.scale),
    rotate(toRadians(degrees(p.rotationDeg))),
    translate(p.x, p.y),
  );
}
