import sharp from 'sharp';
import { applyRecolour, type Recolour } from '../../../shared/colour';
import { compose, scale, type Rect } from '../../../shared/geometry';
import type { MotifDrawOp, RenderPlan, TextDrawOp } from '../../../shared/scene';
import { drawTransformed, shrinkFactor, type SourcePixels } from './affine-sample';
import { compositeOnto } from './composite-rgba';
import type { RgbaImage } from './rgba-image';

/** The full-resolution PNG of one motif version, decoded to straight RGBA. */
export type LoadMotifPixels = (motifId: string, version: number) => Promise<SourcePixels>;
export type DrawTextLayer = (op: TextDrawOp, clip: Rect) => Promise<RgbaImage | null>;

export type PrintRenderOptions = {
  loadMotif: LoadMotifPixels;
  /** Text drawn as outlines; without it text placements are left out and reported. */
  drawText?: DrawTextLayer;
  /** 0..1 after each op, for a job's progress. */
  onProgress?: (done: number) => void | Promise<void>;
};

export type PrintRenderNote = { placementId: string; code: 'render.text_skipped' | 'render.empty'; message: string };

export type PrintRender = { image: RgbaImage; notes: PrintRenderNote[] };

// Below this the bilinear sampler would skip source pixels (aliasing); the motif is first
// reduced with a Lanczos filter, as a downscaled bitmap drawn through compose(scale(k), matrix).
const PRE_REDUCE_BELOW = 0.75;

/**
 * Executes the shared render plan at the template's exact pixel size: the same matrices, opacity,
 * blend modes (W3C Compositing Level 1 formulas, via compositeOnto), recolour and clips that the
 * editor's canvas draws, from full-resolution motif pixels, onto a transparent canvas.
 */
export async function renderPrintFile(plan: RenderPlan, options: PrintRenderOptions): Promise<PrintRender> {
  const { width, height } = plan.size;
  const canvas: RgbaImage = { data: new Uint8Array(width * height * 4), width, height, left: 0, top: 0 };
  const whole: Rect = { x: 0, y: 0, width, height };
  const notes: PrintRenderNote[] = [];
  const sources = new Map<string, Promise<SourcePixels>>();
  const motifPixels = (op: MotifDrawOp) => {
    const key = `${op.motifId}@${op.version}:${JSON.stringify(op.recolour)}`;
    let p = sources.get(key);
    if (!p) {
      p = options.loadMotif(op.motifId, op.version).then((px) => recoloured(px, op.recolour));
      sources.set(key, p);
    }
    return p;
  };

  for (let i = 0; i < plan.ops.length; i++) {
    const op = plan.ops[i];
    const clip = op.clip ? intersect(op.clip, whole) : whole;
    let layer: RgbaImage | null = null;
    if (op.kind === 'motif') layer = await motifLayer(await motifPixels(op), op, clip);
    else if (options.drawText) layer = await options.drawText(op, clip);
    else notes.push({ placementId: op.placementId, code: 'render.text_skipped', message: 'Text is not drawn into print files yet; convert it to a motif' });
    if (layer) compositeOnto(canvas, layer, { blendMode: op.blendMode, opacity: op.opacity });
    await options.onProgress?.((i + 1) / plan.ops.length);
  }
  return { image: canvas, notes };
}

export async function motifLayer(source: SourcePixels, op: Pick<MotifDrawOp, 'matrix' | 'width' | 'height'>, clip: Rect): Promise<RgbaImage | null> {
  // The plan's matrix starts from the motif's natural size, whatever size the PNG really is.
  let matrix = compose(scale(op.width / source.width, op.height / source.height), op.matrix);
  let pixels = source;
  const k = shrinkFactor(matrix);
  if (k < PRE_REDUCE_BELOW) {
    const w = Math.max(1, Math.round(source.width * k));
    const h = Math.max(1, Math.round(source.height * k));
    const { data } = await sharp(Buffer.from(source.data.buffer, source.data.byteOffset, source.data.byteLength), { raw: { width: source.width, height: source.height, channels: 4 } })
      .resize(w, h, { fit: 'fill', kernel: 'lanczos3' })
      .raw()
      .toBuffer({ resolveWithObject: true });
    matrix = compose(scale(source.width / w, source.height / h), matrix);
    pixels = { data, width: w, height: h };
  }
  return drawTransformed(pixels, matrix, clip);
}

function recoloured(px: SourcePixels, recolour: Recolour): SourcePixels {
  if (recolour.kind === 'none') return px;
  const data = applyRecolour(px.data, recolour);
  return { data: new Uint8Array(data.buffer, data.byteOffset, data.byteLength), width: px.width, height: px.height };
}

function intersect(a: Rect, b: Rect): Rect {
  const x = Math.max(a.x, b.x);
  const y = Math.max(a.y, b.y);
  return { x, y, width: Math.max(0, Math.min(a.x + a.width, b.x + b.width) - x), height: Math.max(0, Math.min(a.y + a.height, b.y + b.height) - y) };
}

/** Decodes a stored motif PNG to straight 8-bit RGBA. */
export async function decodeMotifPng(png: Buffer): Promise<SourcePixels> {
  const { data, info } = await sharp(png).ensureAlpha().toColourspace('srgb').raw().toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height };
}
