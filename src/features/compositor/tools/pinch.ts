import type { Vec } from '@shared/geometry';
import { clampZoom, screenToTemplate, type Viewport } from '../viewport';

/** The view and the two fingers' screen points when the second finger touched down. */
export type PinchStart = { readonly viewport: Viewport; readonly a: Vec; readonly b: Vec };

const midpoint = (a: Vec, b: Vec): Vec => ({ x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 });

/**
 * Two-finger zoom and pan, always from the pinch's start (never the previous frame, so rounding
 * does not drift): the zoom grows with the fingers' spread, and the template point that was under
 * their midpoint stays under their midpoint wherever it moves.
 */
export function pinchViewport(start: PinchStart, a: Vec, b: Vec): Viewport {
  const d0 = Math.hypot(start.b.x - start.a.x, start.b.y - start.a.y);
  const d1 = Math.hypot(b.x - a.x, b.y - a.y);
  // fingers on one spot give no spread to compare: pan only
  const zoom = clampZoom(d0 < 1 ? start.viewport.zoom : start.viewport.zoom * (d1 / d0));
  const anchor = screenToTemplate(start.viewport, midpoint(start.a, start.b));
  const mid = midpoint(a, b);
  return { zoom, panX: mid.x - anchor.x * zoom, panY: mid.y - anchor.y * zoom };
}

/**
 * The touch points on the canvas. With one finger the select tool works as with a mouse; a second
 * finger turns the touch into a pinch until every finger has lifted.
 */
export class TouchPinch {
  private readonly points = new Map<number, Vec>();
  private start: PinchStart | null = null;
  private pinched = false;

  /** Returns 'pinch' when this finger starts a pinch, 'tool' when it is the first finger. */
  down(pointerId: number, at: Vec, viewport: Viewport): 'pinch' | 'tool' | 'ignore' {
    this.points.set(pointerId, at);
    if (this.points.size === 1 && !this.pinched) return 'tool';
    if (this.points.size === 2) {
      const [a, b] = [...this.points.values()];
      this.start = { viewport, a, b };
      this.pinched = true;
      return 'pinch';
    }
    return 'ignore';
  }

  /** The view for the fingers' new places while pinching; null when this move is not part of a pinch. */
  move(pointerId: number, at: Vec): Viewport | null {
    if (!this.points.has(pointerId)) return null;
    this.points.set(pointerId, at);
    if (!this.start || this.points.size !== 2) return null;
    const [a, b] = [...this.points.values()];
    return pinchViewport(this.start, a, b);
  }

  up(pointerId: number): void {
    this.points.delete(pointerId);
    if (this.points.size < 2) this.start = null;
    if (this.points.size === 0) this.pinched = false;
  }

  /** True from the second finger until the last one lifts: single-finger moves then do nothing. */
  get active(): boolean {
    return this.pinched;
  }
}
