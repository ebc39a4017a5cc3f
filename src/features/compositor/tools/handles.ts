import type { Rect, Vec } from '@shared/geometry';
import { templateToScreen, type Viewport } from '../viewport';

export type HandleKind = 'scale-nw' | 'scale-ne' | 'scale-se' | 'scale-sw' | 'rotate';

export type Handle = { kind: HandleKind; screen: Vec };

// Screen px: big enough to hit with a trackpad, small enough not to hide a small motif.
export const HANDLE_SIZE_PX = 10;
export const ROTATE_HANDLE_OFFSET_PX = 28;

/** Handles of the selection's bounds, in screen px, so they keep their size at every zoom. */
export function selectionHandles(bounds: Rect, viewport: Viewport): Handle[] {
  const tl = templateToScreen(viewport, { x: bounds.x, y: bounds.y });
  const br = templateToScreen(viewport, { x: bounds.x + bounds.width, y: bounds.y + bounds.height });
  return [
    { kind: 'scale-nw', screen: { x: tl.x, y: tl.y } },
    { kind: 'scale-ne', screen: { x: br.x, y: tl.y } },
    { kind: 'scale-se', screen: { x: br.x, y: br.y } },
    { kind: 'scale-sw', screen: { x: tl.x, y: br.y } },
    { kind: 'rotate', screen: { x: (tl.x + br.x) / 2, y: tl.y - ROTATE_HANDLE_OFFSET_PX } },
  ];
}

export function handleAt(handles: readonly Handle[], screen: Vec): Handle | null {
  const reach = HANDLE_SIZE_PX * 0.8;
  for (const h of handles) {
    if (Math.abs(h.screen.x - screen.x) <= reach && Math.abs(h.screen.y - screen.y) <= reach) return h;
  }
  return null;
}
