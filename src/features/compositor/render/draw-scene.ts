import { compose, scale, type Affine, type Rect } from '@shared/geometry';
import { renderPlan, type MotifDrawOp, type Scene, type TextDrawOp } from '@shared/scene';
import { blankColoursOf, templateGeometry, type Template, type TemplateGeometry } from '@shared/templates';
import type { OverlaySettings } from '../overlay-settings';
import { viewportMatrix, type Viewport } from '../viewport';
import { canvasCompositeFor } from './blend-modes';
import type { MotifBitmap, MotifImageCache } from './image-cache';
import { textOutlinePath } from '@shared/text/text-layout';
import { fontCache } from './font-cache';
import { drawGuideImage, drawTemplateOverlays } from './overlays';

export type Ctx2D = CanvasRenderingContext2D;

export type DrawSceneOptions = {
  /** Device pixels per CSS pixel, so lines stay sharp on dense screens. */
  dpr?: number;
  geometry?: TemplateGeometry;
  variantId?: string | null;
  /** CSS px size of the canvas. */
  screen: { width: number; height: number };
  /** Drawn over the whole print file instead of the artwork (the soft proof: the design as it would print). */
  printView?: MotifBitmap | null;
  /** The printer's guide image, stretched over the whole file above the design; never in the print file. */
  guideImage?: MotifBitmap | null;
};

// Our own pasteboard: a calm sand grey, so the white blank stands out.
const PASTEBOARD = '#e4e0d8';
const VEIL = 'rgba(228, 224, 216, 0.72)';

const setMatrix = (ctx: Ctx2D, m: Affine) => ctx.setTransform(m[0], m[1], m[2], m[3], m[4], m[5]);

/** Template px to canvas device px: the view's pan and zoom, then the screen's pixel density. */
export const sceneScreenMatrix = (viewport: Viewport, dpr: number): Affine => compose(viewportMatrix(viewport), scale(dpr));

/**
 * Draws the product as the print file would show it (the shared render plan, unclipped so
 * artwork hanging over the edge stays visible under a veil), then the template's overlays.
 */
export function drawScene(ctx: Ctx2D, scene: Scene, template: Template, images: MotifImageCache, viewport: Viewport, overlays: OverlaySettings, options: DrawSceneOptions): void {
  const dpr = options.dpr ?? 1;
  const geometry = options.geometry ?? templateGeometry(template);
  const screenM = sceneScreenMatrix(viewport, dpr);
  drawBackdrop(ctx, template, geometry, screenM, options);
  if (options.printView) {
    const b = geometry.bleedRect;
    setMatrix(ctx, compose(scale(b.width / options.printView.width, b.height / options.printView.height), [1, 0, 0, 1, b.x, b.y], screenM));
    ctx.imageSmoothingEnabled = true;
    ctx.imageSmoothingQuality = 'medium';
    ctx.drawImage(options.printView, 0, 0);
  } else {
    const plan = renderPlan(scene, template, { clip: 'none' });
    // The print file holds the ink alone: a blend mode mixes with the artwork below it, never with
    // the bare blank. With any blend mode the artwork is drawn on its own transparent layer first,
    // as the print file is; with only normal ones the result is the same either way, so skip it.
    const layer = plan.ops.some((op) => op.blendMode !== 'normal') ? artworkLayer(ctx.canvas.width, ctx.canvas.height) : null;
    const target = layer ?? ctx;
    drawArtwork(target, plan.ops, images, screenM, geometry);
    if (layer) {
      ctx.setTransform(1, 0, 0, 1, 0, 0);
      ctx.drawImage(layer.canvas, 0, 0);
    }
  }
  drawVeilAndOverlays(ctx, geometry, overlays, screenM, viewport.zoom * dpr, options);
}

/** The pasteboard over the whole canvas and the blank's body colour over the file. */
export function drawBackdrop(ctx: Ctx2D, template: Template, geometry: TemplateGeometry, screenM: Affine, options: Pick<DrawSceneOptions, 'screen' | 'dpr' | 'variantId'>): void {
  const dpr = options.dpr ?? 1;
  ctx.setTransform(1, 0, 0, 1, 0, 0);
  ctx.globalAlpha = 1;
  ctx.globalCompositeOperation = 'source-over';
  ctx.fillStyle = PASTEBOARD;
  ctx.fillRect(0, 0, options.screen.width * dpr, options.screen.height * dpr);
  setMatrix(ctx, screenM);
  ctx.fillStyle = blankColoursOf(template, options.variantId).body;
  fillRect(ctx, geometry.bleedRect);
}

/** Draw operations of the render plan, in order, straight onto `ctx`. */
export function drawArtwork(ctx: Ctx2D, ops: readonly (MotifDrawOp | TextDrawOp)[], images: MotifImageCache, screenM: Affine, geometry: TemplateGeometry): void {
  for (const op of ops) drawOp(ctx, op, images, screenM, geometry);
}

