import { rectsIntersect, type Rect, type Vec } from '@shared/geometry';
import {
  hitTest, mirrorAxisX, movePlacements, placementBounds, rotatePlacements, scalePlacements, snapMove, snapScale, snapTargets,
  type Layout, type ScaleCorner, type SnapTargets,
} from '@shared/scene';
import type { ProductEditor } from '../editor';
import { screenRectToTemplate, screenToTemplate, type ScreenPoint } from '../viewport';
import { scaleFactor, snappedTurn, turnDegrees } from './gesture-maths';
import { handleAt, selectionHandles } from './handles';

/** The part of the editor a tool drives; tests pass a small fake. */
export type ToolHost = Pick<ProductEditor,
  'layout' | 'selection' | 'viewport' | 'geometry' | 'select' | 'toggleSelected' | 'selectionBounds' |
  'beginGesture' | 'previewGesture' | 'commitGesture' | 'cancelGesture'>;

export type Modifiers = { shift: boolean; alt: boolean };

// Screen px the pointer must travel before a press becomes a drag, so clicks don't nudge.
export const DRAG_THRESHOLD_PX = 3;
// Screen px within which edges and centres snap.
export const SNAP_THRESHOLD_PX = 6;

type Idle = { name: 'idle' };
type Pointing = { name: 'pointing'; start: ScreenPoint; intent: 'translate' | 'marquee'; hitId: string | null; additive: boolean };
type Translating = { name: 'translating'; start: ScreenPoint; snapshot: Layout; ids: readonly string[]; startBounds: Rect; targets: SnapTargets };
type Scaling = { name: 'scaling'; start: ScreenPoint; snapshot: Layout; ids: readonly string[]; centre: Vec; startBounds: Rect; corner: ScaleCorner; targets: SnapTargets };
type Rotating = { name: 'rotating'; start: ScreenPoint; snapshot: Layout; ids: readonly string[]; centre: Vec; originalDeg: number };
type Marquee = { name: 'marquee'; start: ScreenPoint; base: readonly string[] };

export type SelectToolState = Idle | Pointing | Translating | Scaling | Rotating | Marquee;

/**
 * Pointer gestures on the canvas: press on a placement to select and drag it, on a corner handle to
 * scale, on the round handle to rotate, on empty space to draw a marquee. Each drag is one history
 * entry; Escape returns to the snapshot taken at pointer-down.
 */
export class SelectTool {
  state: SelectToolState = { name: 'idle' };

  constructor(private readonly host: ToolHost) {}

  pointerDown(screen: ScreenPoint, mods: Modifiers): void {
    if (this.state.name !== 'idle') this.cancel();
    const host = this.host;
    const bounds = host.selectionBounds();
    const handle = bounds ? handleAt(selectionHandles(bounds, host.viewport), screen) : null;
    if (bounds && handle) {
      const snapshot = host.beginGesture('pointer');
      const centre = { x: bounds.x + bounds.width / 2, y: bounds.y + bounds.height / 2 };
      const ids = movable(snapshot, host.selection);
      if (handle.kind === 'rotate') {
        const only = ids.length === 1 ? snapshot.placements.find((p) => p.id === ids[0]) : undefined;
        this.state = { name: 'rotating', start: screen, snapshot, ids, centre, originalDeg: only?.rotationDeg ?? 0 };
      } else {
        const corner: ScaleCorner = { x: handle.kind === 'scale-nw' || handle.kind === 'scale-sw' ? -1 : 1, y: handle.kind === 'scale-nw' || handle.kind === 'scale-ne' ? -1 : 1 };
        this.state = { name: 'scaling', start: screen, snapshot, ids, centre, startBounds: bounds, corner, targets: snapTargets(snapshot, host.geometry, host.selection) };
      }
      return;
    }
    const point = screenToTemplate(host.viewport, screen);
    const hit = hitTest({ layout: host.layout, sceneVersion: 0 }, point, { mirrorAxisX: mirrorAxisX(host.geometry), repeatArea: host.geometry.printArea });
    const hitId = hit?.placement.id ?? null;
    if (hitId) {
      if (mods.shift) host.toggleSelected(hitId);
      else if (!host.selection.includes(hitId)) host.select([hitId]);
      this.state = { name: 'pointing', start: screen, intent: 'translate', hitId, additive: mods.shift };
    } else {
      if (!mods.shift) host.select([]);
      this.state = { name: 'pointing', start: screen, intent: 'marquee', hitId: null, additive: mods.shift };
    }
  }

