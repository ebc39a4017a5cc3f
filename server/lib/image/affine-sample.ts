import { invert, type Affine, type Rect } from '../../../shared/geometry';
import { endianness } from 'node:os';
import { blendPixel, overPartly, type PixelBlend } from './composite-rgba';
import type { RgbaImage } from './rgba-image';

const LITTLE_ENDIAN = endianness() === 'LE';

export type SourcePixels = { data: Uint8Array | Uint8ClampedArray; width: number; height: number };

/** The whole-pixel box of the template that a transformed source box can touch, cut to `limit`. */
export function transformedBox(matrix: Affine, width: number, height: number, limit: Rect): { left: number; top: number; right: number; bottom: number } | null {
  const [a, b, c, d, e, f] = matrix;
  const xs = [e, a * width + e, c * height + e, a * width + c * height + e];
  const ys = [f, b * width + f, d * height + f, b * width + d * height + f];
  const left = Math.max(Math.floor(Math.min(...xs)), Math.ceil(limit.x - 1e-9));
  const top = Math.max(Math.floor(Math.min(...ys)), Math.ceil(limit.y - 1e-9));
  const right = Math.min(Math.ceil(Math.max(...xs)), Math.floor(limit.x + limit.width + 1e-9));
  const bottom = Math.min(Math.ceil(Math.max(...ys)), Math.floor(limit.y + limit.height + 1e-9));
  return right > left && bottom > top ? { left, top, right, bottom } : null;
}

/**
 * Draws `source` through `matrix` (source px -> template px) into a layer of template pixels,
 * sampling each output pixel's centre bilinearly on premultiplied colour (no dark fringes), with
 * pixels outside the source read as transparent so edges are anti-aliased like a canvas draw.
 * Pixel (i, j) covers [i, i+1) x [j, j+1) on both sides. Only whole pixels inside `clip`
 * are written. The result is straight RGBA, ready for compositeOnto.
 */
export function drawTransformed(source: SourcePixels, matrix: Affine, clip: Rect): RgbaImage | null {
  const box = transformedBox(matrix, source.width, source.height, clip);
  if (!box || !invert(matrix)) return null;
  const width = box.right - box.left;
  const out = new Uint8Array(width * (box.bottom - box.top) * 4);
  sampleRows(source, matrix, box, (y, row, from, to) => out.set(row.subarray(from * 4, to * 4), ((y - box.top) * width + from) * 4));
  return { data: out, width, height: box.bottom - box.top, left: box.left, top: box.top };
}

/**
 * The same samples, one template row at a time into a reused buffer (straight RGBA, zero where
 * the source does not reach), so a caller can composite each row at once without holding the
 * whole transformed layer. Only columns [from, to) of a row are valid (zero where the sample is transparent).
 */
