import { applyMask, compositeOnto } from '../../../lib/image/composite-rgba';
import { createRgbaImage, unionBox, type PixelBox, type RgbaImage } from '../../../lib/image/rgba-image';
import { clipStacks, type PlannedMotif } from './cut-plan';
import { decodeLayerMask, decodeLayerPixels } from './decode-layer';
import { isAdjustmentLayer, layerDrawOpacity } from './layer-features';
import { sourcePathOf } from './layer-names';
import type { LayerNode } from './layer-tree';
import { formatMegapixels } from './psd-header';
import { UnpackError } from './unpack-error';
import type { UnpackReport } from './unpack-result';

export type RenderContext = {
  file: Buffer;
  large: boolean;
  colourModeCode: number;
  document: PixelBox;
  maxCanvasPixels: number;
  report: UnpackReport;
};

// The motif's pixels before trimming: a layer's own pixels (its pixel mask applied), or a group
// or clip stack flattened on transparency. The motif's own opacity and blend mode stay out.
export function renderPlannedMotif(plan: PlannedMotif, ctx: RenderContext): RgbaImage | null {
  const { node, clipped } = plan;
  const image = node.children ? flattenGroup(node, plan.path, ctx) : layerPixels(node, ctx);
  if (image && clipped.length > 0) drawClipped(image, clipped, plan.path.slice(0, -1), ctx);
  return image;
}

function layerPixels(node: LayerNode, ctx: RenderContext): RgbaImage | null {
  const image = decodeLayerPixels(ctx.file, node.record, ctx.large, ctx.colourModeCode);
  if (!image) return null;
  const mask = decodeLayerMask(ctx.file, node.record, ctx.large);
  if (mask) applyMask(image, mask);
  return image;
}

function flattenGroup(group: LayerNode, path: string[], ctx: RenderContext): RgbaImage | null {
  const box = contentBox(group.children ?? []);
  if (!box) return null;
  const canvas = createRgbaImage(fitCanvas(box, path, ctx));
  drawChildren(canvas, group.children ?? [], path, ctx);
  const mask = decodeLayerMask(ctx.file, group.record, ctx.large);
  if (mask) applyMask(canvas, mask);
  return canvas;
}

function drawChildren(canvas: RgbaImage, children: readonly LayerNode[], path: string[], ctx: RenderContext): void {
  for (const { node, clipped } of clipStacks(children)) {
    const nodePath = [...path, node.name];
    if (node.layer.hidden) {
      ctx.report.notes.push(`Hidden "${sourcePathOf(nodePath)}" is not drawn into "${sourcePathOf(path)}"`);
      continue;
    }
    if (isAdjustmentLayer(node.layer)) {
      ctx.report.unsupported.push({ sourcePath: sourcePathOf(nodePath), feature: 'adjustment layer not applied to the layers below' });
      continue;
    }
    if (isPassThrough(node) && clipped.length === 0) {
      // a pass-through group at full opacity draws its layers straight onto the canvas below
      drawChildren(canvas, node.children ?? [], nodePath, ctx);
      continue;
    }
    const image = node.children ? flattenGroup(node, nodePath, ctx) : layerPixels(node, ctx);
    if (!image) continue;
    if (clipped.length > 0) drawClipped(image, clipped, path, ctx);
    compositeOnto(canvas, image, { blendMode: drawnBlendMode(node), opacity: layerDrawOpacity(node.layer) });
  }
}

// Clipped layers show only where the base has pixels, and take on its opacity and mode, so
// they are drawn onto the base's own pixels (source-atop) before the base is drawn.
function drawClipped(base: RgbaImage, clipped: readonly LayerNode[], path: string[], ctx: RenderContext): void {
  for (const node of clipped) {
    const nodePath = [...path, node.name];
    if (node.layer.hidden) {
      ctx.report.notes.push(`Hidden clipped "${sourcePathOf(nodePath)}" is not drawn`);
      continue;
    }
    if (isAdjustmentLayer(node.layer)) {
      ctx.report.unsupported.push({ sourcePath: sourcePathOf(nodePath), feature: 'clipped adjustment layer not applied' });
      continue;
    }
    const image = node.children ? flattenGroup(node, nodePath, ctx) : layerPixels(node, ctx);
    if (!image) continue;
    compositeOnto(base, image, { blendMode: drawnBlendMode(node), opacity: layerDrawOpacity(node.layer), clipToBackdrop: true });
  }
}

function isPassThrough(node: LayerNode): boolean {
  return node.children !== undefined && (node.layer.blendMode ?? 'pass through') === 'pass through'
    && layerDrawOpacity(node.layer) >= 1 && !(node.record.mask && !node.record.mask.disabled);
}

function drawnBlendMode(node: LayerNode): string {
  const mode = node.layer.blendMode ?? 'normal';
  return mode === 'pass through' ? 'normal' : mode;
}

function contentBox(children: readonly LayerNode[]): PixelBox | null {
  let box: PixelBox | null = null;
  for (const node of children) {
    if (node.layer.hidden || isAdjustmentLayer(node.layer) || node.layer.clipping) continue;
    const part = node.children ? contentBox(node.children) : recordBox(node);
    if (part) box = unionBox(box, part);
  }
  return box;
}

function recordBox(node: LayerNode): PixelBox | null {
  const { left, top, right, bottom } = node.record;
  return right > left && bottom > top ? { left, top, right, bottom } : null;
}

// Layers far apart can make a group's box far bigger than any layer: keep it to the document,
// and within the per-layer budget.
function fitCanvas(box: PixelBox, path: string[], ctx: RenderContext): PixelBox {
  let fitted = box;
  if (area(fitted) > ctx.maxCanvasPixels) {
    const d = ctx.document;
    fitted = { left: Math.max(box.left, d.left), top: Math.max(box.top, d.top), right: Math.min(box.right, d.right), bottom: Math.min(box.bottom, d.bottom) };
    if (fitted.right <= fitted.left || fitted.bottom <= fitted.top) fitted = { left: 0, top: 0, right: 0, bottom: 0 };
  }
  if (area(fitted) > ctx.maxCanvasPixels) {
    throw new UnpackError('psd.layer_too_large',
      `The group "${sourcePathOf(path)}" covers more than the ${formatMegapixels(ctx.maxCanvasPixels)} one motif may have`);
  }
  return fitted;
}

function area(box: PixelBox): number {
  return Math.max(0, box.right - box.left) * Math.max(0, box.bottom - box.top);
}