  pointerMove(screen: ScreenPoint, mods: Modifiers): void {
    const s = this.state;
    const host = this.host;
    if (s.name === 'pointing') {
      if (Math.hypot(screen.x - s.start.x, screen.y - s.start.y) < DRAG_THRESHOLD_PX) return;
      if (s.intent === 'marquee') {
        host.beginGesture('pointer');
        this.state = { name: 'marquee', start: s.start, base: host.selection };
      } else {
        const snapshot = host.beginGesture('pointer');
        const ids = movable(snapshot, host.selection);
        const startBounds = host.selectionBounds();
        if (!startBounds || ids.length === 0) {
          this.state = { name: 'idle' };
          host.cancelGesture();
          return;
        }
        this.state = { name: 'translating', start: s.start, snapshot, ids, startBounds, targets: snapTargets(snapshot, host.geometry, host.selection) };
      }
      this.pointerMove(screen, mods);
      return;
    }
    if (s.name === 'translating') {
      const zoom = host.viewport.zoom;
      const delta = { x: (screen.x - s.start.x) / zoom, y: (screen.y - s.start.y) / zoom };
      const moved = { ...s.startBounds, x: s.startBounds.x + delta.x, y: s.startBounds.y + delta.y };
      // Alt holds snapping off, for fine placement near a guide.
      const snap = mods.alt ? { dx: 0, dy: 0, guides: [] } : snapMove(moved, s.targets, SNAP_THRESHOLD_PX / zoom);
      host.previewGesture((snapshot) => movePlacements(snapshot, s.ids, { x: delta.x + snap.dx, y: delta.y + snap.dy }), { guides: snap.guides });
    } else if (s.name === 'scaling') {
      const from = screenToTemplate(host.viewport, s.start);
      const to = screenToTemplate(host.viewport, screen);
      const free = scaleFactor(s.centre, from, to);
      // the dragged corner's edges snap as a move's do; Alt again holds snapping off
      const snap = mods.alt ? { factor: free, guides: [] } : snapScale(s.startBounds, free, s.corner, s.targets, SNAP_THRESHOLD_PX / host.viewport.zoom);
      host.previewGesture((snapshot) => scalePlacements(snapshot, s.ids, snap.factor, s.ids.length > 1 ? s.centre : undefined), { guides: snap.guides });
    } else if (s.name === 'rotating') {
      const from = screenToTemplate(host.viewport, s.start);
      const to = screenToTemplate(host.viewport, screen);
      const turn = snappedTurn(s.originalDeg, turnDegrees(s.centre, from, to), mods.shift);
      host.previewGesture((snapshot) => rotatePlacements(snapshot, s.ids, turn, s.ids.length > 1 ? s.centre : undefined));
    } else if (s.name === 'marquee') {
      const rect = screenRectToTemplate(host.viewport, s.start, screen);
      const inside = host.layout.placements.filter((p) => !p.hidden && rectsIntersect(placementBounds(p), rect)).map((p) => p.id);
      host.previewGesture((snapshot) => snapshot, { marquee: rect });
      host.select([...new Set([...s.base, ...inside])]);
    }
  }

  pointerUp(): void {
    const s = this.state;
    this.state = { name: 'idle' };
    if (s.name === 'pointing') {
      // A plain click on one of several selected placements narrows the selection to it.
      if (s.hitId && !s.additive && this.host.selection.length > 1) this.host.select([s.hitId]);
      return;
    }
    if (s.name !== 'idle') this.host.commitGesture();
  }

  /** Escape during a drag; returns whether there was a gesture to cancel. */
  cancel(): boolean {
    const s = this.state;
    this.state = { name: 'idle' };
    if (s.name === 'idle' || s.name === 'pointing') return false;
    if (s.name === 'marquee') this.host.select(s.base);
    this.host.cancelGesture();
    return true;
  }

  get busy(): boolean {
    return this.state.name !== 'idle';
  }
}

// Locked placements stay selected (to inspect them) but do not move.
function movable(layout: Layout, ids: readonly string[]): readonly string[] {
  const set = new Set(ids);
  return layout.placements.filter((p) => set.has(p.id) && !p.locked).map((p) => p.id);
}
