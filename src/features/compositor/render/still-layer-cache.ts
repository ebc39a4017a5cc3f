import type { Layout, Scene } from '@shared/scene';
import { renderPlan } from '@shared/scene';
import type { Template, TemplateGeometry } from '@shared/templates';
import type { OverlaySettings } from '../overlay-settings';
import type { Viewport } from '../viewport';
import { drawArtwork, drawBackdrop, drawVeilAndOverlays, sceneScreenMatrix, type Ctx2D } from './draw-scene';
import type { MotifBitmap, MotifImageCache } from './image-cache';
import { movedPlacementIds, splitAroundMoved } from './still-layers';

export type GestureFrame = {
  scene: Scene;
  /** The layout at pointer-down. */
  snapshot: Layout;
  template: Template;
  geometry: TemplateGeometry;
  images: MotifImageCache;
  fontGeneration: number;
  viewport: Viewport;
  overlays: OverlaySettings;
  guideImage: MotifBitmap | null;
  printView: MotifBitmap | null;
  /** CSS px size of the canvas. */
  screen: { width: number; height: number };
  dpr: number;
};

/** Everything the two still layers were drawn from; any difference draws them again. */
type StillKey = {
  snapshot: Layout; moved: string; viewport: Viewport; overlays: OverlaySettings; guideImage: MotifBitmap | null;
  images: number; fonts: number; width: number; height: number; dpr: number;
};

const sameKey = (a: StillKey, b: StillKey) =>
  a.snapshot === b.snapshot && a.moved === b.moved && a.viewport === b.viewport && a.overlays === b.overlays && a.guideImage === b.guideImage &&
  a.images === b.images && a.fonts === b.fonts && a.width === b.width && a.height === b.height && a.dpr === b.dpr;

/**
 * During a gesture only the moved placements change, and the browser rasterises a 2D canvas in
 * software here: redrawing all 60 placements each frame costs several ms of the main thread. So
 * the pasteboard, blank and placements under the moved ones are drawn once into one bitmap, the
 * placements over them with the veil and the guides into a transparent one, and each frame stacks
 * the two around the moved placements. Source-over is associative, so the stack matches a full
 * draw; with a blend mode in the plan it would not, and the caller draws in full.
 */
export class StillLayerCache {
  private below: Ctx2D | null = null;
  private above: Ctx2D | null = null;
  private key: StillKey | null = null;

  /** Draws the frame from the still layers; false when it cannot (the caller then draws in full). */
  draw(ctx: Ctx2D, f: GestureFrame): boolean {
    if (f.printView || typeof document === 'undefined') return false;
    const moved = movedPlacementIds(f.snapshot, f.scene.layout);
    if (!moved) return false;
    const plan = renderPlan(f.scene, f.template, { clip: 'none' });
    if (plan.ops.some((op) => op.blendMode !== 'normal')) return false;
    const { below, live, above } = splitAroundMoved(plan.ops, moved);
    const width = ctx.canvas.width;
    const height = ctx.canvas.height;
    const screenM = sceneScreenMatrix(f.viewport, f.dpr);
    const key: StillKey = {
      snapshot: f.snapshot, moved: [...moved].join('\u0000'), viewport: f.viewport, overlays: f.overlays, guideImage: f.guideImage,
      images: f.images.generation, fonts: f.fontGeneration, width, height, dpr: f.dpr,
    };
    if (!this.key || !sameKey(this.key, key)) {
      // the pasteboard covers it edge to edge, so the lower layer is opaque and stacks as a plain copy
      const lower = this.below = layerOf(this.below, width, height, false);
      const upper = this.above = layerOf(this.above, width, height, true);
      if (!lower || !upper) return false;
      drawBackdrop(lower, f.template, f.geometry, screenM, { screen: f.screen, dpr: f.dpr });
      drawArtwork(lower, below, f.images, screenM, f.geometry);
      drawArtwork(upper, above, f.images, screenM, f.geometry);
      drawVeilAndOverlays(upper, f.geometry, f.overlays, screenM, f.viewport.zoom * f.dpr, { guideImage: f.guideImage, printView: null });
      this.key = key;
    }
    ctx.setTransform(1, 0, 0, 1, 0, 0);
    ctx.globalAlpha = 1;
    ctx.globalCompositeOperation = 'source-over';
    ctx.drawImage(this.below!.canvas, 0, 0);
    drawArtwork(ctx, live, f.images, screenM, f.geometry);
    ctx.setTransform(1, 0, 0, 1, 0, 0);
    ctx.drawImage(this.above!.canvas, 0, 0);
    return true;
  }

  /** After the gesture: the next one starts from a new snapshot, so these layers are stale. */
  forget(): void {
    this.key = null;
  }
}

function layerOf(current: Ctx2D | null, width: number, height: number, transparent: boolean): Ctx2D | null {
  const ctx = current ?? document.createElement('canvas').getContext('2d', { alpha: transparent });
  if (!ctx) return null;
  const c = ctx.canvas;
  if (c.width !== width || c.height !== height) {
    c.width = width;
    c.height = height;
  } else if (transparent) {
    ctx.setTransform(1, 0, 0, 1, 0, 0);
    ctx.clearRect(0, 0, width, height);
  }
  return ctx;
}
