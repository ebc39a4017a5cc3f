import { hexToRgb } from '@shared/colour';
import { scale } from '@shared/geometry';
import { renderPlan, type Scene } from '@shared/scene';
import type { BlankColours, Template, TemplateGeometry } from '@shared/templates';
import { handleInView, MUG_LOOK, wrapCylinder, wrapToCylinder, type WrapView } from '@shared/wrap';
import { drawArtwork, type Ctx2D } from './draw-scene';
import type { MotifImageCache } from './image-cache';

// The editor's live look at a wrap on its mug: the same column map and shading as the server's
// previews (shared/wrap), handle and opening as MUG_LOOK draws them there, from the editor's own
// display bitmaps.

/** The print area's artwork at `pxPerTemplatePx`, on a transparent canvas, as the print file holds it. */
export function drawStrip(scene: Scene, template: Template, geometry: TemplateGeometry, images: MotifImageCache, pxPerTemplatePx: number): HTMLCanvasElement | null {
  const strip = document.createElement('canvas');
  strip.width = Math.max(1, Math.round(geometry.size.width * pxPerTemplatePx));
  strip.height = Math.max(1, Math.round(geometry.size.height * pxPerTemplatePx));
  const ctx = strip.getContext('2d');
  if (!ctx) return null;
  drawArtwork(ctx, renderPlan(scene, template).ops, images, scale(pxPerTemplatePx), geometry);
  return strip;
}

const rgb = (c: { r: number; g: number; b: number }, k = 1) => `rgb(${Math.round(c.r * k)}, ${Math.round(c.g * k)}, ${Math.round(c.b * k)})`;

/**
 * One side of the mug onto `ctx` (device px, `width` x `height`), from a strip drawn by drawStrip
 * at `stripScale` px per template px. Returns false for a template that is not a wrap.
 */
export function drawMugSide(ctx: Ctx2D, width: number, height: number, strip: CanvasImageSource | null, stripScale: number, geometry: TemplateGeometry, view: WrapView, blank: BlankColours, printHidden = false): boolean {
  const cyl = wrapCylinder(geometry);
  if (!cyl || !geometry.wrap) return false;
  const wrapHeight = geometry.wrap.heightPx;
  // the body's width on screen, leaving room for the handle beside it
  const fit = Math.min(width / (2 * cyl.radiusPx * (1 + MUG_LOOK.handleReach + 0.05)), (height * 0.92) / wrapHeight);
  const bodyWidth = Math.max(1, Math.round(2 * cyl.radiusPx * fit));
  const map = wrapToCylinder(cyl, view, { outputWidth: bodyWidth });
  const s = map.scale;
  const bodyHeight = wrapHeight * s;
  const opening = (bodyWidth / 2) * MUG_LOOK.openingTilt;
  const left = Math.round((width - bodyWidth) / 2);
  const top = Math.round((height - bodyHeight) / 2);
  const colours = {
    body: hexToRgb(blank.body), rim: hexToRgb(blank.rim ?? blank.body), handle: hexToRgb(blank.handle ?? blank.body), inside: hexToRgb(blank.inside ?? blank.body),
  };
  const handle = handleInView(cyl, view);
  ctx.setTransform(1, 0, 0, 1, 0, 0);
  ctx.globalAlpha = 1;
  ctx.globalCompositeOperation = 'source-over';
  ctx.clearRect(0, 0, width, height);
  // a handle behind the mug is hidden by the body

  // the body column by column: blank, the strip's column, then the shade over both
  const stripTop = top + ((wrapHeight - geometry.trim.height) / 2 - geometry.trim.y) * s;
  const drawnHeight = geometry.size.height * s;
  ctx.imageSmoothingEnabled = true;
  for (let i = 0; i < map.width; i++) {
    const x = left + i;
    ctx.fillStyle = rgb(colours.body);
    ctx.fillRect(x, top, 1, bodyHeight);
    const sx = map.sourceX[i];
    if (strip && !printHidden && sx >= 0) {
      ctx.save();
      ctx.beginPath();
      ctx.rect(x, top, 1, bodyHeight);
      ctx.clip();
      ctx.drawImage(strip, Math.min(sx * stripScale, geometry.size.width * stripScale - 1), 0, 1, geometry.size.height * stripScale, x, stripTop, 1, drawnHeight);
      ctx.restore();
    }
    ctx.fillStyle = `rgba(0, 0, 0, ${(1 - map.shade[i]).toFixed(3)})`;
    ctx.fillRect(x, top, 1, bodyHeight);
  }
  // the opening's far half in the body's top rows (as on the server): nothing beside it, the
  // inside colour darker towards the back, edged in the rim's colour
  ctx.clearRect(left, top, bodyWidth, opening);
  const inside = ctx.createLinearGradient(0, top, 0, top + opening);
  inside.addColorStop(0, rgb(colours.inside, MUG_LOOK.insideLight.back));
  inside.addColorStop(1, rgb(colours.inside, MUG_LOOK.insideLight.front));
  ctx.beginPath();
  ctx.ellipse(left + bodyWidth / 2, top + opening, bodyWidth / 2, opening, 0, Math.PI, 2 * Math.PI);
  ctx.closePath();
  ctx.fillStyle = inside;
  ctx.fill();
  ctx.strokeStyle = rgb(colours.rim, MUG_LOOK.rimLight);
  ctx.lineWidth = Math.max(1, opening * 0.18);
  ctx.stroke();
  if (handle.side !== 'behind') drawHandle(ctx, left, top, bodyWidth, bodyHeight, cyl.radiusPx * s, handle.side, colours.handle);
  return true;
}

function drawHandle(ctx: Ctx2D, left: number, top: number, bodyWidth: number, bodyHeight: number, radius: number, side: 'left' | 'right' | 'in-front', colour: { r: number; g: number; b: number }): void {
  const cy = top + bodyHeight / 2;
  const ay = bodyHeight * MUG_LOOK.handleHalfHeight;
  const t = radius * MUG_LOOK.handleThickness;
  ctx.fillStyle = rgb(colour, MUG_LOOK.handleLight);
  ctx.strokeStyle = rgb(colour, MUG_LOOK.handleLight);
  if (side === 'in-front') {
    ctx.fillRect(left + bodyWidth / 2 - t, cy - ay, 2 * t, 2 * ay);
    return;
  }
  const ax = radius * MUG_LOOK.handleReach;
  const cx = side === 'right' ? left + bodyWidth : left;
  ctx.beginPath();
  ctx.lineWidth = t;
  ctx.ellipse(cx, cy, ax - t / 2, ay - t / 2, 0, side === 'right' ? -Math.PI / 2 : Math.PI / 2, side === 'right' ? Math.PI / 2 : (3 * Math.PI) / 2);
  ctx.stroke();
}