export function sampleRows(source: SourcePixels, matrix: Affine, box: PixelBoxLike, onRow: (y: number, row: Uint8Array, from: number, to: number) => void, onto?: DirectTarget): void {
  const inverse = invert(matrix);
  if (!inverse) return;
  const width = box.right - box.left;
  const out = new Uint8Array(width * 4);
  const out32 = new Uint32Array(out.buffer);
  const [ia, ib, ic, id, ie, iff] = inverse;
  const src = source.data;
  const sw = source.width;
  const sh = source.height;
  const src32 = LITTLE_ENDIAN && src.byteOffset % 4 === 0 ? new Uint32Array(src.buffer, src.byteOffset, sw * sh) : null;
  for (let y = box.top; y < box.bottom; y++) {
    const ty = y + 0.5;
    // Source coordinates of the row's first centre, moved by (ia, ib) per output pixel.
    const u0 = ia * (box.left + 0.5) + ic * ty + ie - 0.5;
    const v0 = ib * (box.left + 0.5) + id * ty + iff - 0.5;
    // Columns whose sample touches the source at all, and those whose four taps all lie inside it.
    const [t0, t1] = span(u0, ia, -1, sw, span(v0, ib, -1, sh, [0, width]));
    const [f0, f1] = span(u0, ia, 0, sw - 1, span(v0, ib, 0, sh - 1, [t0, t1]));
    if (t1 <= t0) continue;
    if (onto && src32 && f1 > f0) {
      // the interior goes straight onto the canvas; only the anti-aliased ends pass through onRow
      interiorRunOnto(src32, sw, onto.canvas.data, onto.words, onto.blend, (y - onto.canvas.top) * onto.canvas.width + box.left - onto.canvas.left, u0, v0, ia, ib, f0, f1);
      for (const [from, to] of [[t0, f0], [f1, t1]]) {
        if (to <= from) continue;
        out.fill(0, from * 4, to * 4);
        for (let x = from; x < to; x++) edgePixel(src, sw, sh, out, x * 4, u0 + ia * x, v0 + ib * x);
        onRow(y, out, from, to);
      }
      continue;
    }
    out.fill(0, t0 * 4, t1 * 4);
    for (let x = t0; x < t1; x++) {
      if (x === f0 && f1 > f0) {
        // the row is zeroed, so this writes each sample as it is (straight RGBA)
        if (src32) interiorRunOnto(src32, sw, out, out32, null, 0, u0, v0, ia, ib, f0, f1);
        else interiorRun(src, sw, out, out32, u0, v0, ia, ib, f0, f1);
        x = f1 - 1;
        continue;
      }
      edgePixel(src, sw, sh, out, x * 4, u0 + ia * x, v0 + ib * x);
    }
    onRow(y, out, t0, t1);
  }
}

type PixelBoxLike = { left: number; top: number; right: number; bottom: number };

/**
 * A canvas that samples are drawn straight onto, skipping the row buffer: `words` is a 32-bit
 * view of its bytes, and the box must lie inside it. `blend` null is normal at full opacity (the
 * commonest draw, with its own shortcuts); otherwise each sample goes through blendPixel.
 */
export type DirectTarget = { canvas: RgbaImage; words: Uint32Array; blend: PixelBlend | null };

/** The x range [from, to) within `within` where lo < c0 + k·x < hi (strictly inside, as the samplers need). */
function span(c0: number, k: number, lo: number, hi: number, within: [number, number]): [number, number] {
  let [a, b] = within;
  if (k === 0) return c0 > lo && c0 < hi ? [a, b] : [a, a];
  const x1 = (lo - c0) / k;
  const x2 = (hi - c0) / k;
  const from = Math.min(x1, x2);
  const to = Math.max(x1, x2);
  // integer x with from < x < to
  a = Math.max(a, Math.floor(from) + 1);
  b = Math.min(b, Math.ceil(to));
  return b > a ? [a, b] : [a, a];
}

