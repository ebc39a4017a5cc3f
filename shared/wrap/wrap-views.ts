import { radians, type Radians } from '../geometry';
import { mod, type WrapCylinder } from './cylinder';

export const WRAP_VIEWS = ['front', 'handle-right', 'back', 'handle-left'] as const;
export type WrapView = (typeof WRAP_VIEWS)[number];

/** Angle from the front centre of the point facing the viewer; the handle sits at handleAngle. */
export function handleAngle(cyl: WrapCylinder): Radians {
  return radians((cyl.handleX - cyl.frontCentreX) / cyl.radiusPx);
}

/** front: handle hidden behind; back: handle towards the viewer; handle-left/right: the handle on that edge. */
export function viewAngle(cyl: WrapCylinder, view: WrapView): Radians {
  const h = handleAngle(cyl);
  const offset = { front: -Math.PI, 'handle-right': -Math.PI / 2, back: 0, 'handle-left': Math.PI / 2 }[view];
  return radians(h + offset);
}

export type StripRange = { from: number; to: number };

/** The strip x ranges (template px) on the near half of the mug in a view, left to right along the strip. */
export function visibleStripRanges(cyl: WrapCylinder, view: WrapView): StripRange[] {
  const c = cyl.circumferencePx;
  const centre = cyl.frontCentreX + viewAngle(cyl, view) * cyl.radiusPx;
  const start = cyl.stripLeft + mod(centre - c / 4 - cyl.stripLeft, c); // first visible x at or after the strip's left edge
  const ranges: StripRange[] = [];
  for (const from of [start - c, start]) {
    const a = Math.max(from, cyl.stripLeft);
    const b = Math.min(from + c / 2, cyl.stripRight);
    if (b > a) ranges.push({ from: a, to: b });
  }
  return ranges;
}

export type HandleInView = {
  /** Screen x of the handle's centre line from the axis (template px). */
  x: number;
  depth: number;
  /** Where a preview draws it: beside the body on a side, or in front of / behind it. */
  side: 'left' | 'right' | 'in-front' | 'behind';
};

export function handleInView(cyl: WrapCylinder, view: WrapView): HandleInView {
  const psi = handleAngle(cyl) - viewAngle(cyl, view);
  const sin = Math.sin(psi);
  const cos = Math.cos(psi);
  const side = Math.abs(sin) > Math.SQRT1_2 ? (sin > 0 ? 'right' : 'left') : cos > 0 ? 'in-front' : 'behind';
  return { x: cyl.radiusPx * sin, depth: cyl.radiusPx * cos, side };
}
