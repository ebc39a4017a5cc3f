import type { PreviewView } from '../contracts/exports';
import type { CommentAnchor } from '../contracts/reviews';
import { WRAP_VIEWS } from '../wrap/wrap-views';

export type PreviewPoint = { x: number; y: number };
type Rect = { left: number; top: number; width: number; height: number };

/** Views a product is previewed from: the four sides of a wrap, or one flat view. */
export function previewViewsFor(template: { wrap: unknown }): readonly PreviewView[] {
  return template.wrap ? WRAP_VIEWS : ['flat'];
}

const clamp01 = (v: number) => Math.min(1, Math.max(0, v));
// Four decimals: a tenth of a pixel on a 1000 px preview, and short in the saved anchor.
const round4 = (v: number) => Math.round(v * 10_000) / 10_000;

/** A click on the shown image (client pixels) as a share of the image's width and height. */
export function previewPointFromClick(clientX: number, clientY: number, image: Rect): PreviewPoint | null {
  if (image.width <= 0 || image.height <= 0) return null;
  return { x: round4(clamp01((clientX - image.left) / image.width)), y: round4(clamp01((clientY - image.top) / image.height)) };
}

/** Moves a keyboard-placed pin by a step (a share of the image), staying on the image. */
export function nudgePreviewPoint(point: PreviewPoint, dx: number, dy: number): PreviewPoint {
  return { x: round4(clamp01(point.x + dx)), y: round4(clamp01(point.y + dy)) };
}

/** Where a thread's pin sits on the shown view, in percent of the image; null when pinned elsewhere. */
export function pinOnView(anchor: CommentAnchor | null, view: PreviewView): { leftPercent: number; topPercent: number } | null {
  if (!anchor || anchor.surface !== 'preview' || anchor.view !== view) return null;
  return { leftPercent: anchor.x * 100, topPercent: anchor.y * 100 };
}

/** Pin numbers in the order threads were opened, so numbers stay put when threads are resolved or filtered. */
export function pinNumbers(threads: readonly { id: string; createdAt: string }[]): Map<string, number> {
  const ordered = [...threads].sort((a, b) => a.createdAt.localeCompare(b.createdAt) || a.id.localeCompare(b.id));
  return new Map(ordered.map((t, i) => [t.id, i + 1]));
}

/** Plain words for where a thread is pinned, for the thread list and screen readers. */
export function anchorLabel(anchor: CommentAnchor | null): string {
  if (!anchor) return 'General comment';
  if (anchor.surface === 'preview') return `On the ${anchor.view} preview, ${Math.round(anchor.x * 100)} % across, ${Math.round(anchor.y * 100)} % down`;
  return `On the layout at ${Math.round(anchor.x)} × ${Math.round(anchor.y)} px`;
}
