import { rectsIntersect, type Rect, type Vec } from '../geometry';
import { placementBounds } from './placement';
import type { RepeatPlacement } from './repeat-placement';

// Bounds work and memory for hostile or accidental tiny tiles (a 1 px tile over a mug wrap is millions).
export const MAX_REPEAT_TILES = 4_000;

export type RepeatTiles = {
  /** Offsets of each tile's centre from the anchor tile (x, y of the placement). */
  offsets: Vec[];
  /** Tiles the pattern needs over the area (counting stops a little past the limit); above it no tiles are given. */
  needed: number;
};

export function repeatSteps(p: RepeatPlacement): { stepX: number; stepY: number } {
  return { stepX: p.naturalWidth * p.scale + p.spacingX, stepY: p.naturalHeight * p.scale + p.spacingY };
}

/** A half-drop pattern shifts odd columns down by half a vertical step. */
export const columnDrop = (p: RepeatPlacement, column: number, stepY: number): number =>
  p.halfDrop && Math.abs(column % 2) === 1 ? stepY / 2 : 0;

/** The tiles whose bounds meet `area`, in column-major order. */
export function repeatTiles(p: RepeatPlacement, area: Rect, maxTiles = MAX_REPEAT_TILES): RepeatTiles {
  const { stepX, stepY } = repeatSteps(p);
  const anchor = placementBounds(p);
  const left = area.x - (anchor.x + anchor.width);
  const right = area.x + area.width - anchor.x;
  const firstColumn = Math.floor(left / stepX);
  const lastColumn = Math.ceil(right / stepX);
  const rows = (column: number) => {
    const drop = columnDrop(p, column, stepY);
    return { first: Math.floor((area.y - (anchor.y + anchor.height) - drop) / stepY), last: Math.ceil((area.y + area.height - anchor.y - drop) / stepY), drop };
  };
  let needed = 0;
  for (let c = firstColumn; c <= lastColumn && needed <= maxTiles * 4; c++) {
    const r = rows(c);
    needed += Math.max(0, r.last - r.first + 1);
  }
  if (needed > maxTiles) return { offsets: [], needed };

  const offsets: Vec[] = [];
  for (let c = firstColumn; c <= lastColumn; c++) {
    const r = rows(c);
    for (let row = r.first; row <= r.last; row++) {
      const offset = { x: c * stepX, y: row * stepY + r.drop };
      const bounds = { ...anchor, x: anchor.x + offset.x, y: anchor.y + offset.y };
      if (rectsIntersect(bounds, area)) offsets.push(offset);
    }
  }
  return { offsets, needed: offsets.length };
}
