import { unionRects, type Rect, type Vec } from '../geometry';
import type { Layout } from './layout';
import { mapPlacements, type PlacementIds } from './operations';
import { placementBounds, type Placement } from './placement';

export type Alignment = 'left' | 'centre' | 'right' | 'top' | 'middle' | 'bottom';

/** Bounds of the selected, visible placements together; null for an empty selection. */
export function selectionBounds(layout: Layout, ids: PlacementIds): Rect | null {
  const selected = new Set(ids);
  return unionRects(layout.placements.filter((p) => selected.has(p.id)).map(placementBounds));
}

/**
 * Lines the selection's bounds up with `reference` (e.g. the print area) or, by default, with the
 * bounds of the selection itself. Locked placements count for the bounds but do not move.
 */
export function alignPlacements(layout: Layout, ids: PlacementIds, alignment: Alignment, reference?: Rect): Layout {
  const target = reference ?? selectionBounds(layout, ids);
  if (!target) return layout;
  return mapPlacements(
    layout,
    ids,
    (p) => {
      const delta = alignDelta(placementBounds(p), target, alignment);
      return delta.x === 0 && delta.y === 0 ? p : { ...p, x: p.x + delta.x, y: p.y + delta.y };
    },
    { skipLocked: true },
  );
}

function alignDelta(b: Rect, t: Rect, alignment: Alignment): Vec {
  switch (alignment) {
    case 'left': return { x: t.x - b.x, y: 0 };
    case 'centre': return { x: t.x + t.width / 2 - (b.x + b.width / 2), y: 0 };
    case 'right': return { x: t.x + t.width - (b.x + b.width), y: 0 };
    case 'top': return { x: 0, y: t.y - b.y };
    case 'middle': return { x: 0, y: t.y + t.height / 2 - (b.y + b.height / 2) };
    case 'bottom': return { x: 0, y: t.y + t.height - (b.y + b.height) };
  }
}

/**
 * Equal gaps between the bounds of three or more placements along an axis; the outermost two
 * stay where they are.
 */
export function distributePlacements(layout: Layout, ids: PlacementIds, axis: 'horizontal' | 'vertical'): Layout {
  const selected = new Set(ids);
  const start = (r: Rect) => (axis === 'horizontal' ? r.x : r.y);
  const extent = (r: Rect) => (axis === 'horizontal' ? r.width : r.height);
  const items = layout.placements
    .filter((p) => selected.has(p.id))
    .map((p) => ({ p, b: placementBounds(p) }))
    .sort((a, b) => start(a.b) + extent(a.b) / 2 - (start(b.b) + extent(b.b) / 2));
  if (items.length < 3) return layout;
  const first = items[0].b;
  const last = items[items.length - 1].b;
  const span = start(last) + extent(last) - start(first);
  const gap = (span - items.reduce((sum, i) => sum + extent(i.b), 0)) / (items.length - 1);
  const shifts = new Map<string, number>();
  let cursor = start(first);
  for (const { p, b } of items) {
    shifts.set(p.id, cursor - start(b));
    cursor += extent(b) + gap;
  }
  return mapPlacements(
    layout,
    ids,
    (p: Placement) => {
      const d = shifts.get(p.id) ?? 0;
      if (Math.abs(d) < 1e-9) return p;
      return axis === 'horizontal' ? { ...p, x: p.x + d } : { ...p, y: p.y + d };
    },
    { skipLocked: true },
  );
}
