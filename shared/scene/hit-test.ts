import { applyToPoint, compose, invert, rectContains, transformedBounds, translate, type Affine, type Rect } from '../geometry';
import type { Scene } from './layout';
import { localPoint, type LocalPoint, type TemplatePoint } from './placement-base';
import { placementLocalSize, placementToTemplate, type Placement } from './placement';
import { mirroredPlacement, type DrawRole } from './render-plan';
import type { RepeatPlacement } from './repeat-placement';
import { columnDrop, repeatSteps } from './repeat-tiles';

export type HitTestOptions = {
  /** The mirror axis (mirrorAxisX of the template), so clicking a mirrored copy selects its source. */
  mirrorAxisX?: number | null;
  /** Repeats are drawn clipped to this rect (the print area); outside it they are not hit. */
  repeatArea?: Rect | null;
  skipLocked?: boolean;
};

/** `local` is the point in the placement's own box, e.g. for an alpha test on the editor's bitmap. */
export type Hit = { placement: Placement; role: DrawRole; local: LocalPoint };

// Guards the tile search for very long, thin rotated tiles.
const MAX_TILE_CHECKS = 400;

/** The topmost visible placement under `point`: a cheap bounds reject first, then the exact box test. */
export function hitTest(scene: Scene, point: TemplatePoint, options: HitTestOptions = {}): Hit | null {
  const { mirrorAxisX = null, repeatArea = null, skipLocked = false } = options;
  const placements = scene.layout.placements;
  for (let i = placements.length - 1; i >= 0; i--) {
    const p = placements[i];
    if (p.hidden || (skipLocked && p.locked)) continue;
    const { width, height } = placementLocalSize(p);
    if (p.type === 'repeat') {
      if (repeatArea && !rectContains(repeatArea, point)) continue;
      const local = hitRepeat(p, point, width, height);
      if (local) return { placement: p, role: 'tile', local };
      continue;
    }
    const reach = reachOf(p, width, height);
    const local = near(p, reach, point) ? localPointIn(placementToTemplate(p), width, height, point) : null;
    if (local) return { placement: p, role: 'placement', local };
    if (scene.layout.mirror && mirrorAxisX !== null) {
      const copy = mirroredPlacement(p, mirrorAxisX);
      const mirrored = near(copy, reach, point) ? localPointIn(placementToTemplate(copy), width, height, point) : null;
      if (mirrored) return { placement: p, role: 'mirror', local: mirrored };
    }
  }
  return null;
}

/** Half the placed box's diagonal: no point farther than this from the centre can hit, whatever the rotation. */
function reachOf(p: Placement, width: number, height: number): number {
  if (p.type === 'text') return Math.hypot(width, height) / 2;
  const stretchY = p.type === 'motif' ? p.stretchY : 1;
  return (Math.hypot(width, height * stretchY) * p.scale) / 2;
}

// The cheapest reject, before any matrix is built.
const near = (centre: { x: number; y: number }, reach: number, point: TemplatePoint) =>
  Math.abs(point.x - centre.x) <= reach && Math.abs(point.y - centre.y) <= reach;

/** The point in a w×h box placed by `m`, or null when it falls outside (edges count as inside). */
export function localPointIn(m: Affine, width: number, height: number, point: TemplatePoint): LocalPoint | null {
  if (!rectContains(transformedBounds(m, width, height), point)) return null; // cheap reject
  const inverse = invert(m);
  if (!inverse) return null;
  const local = applyToPoint(inverse, point);
  const eps = 1e-9 * Math.max(1, width, height);
  if (local.x < -eps || local.y < -eps || local.x > width + eps || local.y > height + eps) return null;
  return localPoint(local.x, local.y);
}

function hitRepeat(p: RepeatPlacement, point: TemplatePoint, width: number, height: number): LocalPoint | null {
  const { stepX, stepY } = repeatSteps(p);
  const anchor = placementToTemplate(p);
  const reach = Math.hypot(width * p.scale, height * p.scale) / 2;
  const firstColumn = Math.floor((point.x - p.x - reach) / stepX);
  const lastColumn = Math.ceil((point.x - p.x + reach) / stepX);
  let checks = 0;
  for (let c = firstColumn; c <= lastColumn; c++) {
    const drop = columnDrop(p, c, stepY);
    const firstRow = Math.floor((point.y - p.y - drop - reach) / stepY);
    const lastRow = Math.ceil((point.y - p.y - drop + reach) / stepY);
    for (let r = firstRow; r <= lastRow; r++) {
      if (++checks > MAX_TILE_CHECKS) return null;
      const local = localPointIn(compose(anchor, translate(c * stepX, r * stepY + drop)), width, height, point);
      if (local) return local;
    }
  }
  return null;
}
