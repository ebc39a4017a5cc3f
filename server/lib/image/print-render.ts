import sharp from 'sharp';
import { applyRecolour, type Recolour } from '../../../shared/colour';
import type { Rect } from '../../../shared/geometry';
import type { MotifDrawOp, RenderPlan, TextDrawOp } from '../../../shared/scene';
import type { OutputSpec } from '../../../shared/templates';
import type { SourcePixels } from './affine-sample';
import { intersect, type PreparedMotif } from './draw-bands';
import { printCanvas, startDrawing } from './draw-threads';
import { prepareMotif } from './motif-layer';
import { encodePrintFile, streamsWhileDrawing, type EncodedPrintFile } from './print-file-encode';
import { createPngStream } from './png-stream';
import type { RgbaImage } from './rgba-image';

export { motifLayer } from './motif-layer';
export { releasePrintCanvas } from './draw-threads';

/** The full-resolution PNG of one motif version, decoded to straight RGBA. */
export type LoadMotifPixels = (motifId: string, version: number) => Promise<SourcePixels>;
export type DrawTextLayer = (op: TextDrawOp, clip: Rect) => Promise<RgbaImage | null>;

export type PrintRenderOptions = {
  loadMotif: LoadMotifPixels;
  /** Text drawn as outlines; without it text placements are left out and reported. */
  drawText?: DrawTextLayer;
  /** 0..1 as sources are ready and bands drawn, for a job's progress. */
  onProgress?: (done: number) => void | Promise<void>;
  /**
   * Also encode the print file for this output. A PNG that keeps transparency is compressed band
   * by band while the last layers are still being drawn (png-stream.ts); other outputs are
   * encoded by sharp once the canvas is done.
   */
  encode?: OutputSpec;
};

export type PrintRenderNote = { placementId: string; code: 'render.text_skipped' | 'render.empty'; message: string };

export type PrintRender = { image: RgbaImage; notes: PrintRenderNote[]; encoded?: EncodedPrintFile };

// The share of onProgress reached once every op's pixels are ready (and the early ones drawn);
// the last layers' bands and the file's last compressed bands have the rest.
const DRAWN_SHARE = 0.95;

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
  const canvas = printCanvas(width, height);
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
  // ops whose pixels are ready (or failed): while the next one is not, the ready ones are drawn
  const settled = new Set<number>();
  const prepared = new Map<number, Promise<PreparedMotif>>();
  const preparedMotif = (i: number, op: MotifDrawOp) => {
    let p = prepared.get(i);
    if (!p) {
      p = quiet(motifSource(op).then((px) => prepareMotif(px, op)).finally(() => settled.add(i)));
      prepared.set(i, p);
    }
    return p;
  };
  // Text is rasterised by librsvg on sharp's threads: all of it starts at once.
  const texts = new Map<number, Promise<RgbaImage | null>>();
  plan.ops.forEach((op, i) => {
    if (op.kind === 'text' && options.drawText) texts.set(i, quiet(options.drawText(op, clipOf(op.clip, whole))).finally(() => settled.add(i)));
  });

  // Ops are drawn in plan order as their pixels are ready (fetches and sharp's work run a few
  // ops ahead): the ready ones are drawn layer by layer while the next one is awaited, the rest
  // band by band at the end, each band going to the PNG encoder once final. The draw threads
  // (draw-threads.ts), on a machine with cores to spare, share the bands.
  const drawing = startDrawing(canvas);
  const output = options.encode;
  const png = output && streamsWhileDrawing(output) ? createPngStream({ width, height, dpi: output.dpi }) : null;
  try {
    await drawOps();
    await drawing.finish(png ? (top, bottom) => png.writeRows(canvas.data.subarray(top * width * 4, bottom * width * 4)) : undefined);
  } catch (error) {
    // a source that failed to load, or a band that failed to draw: the draw threads drop this
    // render and its shared copies are freed
    drawing.cancel();
    png?.abort();
    throw error;
  }
  const encoded = png ? { buffer: await png.finish(), contentType: 'image/png' as const, extension: 'png' as const } : output ? await encodePrintFile(canvas, output) : undefined;
  await options.onProgress?.(1);
  return { image: canvas, notes, ...(encoded ? { encoded } : {}) };

  async function drawOps(): Promise<void> {
    for (let i = 0; i < plan.ops.length; i++) {
      for (let k = i; k < Math.min(plan.ops.length, i + LOAD_AHEAD + 1); k++) {
        const ahead = plan.ops[k];
        if (ahead.kind === 'motif') void preparedMotif(k, ahead);
      }
      const op = plan.ops[i];
      const composite = { blendMode: op.blendMode, opacity: op.opacity };
      if (op.kind === 'motif') {
        if (!settled.has(i)) drawing.drawQueued();
        drawing.add({ kind: 'motif', motif: await preparedMotif(i, op), clip: clipOf(op.clip, whole), composite });
        prepared.delete(i);
      } else if (options.drawText) {
        if (!settled.has(i)) drawing.drawQueued();
        const image = await texts.get(i)!;
        if (image) drawing.add({ kind: 'image', image, composite });
      } else {
        notes.push({ placementId: op.placementId, code: 'render.text_skipped', message: 'Text is not drawn into print files yet; convert it to a motif' });
      }
      await options.onProgress?.(((i + 1) / plan.ops.length) * DRAWN_SHARE);
    }
  }
}

const clipOf = (clip: Rect | null, whole: Rect) => (clip ? intersect(clip, whole) : whole);

function recoloured(px: SourcePixels, recolour: Recolour): SourcePixels {
  if (recolour.kind === 'none') return px;
  const data = applyRecolour(px.data, recolour);
  return { data: new Uint8Array(data.buffer, data.byteOffset, data.byteLength), width: px.width, height: px.height };
}

/** Decodes a stored motif PNG to straight 8-bit RGBA. */
export async function decodeMotifPng(png: Buffer): Promise<SourcePixels> {
  const { data, info } = await sharp(png).ensureAlpha().toColourspace('srgb').raw().toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height };
}
