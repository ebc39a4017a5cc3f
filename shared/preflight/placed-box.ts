import { applyToPoint, invert, type Affine, type Rect, type Vec } from '../geometry';

/** A placement's box where it lands in the template: a parallelogram, since every transform is affine. */
export type PlacedBox = { matrix: Affine; width: number; height: number; corners: readonly [Vec, Vec, Vec, Vec] };

export function placedBox(matrix: Affine, width: number, height: number): PlacedBox {
  const corners = [
    applyToPoint(matrix, { x: 0, y: 0 }),
    applyToPoint(matrix, { x: width, y: 0 }),
    applyToPoint(matrix, { x: width, y: height }),
    applyToPoint(matrix, { x: 0, y: height }),
  ] as const;
  return { matrix, width, height, corners };
}

// Half a hundredth of a pixel: touching an edge is not crossing it.
const EPS = 5e-3;

export function boxInsideRect(box: PlacedBox, r: Rect): boolean {
  return box.corners.every((c) => c.x >= r.x - EPS && c.y >= r.y - EPS && c.x <= r.x + r.width + EPS && c.y <= r.y + r.height + EPS);
}

/** Whether the box covers the whole rect (a background running to the edges). */
export function boxCoversRect(box: PlacedBox, r: Rect): boolean {
  const inverse = invert(box.matrix);
  if (!inverse) return false;
  const corners = [{ x: r.x, y: r.y }, { x: r.x + r.width, y: r.y }, { x: r.x + r.width, y: r.y + r.height }, { x: r.x, y: r.y + r.height }];
  return corners.every((c) => {
    const l = applyToPoint(inverse, c);
    return l.x >= -EPS && l.y >= -EPS && l.x <= box.width + EPS && l.y <= box.height + EPS;
  });
}

/** Whether box and rect share some area: separating-axis test on the rect's axes and the box's two edge normals. */
export function boxOverlapsRect(box: PlacedBox, r: Rect): boolean {
  const rectCorners = [{ x: r.x, y: r.y }, { x: r.x + r.width, y: r.y }, { x: r.x + r.width, y: r.y + r.height }, { x: r.x, y: r.y + r.height }];
  const [a, b, , d] = box.corners;
  const axes: Vec[] = [{ x: 1, y: 0 }, { x: 0, y: 1 }, { x: -(b.y - a.y), y: b.x - a.x }, { x: -(d.y - a.y), y: d.x - a.x }];
  return axes.every((axis) => {
    const length = Math.hypot(axis.x, axis.y);
    if (length === 0) return true;
    const project = (p: Vec) => (p.x * axis.x + p.y * axis.y) / length;
    const boxSpan = span(box.corners.map(project));
    const rectSpan = span(rectCorners.map(project));
    return boxSpan.max > rectSpan.min + EPS && rectSpan.max > boxSpan.min + EPS;
  });
}

export function boxSpanX(box: PlacedBox): { min: number; max: number } {
  return span(box.corners.map((c) => c.x));
}

function span(values: number[]): { min: number; max: number } {
  return { min: Math.min(...values), max: Math.max(...values) };
}
