import { applyToPoint, invert, type Affine } from './matrix';
import type { Vec } from './vec';

export type Rect = { x: number; y: number; width: number; height: number };

/** Axis-aligned bounds of a w×h box after transform `m`. */
export function transformedBounds(m: Affine, w: number, h: number): Rect {
  const corners = [applyToPoint(m, { x: 0, y: 0 }), applyToPoint(m, { x: w, y: 0 }), applyToPoint(m, { x: w, y: h }), applyToPoint(m, { x: 0, y: h })];
  const xs = corners.map((c) => c.x);
  const ys = corners.map((c) => c.y);
  const x = Math.min(...xs);
  const y = Math.min(...ys);
  return { x, y, width: Math.max(...xs) - x, height: Math.max(...ys) - y };
}

/** True when the rects share some area; rects that only touch along an edge do not intersect. */
export function rectsIntersect(a: Rect, b: Rect): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

/** Whether `outer` holds a point or a whole rect (edges included). */
export function rectContains(outer: Rect, inner: Rect | Vec): boolean {
  const width = 'width' in inner ? inner.width : 0;
  const height = 'height' in inner ? inner.height : 0;
  return (
    inner.x >= outer.x &&
    inner.y >= outer.y &&
    inner.x + width <= outer.x + outer.width &&
    inner.y + height <= outer.y + outer.height
  );
}

/** The smallest rect holding all given rects; null for none. */
export function unionRects(a: Rect, b: Rect): Rect;
export function unionRects(rects: readonly Rect[]): Rect | null;
export function unionRects(first: Rect | readonly Rect[], second?: Rect): Rect | null {
  const rects: readonly Rect[] = Array.isArray(first) ? first : [first as Rect, second as Rect];
  if (rects.length === 0) return null;
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const r of rects) {
    x0 = Math.min(x0, r.x);
    y0 = Math.min(y0, r.y);
    x1 = Math.max(x1, r.x + r.width);
    y1 = Math.max(y1, r.y + r.height);
  }
  return { x: x0, y: y0, width: x1 - x0, height: y1 - y0 };
}

/** Hit test of point `p` (template pixels) against a w×h box placed by `m`; edges count as inside. */
export function pointInTransformedRect(m: Affine, w: number, h: number, p: Vec): boolean {
  if (!rectContains(transformedBounds(m, w, h), p)) return false; // cheap reject first
  const inverse = invert(m);
  if (!inverse) return false;
  const local = applyToPoint(inverse, p);
  const eps = 1e-9 * Math.max(1, w, h);
  return local.x >= -eps && local.y >= -eps && local.x <= w + eps && local.y <= h + eps;
}
