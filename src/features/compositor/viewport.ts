import { applyToPoint, invert, type Affine, type Rect, type Vec } from '@shared/geometry';
import { templatePoint, type TemplatePoint } from '@shared/scene';

/** Screen (CSS px of the canvas element) = template px × zoom + pan. */
export type Viewport = { readonly zoom: number; readonly panX: number; readonly panY: number };

export type ScreenPoint = Vec & { readonly __space: 'screen' };
export const screenPoint = (x: number, y: number): ScreenPoint => ({ x, y }) as ScreenPoint;

// From 1 screen px per 50 template px (a whole 300 DPI wrap on a small screen) to 8× for detail.
export const MIN_ZOOM = 0.02;
export const MAX_ZOOM = 8;
export const ZOOM_STEP = 1.25;

export const clampZoom = (z: number) => Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, Number.isFinite(z) ? z : 1));

export function viewportMatrix(v: Viewport): Affine {
  return [v.zoom, 0, 0, v.zoom, v.panX, v.panY];
}

export function screenToTemplate(v: Viewport, p: Vec): TemplatePoint {
  return templatePoint((p.x - v.panX) / v.zoom, (p.y - v.panY) / v.zoom);
}

export function templateToScreen(v: Viewport, p: Vec): ScreenPoint {
  return screenPoint(p.x * v.zoom + v.panX, p.y * v.zoom + v.panY);
}

/** Zooms so the template point under `anchor` (screen) stays under it: wheel and pinch zoom about the pointer. */
export function zoomAbout(v: Viewport, nextZoom: number, anchor: Vec): Viewport {
  const zoom = clampZoom(nextZoom);
  const t = screenToTemplate(v, anchor);
  return { zoom, panX: anchor.x - t.x * zoom, panY: anchor.y - t.y * zoom };
}

export function zoomStep(v: Viewport, direction: 'in' | 'out', anchor: Vec): Viewport {
  return zoomAbout(v, direction === 'in' ? v.zoom * ZOOM_STEP : v.zoom / ZOOM_STEP, anchor);
}

export function panBy(v: Viewport, dx: number, dy: number): Viewport {
  return { ...v, panX: v.panX + dx, panY: v.panY + dy };
}

/** The whole of `content` (template px) centred in a screen of `screen` size, with a margin in screen px for the rulers. */
export function fitViewport(content: Rect, screen: { width: number; height: number }, marginPx = 32): Viewport {
  const availW = Math.max(1, screen.width - 2 * marginPx);
  const availH = Math.max(1, screen.height - 2 * marginPx);
  const zoom = clampZoom(Math.min(availW / Math.max(1, content.width), availH / Math.max(1, content.height)));
  return {
    zoom,
    panX: (screen.width - content.width * zoom) / 2 - content.x * zoom,
    panY: (screen.height - content.height * zoom) / 2 - content.y * zoom,
  };
}

/** Template px under the screen rect (e.g. a marquee dragged on screen). */
export function screenRectToTemplate(v: Viewport, a: Vec, b: Vec): Rect {
  const p = screenToTemplate(v, a);
  const q = screenToTemplate(v, b);
  return { x: Math.min(p.x, q.x), y: Math.min(p.y, q.y), width: Math.abs(p.x - q.x), height: Math.abs(p.y - q.y) };
}

/** Inverse of the viewport matrix; null never happens for a clamped zoom but keeps the types honest. */
export const inverseViewport = (v: Viewport): Affine | null => invert(viewportMatrix(v));

export const applyViewport = (v: Viewport, p: Vec): Vec => applyToPoint(viewportMatrix(v), p);