/** All four taps inside the source: no bounds checks. */
function interiorRun(src: Uint8Array | Uint8ClampedArray, sw: number, out: Uint8Array, out32: Uint32Array, u0: number, v0: number, ia: number, ib: number, from: number, to: number): void {
  for (let x = from; x < to; x++) {
    const u = u0 + ia * x;
    const v = v0 + ib * x;
    const x0 = u | 0;
    const y0 = v | 0;
    const fx = u - x0;
    const fy = v - y0;
    const i00 = (y0 * sw + x0) * 4;
    const i01 = i00 + 4;
    const i10 = i00 + sw * 4;
    const i11 = i10 + 4;
    const o = x * 4;
    if ((src[i00 + 3] | src[i01 + 3] | src[i10 + 3] | src[i11 + 3]) === 0) continue;
    if ((src[i00 + 3] & src[i01 + 3] & src[i10 + 3] & src[i11 + 3]) === 255) {
      // all four taps opaque: premultiplied and straight colour are the same, no division
      const g00 = (1 - fx) * (1 - fy);
      const g01 = fx * (1 - fy);
      const g10 = (1 - fx) * fy;
      const g11 = fx * fy;
      // one word with the bytes in RGBA order; each sum is in [0.5, 255.5],
      // so | 0 truncates it exactly as a byte store would
      const r = (g00 * src[i00] + g01 * src[i01] + g10 * src[i10] + g11 * src[i11] + 0.5) | 0;
      const g = (g00 * src[i00 + 1] + g01 * src[i01 + 1] + g10 * src[i10 + 1] + g11 * src[i11 + 1] + 0.5) | 0;
      const b = (g00 * src[i00 + 2] + g01 * src[i01 + 2] + g10 * src[i10 + 2] + g11 * src[i11 + 2] + 0.5) | 0;
      out32[x] = LITTLE_ENDIAN ? (r | (g << 8) | (b << 16) | 0xff000000) >>> 0 : ((r << 24) | (g << 16) | (b << 8) | 0xff) >>> 0;
      continue;
    }
    const w00 = (1 - fx) * (1 - fy) * src[i00 + 3];
    const w01 = fx * (1 - fy) * src[i01 + 3];
    const w10 = (1 - fx) * fy * src[i10 + 3];
    const w11 = fx * fy * src[i11 + 3];
    const al = w00 + w01 + w10 + w11;
    if (al <= 0) continue;
    const inv = 1 / al;
    out[o] = (w00 * src[i00] + w01 * src[i01] + w10 * src[i10] + w11 * src[i11]) * inv + 0.5;
    out[o + 1] = (w00 * src[i00 + 1] + w01 * src[i01 + 1] + w10 * src[i10 + 1] + w11 * src[i11 + 1]) * inv + 0.5;
    out[o + 2] = (w00 * src[i00 + 2] + w01 * src[i01 + 2] + w10 * src[i10 + 2] + w11 * src[i11 + 2]) * inv + 0.5;
    out[o + 3] = al + 0.5;
  }
}

/**
 * The four taps read as little-endian words (R in the low byte, alpha in the top one: a quarter
 * of interiorRun's loads, the same arithmetic in the same order), each sample composited as
 * compositeOnto would composite the sampled row, so the bytes are identical. Normal at full
 * opacity (blend null): an opaque sample, or one over a transparent pixel, replaces the word and
 * a partly transparent one goes through overPartly, as in compositeNormalOpaque; any other blend
 * or opacity goes through blendPixel. `dst` is the canvas, or a zeroed row buffer (the samples
 * then land as they are); `base` is the word index of the box's first column in this row.
 */
