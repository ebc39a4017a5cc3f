import { useRef, useState, type MouseEvent, type PointerEvent, type RefObject } from 'react';
import type { Rect } from '../selection';

// A drag under this distance is a click, not a lasso.
const LASSO_THRESHOLD_PX = 6;

type LassoHandlers = {
  /** Called as the rectangle grows, in the grid's own coordinates. */
  onLasso: (rect: Rect, additive: boolean) => void;
  onLassoStart: () => void;
};

// Drag with the mouse across the grid to select every motif the rectangle touches.
export function useLasso(gridRef: RefObject<HTMLElement | null>, enabled: boolean, handlers: LassoHandlers) {
  const start = useRef<{ x: number; y: number; additive: boolean; active: boolean } | null>(null);
  const justEnded = useRef(false);
  const [rect, setRect] = useState<Rect | null>(null);

  const pointAt = (event: PointerEvent) => {
    const box = gridRef.current?.getBoundingClientRect();
    return box ? { x: event.clientX - box.left, y: event.clientY - box.top } : { x: 0, y: 0 };
  };

  const onPointerDown = (event: PointerEvent<HTMLElement>) => {
    if (!enabled || event.pointerType !== 'mouse' || event.button !== 0) return;
    if ((event.target as HTMLElement).closest('input, button')) return;
    const { x, y } = pointAt(event);
    start.current = { x, y, additive: event.shiftKey || event.ctrlKey || event.metaKey, active: false };
  };

  const onPointerMove = (event: PointerEvent<HTMLElement>) => {
    const from = start.current;
    if (!from) return;
    const { x, y } = pointAt(event);
    if (!from.active) {
      if (Math.hypot(x - from.x, y - from.y) < LASSO_THRESHOLD_PX) return;
      from.active = true;
      event.currentTarget.setPointerCapture(event.pointerId);
      handlers.onLassoStart();
    }
    event.preventDefault();
    const next = { left: Math.min(from.x, x), top: Math.min(from.y, y), right: Math.max(from.x, x), bottom: Math.max(from.y, y) };
    setRect(next);
    handlers.onLasso(next, from.additive);
    // Near the window's edge the page scrolls, so a lasso can reach rows not on screen yet.
    if (event.clientY > window.innerHeight - 40) window.scrollBy(0, 24);
    else if (event.clientY < 40) window.scrollBy(0, -24);
  };

  const end = (event: PointerEvent<HTMLElement>) => {
    const from = start.current;
    start.current = null;
    if (from?.active) {
      justEnded.current = true;
      // No click follows when the button is released outside the grid.
      setTimeout(() => {
        justEnded.current = false;
      }, 0);
      setRect(null);
      if (event.currentTarget.hasPointerCapture(event.pointerId)) event.currentTarget.releasePointerCapture(event.pointerId);
    }
  };

  // The click that ends a lasso must not also open the motif under the pointer.
  const onClickCapture = (event: MouseEvent) => {
    if (justEnded.current) {
      justEnded.current = false;
      event.preventDefault();
      event.stopPropagation();
    }
  };

  return { rect, handlers: { onPointerDown, onPointerMove, onPointerUp: end, onPointerCancel: end, onClickCapture } };
}