/** What lies over the artwork: the veil outside the print area, the printer's guide image and the template's guides. */
export function drawVeilAndOverlays(ctx: Ctx2D, geometry: TemplateGeometry, overlays: OverlaySettings, screenM: Affine, pxPerScreen: number, options: Pick<DrawSceneOptions, 'printView' | 'guideImage'>): void {
  // Everything outside the print area will not print: veil it rather than hide it.
  setMatrix(ctx, screenM);
  ctx.globalAlpha = 1;
  ctx.globalCompositeOperation = 'source-over';
  ctx.fillStyle = VEIL;
  ctx.beginPath();
  const far = 1e6;
  ctx.rect(-far, -far, 2 * far, 2 * far);
  const p = geometry.printArea;
  ctx.rect(p.x, p.y + p.height, p.width, -p.height); // opposite winding cuts the hole
  ctx.fill('nonzero');

  // Not over the print simulation: that view shows only what the press would print.
  if (overlays.guideImage && options.guideImage && !options.printView) drawGuideImage(ctx, options.guideImage, geometry.bleedRect, screenM);
  drawTemplateOverlays(ctx, geometry, overlays, screenM, pxPerScreen);
}

function drawOp(ctx: Ctx2D, op: MotifDrawOp | TextDrawOp, images: MotifImageCache, screenM: Affine, geometry: TemplateGeometry): void {
  ctx.save();
  ctx.globalAlpha = op.opacity;
  ctx.globalCompositeOperation = canvasCompositeFor(op.blendMode);
  // A pattern stops at the print area even in the editor's unclipped plan, as it will in print.
  if (op.role === 'tile') {
    const c = op.clip ?? geometry.printArea;
    setMatrix(ctx, screenM);
    ctx.beginPath();
    ctx.rect(c.x, c.y, c.width, c.height);
    ctx.clip();
  }
  if (op.kind === 'motif') drawMotif(ctx, op, images, screenM);
  else drawText(ctx, op, screenM);
  ctx.restore();
}

// One transparent layer reused from frame to frame (a canvas per frame would churn memory during drags).
let layerCtx: Ctx2D | null = null;

function artworkLayer(width: number, height: number): Ctx2D | null {
  if (typeof document === 'undefined') return null;
  if (!layerCtx) layerCtx = document.createElement('canvas').getContext('2d');
  if (!layerCtx) return null;
  const c = layerCtx.canvas;
  if (c.width !== width || c.height !== height) {
    c.width = width;
    c.height = height;
  } else {
    layerCtx.setTransform(1, 0, 0, 1, 0, 0);
    layerCtx.clearRect(0, 0, width, height);
  }
  return layerCtx;
}

function drawMotif(ctx: Ctx2D, op: MotifDrawOp, images: MotifImageCache, screenM: Affine): void {
  const bitmap = images.getRecoloured(op.motifId, op.version, op.recolour);
  if (!bitmap) {
    // A placeholder of the right size and turn while the thumbnail loads (or if it failed).
    setMatrix(ctx, compose(op.matrix, screenM));
    ctx.fillStyle = images.isFailed(op.motifId, op.version) ? 'rgba(176, 64, 40, 0.25)' : 'rgba(40, 90, 110, 0.12)';
    ctx.fillRect(0, 0, op.width, op.height);
    return;
  }
  // The plan's matrix starts from full-resolution pixels; the thumb is smaller by width/bitmap.width.
  setMatrix(ctx, compose(scale(op.width / bitmap.width, op.height / bitmap.height), op.matrix, screenM));
  ctx.imageSmoothingEnabled = true;
  // 'low' (bilinear): 'high' costs several ms a frame in software rendering, and thumbs are near screen size anyway
  ctx.imageSmoothingQuality = 'low';
  ctx.drawImage(bitmap, 0, 0);
}

// Laid-out outlines by text and box: a drag moves the matrix, not the glyphs, so frames reuse them.
const outlineCache = new Map<string, Path2D>();

function textOutline(op: TextDrawOp): Path2D | null {
  const stack = fontCache.get(op.fontId);
  if (!stack || typeof Path2D === 'undefined') return null;
  const key = [op.fontId, op.sizePx, op.align, op.letterSpacing, op.arcDeg, op.width, op.height, op.content].join('\u0000');
  let path = outlineCache.get(key);
  if (!path) {
    path = new Path2D(textOutlinePath(op, { width: op.width, height: op.height }, stack));
    if (outlineCache.size > 200) outlineCache.delete(outlineCache.keys().next().value as string);
    outlineCache.set(key, path);
  }
  return path;
}

// Text from the shipped fonts' glyph outlines, the same path the print file fills (shared/text).
function drawText(ctx: Ctx2D, op: TextDrawOp, screenM: Affine): void {
  setMatrix(ctx, compose(op.matrix, screenM));
  const path = textOutline(op);
  if (!path) {
    // a faint box of the text's size while its font loads
    ctx.fillStyle = 'rgba(40, 90, 110, 0.12)';
    ctx.fillRect(0, 0, op.width, op.height);
    return;
  }
  ctx.fillStyle = op.colour;
  ctx.fill(path);
}

export function fillRect(ctx: Ctx2D, r: Rect): void {
  ctx.fillRect(r.x, r.y, r.width, r.height);
}