function interiorRunOnto(src: Uint32Array, sw: number, dst: Uint8Array, dst32: Uint32Array, blend: PixelBlend | null, base: number, u0: number, v0: number, ia: number, ib: number, from: number, to: number): void {
  for (let x = from; x < to; x++) {
    const u = u0 + ia * x;
    const v = v0 + ib * x;
    const x0 = u | 0;
    const y0 = v | 0;
    const fx = u - x0;
    const fy = v - y0;
    const j00 = y0 * sw + x0;
    const p00 = src[j00];
    const p01 = src[j00 + 1];
    const p10 = src[j00 + sw];
    const p11 = src[j00 + sw + 1];
    const a00 = p00 >>> 24;
    const a01 = p01 >>> 24;
    const a10 = p10 >>> 24;
    const a11 = p11 >>> 24;
    if ((a00 | a01 | a10 | a11) === 0) continue;
    const dp = base + x;
    if ((a00 & a01 & a10 & a11) === 255) {
      const g00 = (1 - fx) * (1 - fy);
      const g01 = fx * (1 - fy);
      const g10 = (1 - fx) * fy;
      const g11 = fx * fy;
      const r = (g00 * (p00 & 255) + g01 * (p01 & 255) + g10 * (p10 & 255) + g11 * (p11 & 255) + 0.5) | 0;
      const g = (g00 * ((p00 >>> 8) & 255) + g01 * ((p01 >>> 8) & 255) + g10 * ((p10 >>> 8) & 255) + g11 * ((p11 >>> 8) & 255) + 0.5) | 0;
      const b = (g00 * ((p00 >>> 16) & 255) + g01 * ((p01 >>> 16) & 255) + g10 * ((p10 >>> 16) & 255) + g11 * ((p11 >>> 16) & 255) + 0.5) | 0;
      if (blend === null) dst32[dp] = (r | (g << 8) | (b << 16) | 0xff000000) >>> 0;
      else blendPixel(dst, dp * 4, r, g, b, 255, 255, blend);
      continue;
    }
    const w00 = (1 - fx) * (1 - fy) * a00;
    const w01 = fx * (1 - fy) * a01;
    const w10 = (1 - fx) * fy * a10;
    const w11 = fx * fy * a11;
    const al = w00 + w01 + w10 + w11;
    if (al <= 0) continue;
    // each value lies in [0.5, 255.5], so | 0 gives the byte a Uint8Array store would
    const sa = (al + 0.5) | 0;
    if (sa === 0) continue;
    const inv = 1 / al;
    const r = ((w00 * (p00 & 255) + w01 * (p01 & 255) + w10 * (p10 & 255) + w11 * (p11 & 255)) * inv + 0.5) | 0;
    const g = ((w00 * ((p00 >>> 8) & 255) + w01 * ((p01 >>> 8) & 255) + w10 * ((p10 >>> 8) & 255) + w11 * ((p11 >>> 8) & 255)) * inv + 0.5) | 0;
    const b = ((w00 * ((p00 >>> 16) & 255) + w01 * ((p01 >>> 16) & 255) + w10 * ((p10 >>> 16) & 255) + w11 * ((p11 >>> 16) & 255)) * inv + 0.5) | 0;
    if (blend !== null) {
      blendPixel(dst, dp * 4, r, g, b, sa, 255, blend);
      continue;
    }
    const abByte = dst[dp * 4 + 3];
    if (sa === 255 || abByte === 0) dst32[dp] = (r | (g << 8) | (b << 16) | (sa << 24)) >>> 0;
    else overPartly(dst, dp * 4, r, g, b, sa, abByte);
  }
}

/** A sample near the source's border: taps outside it count as transparent (anti-aliased edge). */
function edgePixel(src: Uint8Array | Uint8ClampedArray, sw: number, sh: number, out: Uint8Array, o: number, u: number, v: number): void {
  const x0 = Math.floor(u);
  const y0 = Math.floor(v);
  const fx = u - x0;
  const fy = v - y0;
  let r = 0, g = 0, bl = 0, al = 0;
  for (let k = 0; k < 4; k++) {
    const sx = x0 + (k & 1);
    const sy = y0 + (k >> 1);
    if (sx < 0 || sy < 0 || sx >= sw || sy >= sh) continue;
    const w = ((k & 1) ? fx : 1 - fx) * ((k >> 1) ? fy : 1 - fy);
    const i = (sy * sw + sx) * 4;
    const wa = w * src[i + 3];
    if (wa === 0) continue;
    r += wa * src[i];
    g += wa * src[i + 1];
    bl += wa * src[i + 2];
    al += wa;
  }
  if (al <= 0) return;
  out[o] = (r / al + 0.5) | 0;
  out[o + 1] = (g / al + 0.5) | 0;
  out[o + 2] = (bl / al + 0.5) | 0;
  out[o + 3] = (al + 0.5) | 0;
}

/** How much the matrix shrinks the source (the smaller axis), so the caller can pre-reduce it with a proper filter. */
export function shrinkFactor(matrix: Affine): number {
  const sx = Math.hypot(matrix[0], matrix[1]);
  const sy = Math.hypot(matrix[2], matrix[3]);
  return Math.min(sx, sy);
}
