import type { Rect } from '../geometry';
import type { TemplateGeometry } from '../templates';
import type { Layout } from './layout';
import { placementBounds } from './placement';

export type SnapKind = 'print-area-edge' | 'print-area-centre' | 'trim-edge' | 'safe-edge' | 'front-centre' | 'placement-edge' | 'placement-centre';

/** A line to snap to: on the x list a vertical line at x = position, on the y list a horizontal one. */
export type SnapLine = {
  position: number;
  kind: SnapKind;
  placementId?: string;
  /** Extent along the other axis, so a guide can be drawn from the target to the moving box. */
  from: number;
  to: number;
};

export type SnapTargets = { x: SnapLine[]; y: SnapLine[] };

export type SnapGuide = { axis: 'x' | 'y'; position: number; kind: SnapKind; placementId?: string; from: number; to: number };

export type SnapResult = { dx: number; dy: number; guides: SnapGuide[] };

/** Lines of the template (print area, trim, safe area, a wrap's front centre) and of the other visible placements. */
export function snapTargets(layout: Layout, geometry: TemplateGeometry, excludeIds: readonly string[] = []): SnapTargets {
  const x: SnapLine[] = [];
  const y: SnapLine[] = [];
  const addRect = (r: Rect, edge: SnapKind, centre: SnapKind | null, placementId?: string) => {
    const tag = placementId === undefined ? {} : { placementId };
    const spanY = { from: r.y, to: r.y + r.height, ...tag };
    const spanX = { from: r.x, to: r.x + r.width, ...tag };
    x.push({ position: r.x, kind: edge, ...spanY }, { position: r.x + r.width, kind: edge, ...spanY });
    y.push({ position: r.y, kind: edge, ...spanX }, { position: r.y + r.height, kind: edge, ...spanX });
    if (centre) {
      x.push({ position: r.x + r.width / 2, kind: centre, ...spanY });
      y.push({ position: r.y + r.height / 2, kind: centre, ...spanX });
    }
  };
  // Template lines first: on equal distance they win over other placements.
  addRect(geometry.printArea, 'print-area-edge', 'print-area-centre');
  addRect(geometry.safeRect, 'safe-edge', null);
  addRect(geometry.trim, 'trim-edge', null);
  if (geometry.frontCentreX !== null) {
    x.push({ position: geometry.frontCentreX, kind: 'front-centre', from: geometry.trim.y, to: geometry.trim.y + geometry.trim.height });
  }
  const excluded = new Set(excludeIds);
  for (const p of layout.placements) {
    if (p.hidden || excluded.has(p.id)) continue;
    addRect(placementBounds(p), 'placement-edge', 'placement-centre', p.id);
  }
  return { x, y };
}

/**
 * The shift that brings the moving box's nearest edge or centre onto a target line within
 * `thresholdPx` (template pixels: divide a screen threshold by the zoom), each axis on its own,
 * and the guides to draw for every line the shifted box then touches.
 */
export function snapMove(candidate: Rect, targets: SnapTargets, thresholdPx: number): SnapResult {
  const xs = [candidate.x, candidate.x + candidate.width / 2, candidate.x + candidate.width];
  const ys = [candidate.y, candidate.y + candidate.height / 2, candidate.y + candidate.height];
  const dx = nearestShift(xs, targets.x, thresholdPx);
  const dy = nearestShift(ys, targets.y, thresholdPx);
  const moved = { ...candidate, x: candidate.x + dx, y: candidate.y + dy };
  const guides = [
    ...guidesFor('x', xs.map((v) => v + dx), targets.x, moved.y, moved.y + moved.height),
    ...guidesFor('y', ys.map((v) => v + dy), targets.y, moved.x, moved.x + moved.width),
  ];
  return { dx, dy, guides };
}

export const SNAP_EPS = 1e-6;
const EPS = SNAP_EPS;

function nearestShift(values: number[], lines: SnapLine[], threshold: number): number {
  let best = 0;
  let bestDistance = Infinity;
  for (const line of lines) {
    for (const v of values) {
      const d = line.position - v;
      if (Math.abs(d) <= threshold && Math.abs(d) < bestDistance - EPS) [best, bestDistance] = [d, Math.abs(d)];
    }
  }
  return best;
}

/** Every line the (shifted) box now touches, drawn across both the box and the target. */
export function guidesFor(axis: 'x' | 'y', values: number[], lines: SnapLine[], from: number, to: number): SnapGuide[] {
  return lines
    .filter((l) => values.some((v) => Math.abs(l.position - v) < EPS))
    .map((l) => ({ axis, position: l.position, kind: l.kind, ...(l.placementId ? { placementId: l.placementId } : {}), from: Math.min(from, l.from), to: Math.max(to, l.to) }));
}
