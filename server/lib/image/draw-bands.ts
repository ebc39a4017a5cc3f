import type { Affine, Rect } from '../../../shared/geometry';
import { sampleRows, transformedBox, type DirectTarget, type SourcePixels } from './affine-sample';
import { nonSeparableBlends, separableBlends } from './blend-modes';
import { compositeOnto, pixelBlend, type CompositeOptions } from './composite-rgba';
import type { RgbaImage } from './rgba-image';

/** A motif ready to sample: its pixels (the source, or its Lanczos reduction) and their matrix. */
export type PreparedMotif = { pixels: SourcePixels; matrix: Affine };

/** One op of a print render with its pixels ready: a motif to sample, or an already drawn image (text). */
export type DrawLayer =
  | { kind: 'motif'; motif: PreparedMotif; clip: Rect; composite: CompositeOptions }
  | { kind: 'image'; image: RgbaImage; composite: CompositeOptions };

// Rows drawn at a time: few enough that a band of canvas stays in cache while every op is drawn
// into it, enough that the per-band costs (boxes, a sampler set-up per op) stay small.
export const BAND_ROWS = 64;

export const bandCount = (height: number) => Math.ceil(height / BAND_ROWS);

/**
 * Draws bands `part`, `part + parts`, `part + 2·parts`, … of the canvas, every layer in plan order
 * within each band. Each pixel sees the layers in order whichever band or thread draws it, so the
 * pixels are those of drawing layer by layer; bands never share a row, so threads drawing
 * different parts never touch the same byte.
 */
export function drawBands(canvas: RgbaImage, layers: DrawLayer[], part = 0, parts = 1): void {
  for (let band = part; band < bandCount(canvas.height); band += parts) drawOneBand(canvas, layers, band);
}

/** Draws every layer, in plan order, into each of the given bands. */
export function drawBandList(canvas: RgbaImage, layers: DrawLayer[], bands: readonly number[]): void {
  for (const band of bands) drawOneBand(canvas, layers, band);
}

/** The rows [top, bottom) of a band of the canvas. */
export function bandRows(height: number, band: number): { top: number; bottom: number } {
  const top = band * BAND_ROWS;
  return { top, bottom: Math.min(height, top + BAND_ROWS) };
}

/** Draws every layer, in plan order, into one band of the canvas. */
export function drawOneBand(canvas: RgbaImage, layers: DrawLayer[], band: number): void {
  const { top, bottom } = bandRows(canvas.height, band);
  for (const layer of layers) drawBand(canvas, layer, top, bottom);
}

function drawBand(canvas: RgbaImage, layer: DrawLayer, top: number, bottom: number): void {
  if (layer.kind === 'motif') {
    const clip = intersect(layer.clip, { x: 0, y: top, width: canvas.width, height: bottom - top });
    if (clip.width > 0 && clip.height > 0) drawPreparedMotif(canvas, layer.motif, clip, layer.composite);
    return;
  }
  const { image } = layer;
  const from = Math.max(0, top - image.top);
  const to = Math.min(image.height, bottom - image.top);
  if (to <= from) return;
  const rows = { ...image, data: image.data.subarray(from * image.width * 4, to * image.width * 4), height: to - from, top: image.top + from };
  compositeOnto(canvas, rows, layer.composite);
}

/**
 * Draws one prepared motif straight onto the canvas: each template row of its box is sampled
 * (bilinear on premultiplied colour, affine-sample.ts) and composited at once, so no layer of the
 * motif's size is ever held.
 */
export function drawPreparedMotif(canvas: RgbaImage, { pixels, matrix }: PreparedMotif, clip: Rect, composite: CompositeOptions): void {
  const box = transformedBox(matrix, pixels.width, pixels.height, clip);
  if (!box) return;
  const row: RgbaImage = { data: new Uint8Array(0), width: 0, height: 1, left: 0, top: 0 };
  sampleRows(pixels, matrix, box, (y, data, from, to) => {
    row.data = data.subarray(from * 4, to * 4);
    row.width = to - from;
    row.left = box.left + from;
    row.top = y;
    compositeOnto(canvas, row, composite);
  }, directTarget(canvas, box, composite));
}

/**
 * Samples go straight onto the canvas (the same bytes as compositing each sampled row, without
 * the pass through a row buffer) for every separable blend without a mask or clipping, inside
 * the canvas; everything else composites each row.
 */
function directTarget(canvas: RgbaImage, box: { left: number; top: number; right: number; bottom: number }, composite: CompositeOptions): DirectTarget | undefined {
  if (composite.mask || composite.clipToBackdrop === true || composite.opacity <= 0 || nonSeparableBlends[composite.blendMode]) return undefined;
  const { data } = canvas;
  if (data.byteOffset % 4 !== 0 || data.length % 4 !== 0) return undefined;
  if (box.left < canvas.left || box.top < canvas.top || box.right > canvas.left + canvas.width || box.bottom > canvas.top + canvas.height) return undefined;
  const normalOpaque = composite.opacity >= 1 && (composite.blendMode === 'normal' || !separableBlends[composite.blendMode]);
  return { canvas, words: new Uint32Array(data.buffer, data.byteOffset, data.length / 4), blend: normalOpaque ? null : pixelBlend(composite.blendMode, composite.opacity) };
}

export function intersect(a: Rect, b: Rect): Rect {
  const x = Math.max(a.x, b.x);
  const y = Math.max(a.y, b.y);
  return { x, y, width: Math.max(0, Math.min(a.x + a.width, b.x + b.width) - x), height: Math.max(0, Math.min(a.y + a.height, b.y + b.height) - y) };
}
