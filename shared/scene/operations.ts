import { degrees, normaliseDegrees, toRadians, vec, type Degrees, type Vec } from '../geometry';
import type { Layout } from './layout';
import type { Placement } from './placement';

// Every operation returns the same layout object when nothing changed, so updateScene keeps the version.

export type PlacementIds = readonly string[];

/** Applies `fn` to the selected placements; unchanged placements keep their identity. */
export function mapPlacements(layout: Layout, ids: PlacementIds, fn: (p: Placement) => Placement, { skipLocked = false } = {}): Layout {
  const selected = new Set(ids);
  let changed = false;
  const placements = layout.placements.map((p) => {
    if (!selected.has(p.id) || (skipLocked && p.locked)) return p;
    const next = fn(p);
    if (next !== p) changed = true;
    return next;
  });
  return changed ? { ...layout, placements } : layout;
}

const moving = (layout: Layout, ids: PlacementIds, fn: (p: Placement) => Placement) => mapPlacements(layout, ids, fn, { skipLocked: true });

export function addPlacement(layout: Layout, placement: Placement, index = layout.placements.length): Layout {
  if (layout.placements.some((p) => p.id === placement.id)) {
    throw Object.assign(new Error(`A placement with id "${placement.id}" is already in the layout`), { code: 'scene.duplicate_id' });
  }
  const placements = [...layout.placements];
  placements.splice(Math.max(0, Math.min(index, placements.length)), 0, placement);
  return { ...layout, placements };
}

export function removePlacements(layout: Layout, ids: PlacementIds): Layout {
  const selected = new Set(ids);
  const placements = layout.placements.filter((p) => !selected.has(p.id));
  return placements.length === layout.placements.length ? layout : { ...layout, placements };
}

/** Replaces the placement with the same id (e.g. an inspector edit that was validated already). */
export function replacePlacement(layout: Layout, placement: Placement): Layout {
  return mapPlacements(layout, [placement.id], () => placement);
}

export function movePlacements(layout: Layout, ids: PlacementIds, delta: Vec): Layout {
  if (delta.x === 0 && delta.y === 0) return layout;
  return moving(layout, ids, (p) => ({ ...p, x: p.x + delta.x, y: p.y + delta.y }));
}

export type NudgeDirection = 'left' | 'right' | 'up' | 'down';

/** Arrow-key moves of the whole selection by `stepPx` template pixels. */
export function nudgePlacements(layout: Layout, ids: PlacementIds, direction: NudgeDirection, stepPx = 1): Layout {
  const delta = { left: { x: -stepPx, y: 0 }, right: { x: stepPx, y: 0 }, up: { x: 0, y: -stepPx }, down: { x: 0, y: stepPx } }[direction];
  return movePlacements(layout, ids, delta);
}

const MIN_SCALE = 1e-4;
const MAX_SCALE = 1_000;
const clampScale = (s: number) => Math.min(MAX_SCALE, Math.max(MIN_SCALE, s));

/** Scales each placement about its own centre, or about `about` (e.g. the selection's centre), keeping the aspect. */
export function scalePlacements(layout: Layout, ids: PlacementIds, factor: number, about?: Vec): Layout {
  if (!(factor > 0) || factor === 1) return layout;
  return moving(layout, ids, (p) => {
    const centre = about ? vec.add(about, vec.scale(vec.sub(p, about), factor)) : p;
    if (p.type === 'text') {
      const f = Math.min(factor, 2_000 / p.sizePt);
      return { ...p, ...pick(centre), sizePt: p.sizePt * f, boxWidth: p.boxWidth * f, boxHeight: p.boxHeight * f };
    }
    return { ...p, ...pick(centre), scale: clampScale(p.scale * factor) };
  });
}

/** Free scaling for motifs whose aspect the user unlocked; other placements are left as they are. */
export function stretchPlacements(layout: Layout, ids: PlacementIds, factorX: number, factorY: number): Layout {
  if (!(factorX > 0) || !(factorY > 0)) return layout;
  return moving(layout, ids, (p) => {
    if (p.type !== 'motif' || p.aspectLocked) return p;
    const scale = clampScale(p.scale * factorX);
    return { ...p, scale, stretchY: clampScale((p.scale * p.stretchY * factorY) / scale) };
  });
}

/** Turns each placement by `deltaDeg` clockwise about its centre, or the centres about `about`. */
export function rotatePlacements(layout: Layout, ids: PlacementIds, deltaDeg: number, about?: Vec): Layout {
  if (deltaDeg === 0 || !Number.isFinite(deltaDeg)) return layout;
  const angle = toRadians(degrees(deltaDeg));
  return moving(layout, ids, (p) => {
    const centre = about ? vec.add(about, vec.rotate(vec.sub(p, about), angle)) : p;
    return { ...p, ...pick(centre), rotationDeg: normaliseDegrees(p.rotationDeg + deltaDeg) };
  });
}

export function setRotation(layout: Layout, ids: PlacementIds, rotationDeg: number): Layout {
  const target = normaliseDegrees(rotationDeg);
  return moving(layout, ids, (p) => (p.rotationDeg === target ? p : { ...p, rotationDeg: target }));
}

/** Nearest multiple of `stepDeg` (15° while the snap key is held), in [0, 360). */
export function snapRotation(rotationDeg: number, stepDeg = 15): Degrees {
  if (!(stepDeg > 0)) return normaliseDegrees(rotationDeg);
  return normaliseDegrees(Math.round(rotationDeg / stepDeg) * stepDeg);
}

/** Mirrors each placement in its own axes: 'horizontal' swaps left and right of the artwork. */
export function flipPlacements(layout: Layout, ids: PlacementIds, axis: 'horizontal' | 'vertical'): Layout {
  return moving(layout, ids, (p) => (axis === 'horizontal' ? { ...p, flipX: !p.flipX } : { ...p, flipY: !p.flipY }));
}

export function setLocked(layout: Layout, ids: PlacementIds, locked: boolean): Layout {
  return mapPlacements(layout, ids, (p) => (p.locked === locked ? p : { ...p, locked }));
}

export function setHidden(layout: Layout, ids: PlacementIds, hidden: boolean): Layout {
  return mapPlacements(layout, ids, (p) => (p.hidden === hidden ? p : { ...p, hidden }));
}

export type DuplicateOptions = {
  /** New ids; pass a counter in tests. */
  makeId?: () => string;
  /** Where the copies land relative to their originals, in template pixels. */
  offset?: Vec;
};

/** Copies the selection (in its z order) onto the top of the layout; returns the copies' ids to select them. */
export function duplicatePlacements(layout: Layout, ids: PlacementIds, options: DuplicateOptions = {}): { layout: Layout; ids: string[] } {
  const makeId = options.makeId ?? (() => globalThis.crypto.randomUUID());
  const offset = options.offset ?? { x: 30, y: 30 };
  const selected = new Set(ids);
  const copies = layout.placements
    .filter((p) => selected.has(p.id))
    .map((p): Placement => ({ ...p, id: makeId(), x: p.x + offset.x, y: p.y + offset.y }));
  if (copies.length === 0) return { layout, ids: [] };
  return { layout: { ...layout, placements: [...layout.placements, ...copies] }, ids: copies.map((c) => c.id) };
}

const pick = (v: Vec) => ({ x: v.x, y: v.y });
