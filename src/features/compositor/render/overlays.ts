import { compose, scale, type Affine, type Rect } from '@shared/geometry';
import type { TemplateGeometry } from '@shared/templates';
import { GUIDE_IMAGE_OPACITY, type OverlaySettings } from '../overlay-settings';
import type { MotifBitmap } from './image-cache';

type Ctx2D = CanvasRenderingContext2D;

// Our own guide colours: rust for "will be cut", teal for "keep inside", plum for zones.
export const overlayColours = {
  bleed: 'rgba(176, 64, 40, 0.10)',
  trim: '#b04028',
  safe: '#1f7a8c',
  printArea: '#35505e',
  keepOut: 'rgba(110, 52, 120, 0.22)',
  keepOutLine: '#6e3478',
  seam: '#6e3478',
  frontCentre: '#1f7a8c',
} as const;

/**
 * Non-printing guides in template px: `pxPerScreen` (screen device px per template px) keeps
 * line widths and dashes the same on screen at every zoom.
 */
export function drawTemplateOverlays(ctx: Ctx2D, g: TemplateGeometry, o: OverlaySettings, screenM: Affine, pxPerScreen: number): void {
  ctx.save();
  ctx.setTransform(screenM[0], screenM[1], screenM[2], screenM[3], screenM[4], screenM[5]);
  const px = 1 / pxPerScreen;
  ctx.lineWidth = 1.5 * px;

  if (o.bleed) {
    // The band between the file's edge and the trim line, which the cutter may take.
    ctx.fillStyle = overlayColours.bleed;
    ctx.beginPath();
    ctx.rect(g.bleedRect.x, g.bleedRect.y, g.bleedRect.width, g.bleedRect.height);
    ctx.rect(g.trim.x, g.trim.y + g.trim.height, g.trim.width, -g.trim.height);
    ctx.fill('nonzero');
  }
  if (o.keepOuts) {
    for (const k of g.keepOuts) {
      ctx.fillStyle = overlayColours.keepOut;
      fill(ctx, k.rect);
      hatch(ctx, k.rect, 14 * px, overlayColours.keepOutLine, px);
      // Along the strip: a handle zone is far narrower than its label.
      ctx.save();
      ctx.translate(k.rect.x + k.rect.width / 2 - 4 * px, k.rect.y + 8 * px);
      ctx.rotate(Math.PI / 2);
      label(ctx, k.label, 0, 0, px, overlayColours.keepOutLine);
      ctx.restore();
    }
  }
  if (o.printArea && !sameRect(g.printArea, g.bleedRect)) stroke(ctx, g.printArea, overlayColours.printArea, []);
  if (o.trim) stroke(ctx, g.trim, overlayColours.trim, []);
  if (o.safeArea) stroke(ctx, g.safeRect, overlayColours.safe, [6 * px, 4 * px]);
  if (o.seam && g.seamX !== null) vertical(ctx, g.seamX, g.bleedRect, overlayColours.seam, [2 * px, 3 * px], 'Seam', px);
  if (o.frontCentre && g.frontCentreX !== null) vertical(ctx, g.frontCentreX, g.bleedRect, overlayColours.frontCentre, [10 * px, 4 * px, 2 * px, 4 * px], 'Front centre', px);
  ctx.restore();
}

/** The printer's guide image stretched over the whole file (its drawing covers the file edge to edge), half see-through. */
export function drawGuideImage(ctx: Ctx2D, image: MotifBitmap, file: Rect, screenM: Affine): void {
  ctx.save();
  const m = compose(scale(file.width / image.width, file.height / image.height), [1, 0, 0, 1, file.x, file.y], screenM);
  ctx.setTransform(m[0], m[1], m[2], m[3], m[4], m[5]);
  ctx.globalAlpha = GUIDE_IMAGE_OPACITY;
  ctx.globalCompositeOperation = 'source-over';
  ctx.imageSmoothingEnabled = true;
  ctx.imageSmoothingQuality = 'low';
  ctx.drawImage(image, 0, 0);
  ctx.restore();
}

const sameRect = (a: Rect, b: Rect) => a.x === b.x && a.y === b.y && a.width === b.width && a.height === b.height;

function fill(ctx: Ctx2D, r: Rect) {
  ctx.fillRect(r.x, r.y, r.width, r.height);
}

function stroke(ctx: Ctx2D, r: Rect, colour: string, dash: number[]) {
  ctx.strokeStyle = colour;
  ctx.setLineDash(dash);
  ctx.strokeRect(r.x, r.y, r.width, r.height);
  ctx.setLineDash([]);
}

function vertical(ctx: Ctx2D, x: number, span: Rect, colour: string, dash: number[], text: string, px: number) {
  ctx.strokeStyle = colour;
  ctx.setLineDash(dash);
  ctx.beginPath();
  ctx.moveTo(x, span.y);
  ctx.lineTo(x, span.y + span.height);
  ctx.stroke();
  ctx.setLineDash([]);
  label(ctx, text, x + 4 * px, span.y + span.height - 8 * px, px, colour);
}

function hatch(ctx: Ctx2D, r: Rect, step: number, colour: string, px: number) {
  ctx.save();
  ctx.beginPath();
  ctx.rect(r.x, r.y, r.width, r.height);
  ctx.clip();
  ctx.strokeStyle = colour;
  ctx.globalAlpha = 0.35;
  ctx.lineWidth = px;
  ctx.beginPath();
  for (let d = -r.height; d < r.width; d += step) {
    ctx.moveTo(r.x + d, r.y + r.height);
    ctx.lineTo(r.x + d + r.height, r.y);
  }
  ctx.stroke();
  ctx.restore();
}

function label(ctx: Ctx2D, text: string, x: number, y: number, px: number, colour: string) {
  ctx.fillStyle = colour;
  ctx.font = `${12 * px}px "Source Sans 3", sans-serif`;
  ctx.textBaseline = 'alphabetic';
  ctx.textAlign = 'left';
  ctx.fillText(text, x, y);
}
