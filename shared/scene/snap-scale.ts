import type { Rect } from '../geometry';
import { guidesFor, SNAP_EPS, type SnapGuide, type SnapLine, type SnapTargets } from './snapping';

/** The corner being dragged: -1 for the left or top edge, 1 for the right or bottom one. */
export type ScaleCorner = { readonly x: -1 | 1; readonly y: -1 | 1 };

export type ScaleSnapResult = { factor: number; guides: SnapGuide[] };

/**
 * Scaling about the box's centre by `factor`, the dragged corner's two edges snap to the same
 * lines a move snaps to: the factor that puts the nearer of the two on a line within
 * `thresholdPx` (template px) wins, since one uniform factor can land only one edge exactly.
 */
export function snapScale(start: Rect, factor: number, corner: ScaleCorner, targets: SnapTargets, thresholdPx: number): ScaleSnapResult {
  const cx = start.x + start.width / 2;
  const cy = start.y + start.height / 2;
  const halfW = start.width / 2;
  const halfH = start.height / 2;
  let best = factor;
  let bestDistance = Infinity;
  const consider = (lines: SnapLine[], centre: number, half: number, side: -1 | 1) => {
    if (half <= SNAP_EPS) return;
    const edge = centre + side * half * factor;
    for (const line of lines) {
      const d = Math.abs(line.position - edge);
      const f = (line.position - centre) / (side * half);
      if (d <= thresholdPx && f > 0 && d < bestDistance - SNAP_EPS) [best, bestDistance] = [f, d];
    }
  };
  consider(targets.x, cx, halfW, corner.x);
  consider(targets.y, cy, halfH, corner.y);
  const box = { x: cx - halfW * best, y: cy - halfH * best, width: start.width * best, height: start.height * best };
  const movingX = corner.x < 0 ? box.x : box.x + box.width;
  const movingY = corner.y < 0 ? box.y : box.y + box.height;
  const guides = [
    ...guidesFor('x', [movingX], targets.x, box.y, box.y + box.height),
    ...guidesFor('y', [movingY], targets.y, box.x, box.x + box.width),
  ];
  return { factor: best, guides };
}
