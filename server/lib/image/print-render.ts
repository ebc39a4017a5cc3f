import sharp from 'sharp';
import { applyRecolour, type Recolour } from '../../../shared/colour';
import type { Rect } from '../../../shared/geometry';
import type { MotifDrawOp, RenderPlan, TextDrawOp } from '../../../shared/scene';
import type { SourcePixels } from './affine-sample';
import { compositeOnto } from './composite-rgba';
import { drawPreparedMotif, prepareMotif, type PreparedMotif } from './motif-layer';
import type { RgbaImage } from './rgba-image';

export { motifLayer } from './motif-layer';

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

// Sources fetched, decoded and pre-reduced ahead of the op being drawn, so storage, decoding and
// sharp's resizing (on libvips' threads) overlap the JS drawing of the op before.
const LOAD_AHEAD = 3;

const quiet = <T>(p: Promise<T>) => {
  // handled here so a load failing while an earlier op is drawn is not "unhandled"; awaited later
  p.catch(() => undefined);
  return p;
};

/**
 * Executes the shared render plan at the template's exact pixel size: the same matrices, opacity,
 * blend modes (W3C Compositing Level 1 formulas, via compositeOnto), recolour and clips that the
 * editor's canvas draws, from full-resolution motif pixels, onto a transparent canvas. Each
 * placement touches only the template pixels of its own box.
 */
export async function renderPrintFile(plan: RenderPlan, options: PrintRenderOptions): Promise<PrintRender> {
  const { width, height } = plan.size;
  const canvas: RgbaImage = { data: new Uint8Array(width * height * 4), width, height, left: 0, top: 0 };
  const whole: Rect = { x: 0, y: 0, width, height };
  const notes: PrintRenderNote[] = [];
  const sources = new Map<string, Promise<SourcePixels>>();
  const motifSource = (op: MotifDrawOp) => {
    const key = `${op.motifId}@${op.version}:${JSON.stringify(op.recolour)}`;
    let p = sources.get(key);
    if (!p) {
      p = quiet(options.loadMotif(op.motifId, op.version).then((px) => recoloured(px, op.recolour)));
      sources.set(key, p);
    }
    return p;
  };
  const prepared = new Map<number, Promise<PreparedMotif>>();
  const preparedMotif = (i: number, op: MotifDrawOp) => {
    let p = prepared.get(i);
    if (!p) {
      p = quiet(motifSource(op).then((px) => prepareMotif(px, op)));
      prepared.set(i, p);
    }
    return p;
  };
  // Text is rasterised by librsvg on sharp's threads: all of it starts at once.
  const texts = new Map<number, Promise<RgbaImage | null>>();
  plan.ops.forEach((op, i) => {
    if (op.kind === 'text' && options.drawText) texts.set(i, quiet(options.drawText(op, clipOf(op.clip, whole))));
  });

  for (let i = 0; i < plan.ops.length; i++) {
    for (let k = i; k < Math.min(plan.ops.length, i + LOAD_AHEAD + 1); k++) {
      const ahead = plan.ops[k];
      if (ahead.kind === 'motif') void preparedMotif(k, ahead);
    }
    const op = plan.ops[i];
    const composite = { blendMode: op.blendMode, opacity: op.opacity };
    if (op.kind === 'motif') {
      drawPreparedMotif(canvas, await preparedMotif(i, op), clipOf(op.clip, whole), composite);
      prepared.delete(i);
    } else if (options.drawText) {
      const layer = await texts.get(i)!;
      if (layer) compositeOnto(canvas, layer, composite);
    } else {
      notes.push({ placementId: op.placementId, code: 'render.text_skipped', message: 'Text is not drawn into print files yet; convert it to a motif' });
    }
    await options.onProgress?.((i + 1) / plan.ops.length);
  }
  return { image: canvas, notes };
}

const clipOf = (clip: Rect | null, whole: Rect) => (clip ? intersect(clip, whole) : whole);

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
