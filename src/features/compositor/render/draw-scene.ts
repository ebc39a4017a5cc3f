import { compose, scale, type Affine, type Rect } from '@shared/geometry';
import { renderPlan, type MotifDrawOp, type Scene, type TextDrawOp } from '@shared/scene';
import { blankColoursOf, templateGeometry, type Template, type TemplateGeometry } from '@shared/templates';
import type { OverlaySettings } from '../overlay-settings';
import { viewportMatrix, type Viewport } from '../viewport';
import { canvasCompositeFor } from './blend-modes';
import type { MotifImageCache } from './image-cache';
import { drawTemplateOverlays } from './overlays';

export type Ctx2D = CanvasRenderingContext2D;

export type DrawSceneOptions = {
  /** Device pixels per CSS pixel, so lines stay sharp on dense screens. */
  dpr?: number;
  geometry?: TemplateGeometry;
  variantId?: string | null;
  /** CSS px size of the canvas. */
  screen: { width: number; height: number };
};

// Our own pasteboard: a calm sand grey, so the white blank stands out.
const PASTEBOARD = '#e4e0d8';
const VEIL = 'rgba(228, 224, 216, 0.72)';

const setMatrix = (ctx: Ctx2D, m: Affine) => ctx.setTransform(m[0], m[1], m[2], m[3], m[4], m[5]);

/**
 * Draws the product as the print file would show it (the shared render plan, unclipped so
 * artwork hanging over the edge stays visible under a veil), then the template's overlays.
 */
export function drawScene(ctx: Ctx2D, scene: Scene, template: Template, images: MotifImageCache, viewport: Viewport, overlays: OverlaySettings, options: DrawSceneOptions): void {
  const dpr = options.dpr ?? 1;
  const geometry = options.geometry ?? templateGeometry(template);
  const screenM: Affine = compose(viewportMatrix(viewport), scale(dpr));

  ctx.setTransform(1, 0, 0, 1, 0, 0);
  ctx.globalAlpha = 1;
  ctx.globalCompositeOperation = 'source-over';
  ctx.fillStyle = PASTEBOARD;
  ctx.fillRect(0, 0, options.screen.width * dpr, options.screen.height * dpr);

  setMatrix(ctx, screenM);
  ctx.fillStyle = blankColoursOf(template, options.variantId).body;
  fillRect(ctx, geometry.bleedRect);

  const plan = renderPlan(scene, template, { clip: 'none' });
  for (const op of plan.ops) {
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

  // Everything outside the print area will not print: veil it rather than hide it.
  setMatrix(ctx, screenM);
  ctx.fillStyle = VEIL;
  ctx.beginPath();
  const far = 1e6;
  ctx.rect(-far, -far, 2 * far, 2 * far);
  const p = geometry.printArea;
  ctx.rect(p.x, p.y + p.height, p.width, -p.height); // opposite winding cuts the hole
  ctx.fill('nonzero');

  drawTemplateOverlays(ctx, geometry, overlays, screenM, viewport.zoom * dpr);
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

// Source Sans 3 from @fontsource, loaded by the page; outlines (opentype.js) are a later step.
export const TEXT_FONT_FAMILY = '"Source Sans 3", sans-serif';

function drawText(ctx: Ctx2D, op: TextDrawOp, screenM: Affine): void {
  setMatrix(ctx, compose(op.matrix, screenM));
  ctx.fillStyle = op.colour;
  ctx.font = `${op.sizePx}px ${TEXT_FONT_FAMILY}`;
  ctx.textBaseline = 'middle';
  ctx.textAlign = op.align === 'centre' ? 'center' : op.align;
  if ('letterSpacing' in ctx) ctx.letterSpacing = `${(op.letterSpacing / 1000) * op.sizePx}px`;
  const x = op.align === 'left' ? 0 : op.align === 'right' ? op.width : op.width / 2;
  const lines = op.content.split('\n');
  const lineHeight = op.sizePx * 1.2;
  const top = op.height / 2 - ((lines.length - 1) * lineHeight) / 2;
  lines.forEach((line, i) => ctx.fillText(line, x, top + i * lineHeight));
}

export function fillRect(ctx: Ctx2D, r: Rect): void {
  ctx.fillRect(r.x, r.y, r.width, r.height);
}
