import { nonSeparableBlends, separableBlends, type NonSeparableBlend, type Rgb } from './blend-modes';
import type { GrayImage, RgbaImage } from './rgba-image';

export type MaskImage = GrayImage & { defaultColor: number };

export type CompositeOptions = {
  blendMode: string;
  // 0..1, layer opacity times fill opacity
  opacity: number;
  mask?: MaskImage | null;
  // clipping mask: the result keeps the backdrop's alpha (source-atop)
  clipToBackdrop?: boolean;
};

// Separable blends only ever see 8-bit inputs, so B(Cb, Cs) * 255 is tabulated once per mode
// for all 256 x 256 pairs: the same values as computing it per pixel, several times faster.
const blendTables = new Map<string, Float64Array>();

function blendTable(mode: string): Float64Array | null {
  const blend = separableBlends[mode];
  if (!blend || mode === 'normal') return null;
  let table = blendTables.get(mode);
  if (!table) {
    table = new Float64Array(65536);
    for (let b = 0; b < 256; b++) for (let s = 0; s < 256; s++) table[(b << 8) | s] = blend(b / 255, s / 255) * 255;
    blendTables.set(mode, table);
  }
  return table;
}

// The same values rounded to bytes, for an opaque source over an opaque backdrop, where the
// general formula below reduces to Co = B(Cb, Cs).
const roundedTables = new Map<string, Uint8Array>();

function roundedTable(mode: string, table: Float64Array): Uint8Array {
  let rounded = roundedTables.get(mode);
  if (!rounded) {
    rounded = new Uint8Array(65536);
    for (let i = 0; i < 65536; i++) rounded[i] = table[i] <= 0 ? 0 : table[i] >= 255 ? 255 : (table[i] + 0.5) | 0;
    roundedTables.set(mode, rounded);
  }
  return rounded;
}

// Source-over (or source-atop) with blending, on straight 8-bit RGBA, following W3C
// "Compositing and Blending Level 1", section 9.1 (general formula): Cs' = (1 - ab) Cs +
// ab B(Cb, Cs); ao = as + ab (1 - as); Co = (as Cs' + (1 - as) ab Cb) / ao. For source-atop
// ao = ab and Co = as Cs' + (1 - as) Cb. Rounded to 8 bits after each layer, like an 8-bit
// document. Unknown modes are drawn as normal (the caller reports them).
export function compositeOnto(canvas: RgbaImage, source: RgbaImage, options: CompositeOptions): void {
  const x0 = Math.max(canvas.left, source.left);
  const y0 = Math.max(canvas.top, source.top);
  const x1 = Math.min(canvas.left + canvas.width, source.left + source.width);
  const y1 = Math.min(canvas.top + canvas.height, source.top + source.height);
  if (x1 <= x0 || y1 <= y0 || options.opacity <= 0) return;
  const nonSeparable = nonSeparableBlends[options.blendMode] as NonSeparableBlend | undefined;
  if (nonSeparable) return compositeNonSeparable(canvas, source, options, nonSeparable, x0, y0, x1, y1);

  const table = blendTable(options.blendMode);
  if (table === null && options.opacity >= 1 && !options.mask && options.clipToBackdrop !== true) {
    const words = wordViews(canvas, source);
    if (words) return compositeNormalOpaque(canvas, source, words, x0, y0, x1, y1);
  }
  const blend = pixelBlend(options.blendMode, options.opacity, options.clipToBackdrop === true);
  const mask = options.mask ?? null;
  const dst = canvas.data;
  const src = source.data;
  for (let y = y0; y < y1; y++) {
    let si = ((y - source.top) * source.width + (x0 - source.left)) * 4;
    let di = ((y - canvas.top) * canvas.width + (x0 - canvas.left)) * 4;
    const rowInMask = mask !== null && y >= mask.top && y < mask.top + mask.height;
    const maskBase = rowInMask ? (y - mask.top) * mask.width - mask.left : 0;
    const maskX0 = mask ? mask.left : 0;
    const maskX1 = mask ? mask.left + mask.width : 0;
    for (let x = x0; x < x1; x++, si += 4, di += 4) {
      const sa = src[si + 3];
      if (sa === 0) continue;
      let m = 255;
      if (mask) m = rowInMask && x >= maskX0 && x < maskX1 ? mask.data[maskBase + x] : mask.defaultColor;
      if (m === 0) continue;
      blendPixel(dst, di, src[si], src[si + 1], src[si + 2], sa, m, blend);
    }
  }
}

/** What blendPixel needs of a separable mode at an opacity: its tables, the opacity scaled for 8-bit alphas, source-atop or not. */
export type PixelBlend = { table: Float64Array | null; opaqueTable: Uint8Array | null; opacity255: number; clip: boolean };

/** The blend state for a separable mode (unknown modes draw as normal) at an opacity in 0..1. */
export function pixelBlend(blendMode: string, opacity: number, clipToBackdrop = false): PixelBlend {
  const table = blendTable(blendMode);
  return { table, opaqueTable: table && roundedTable(blendMode, table), opacity255: Math.min(1, opacity) / (255 * 255), clip: clipToBackdrop };
}

/**
 * One straight-RGBA source pixel (sa > 0, mask value m > 0) onto the canvas pixel at byte di with
 * the general formula above; used by compositeOnto and by the sampler that draws straight onto
 * the canvas (affine-sample.ts), so both give the same bytes.
 */
export function blendPixel(dst: Uint8Array, di: number, s0: number, s1: number, s2: number, sa: number, m: number, k: PixelBlend): void {
  const as = sa * m * k.opacity255;
  const abByte = dst[di + 3];
  const clip = k.clip;
  if (abByte === 0) {
    if (clip) return;
    dst[di] = s0;
    dst[di + 1] = s1;
    dst[di + 2] = s2;
    dst[di + 3] = (as * 255 + 0.5) | 0;
    return;
  }
  const table = k.table;
  const d0 = dst[di];
  const d1 = dst[di + 1];
  const d2 = dst[di + 2];
  if (as >= 1) {
    const opaqueTable = k.opaqueTable;
    if (opaqueTable === null) {
      dst[di] = s0;
      dst[di + 1] = s1;
      dst[di + 2] = s2;
      if (!clip) dst[di + 3] = 255;
      return;
    }
    if (abByte === 255) {
      dst[di] = opaqueTable[(d0 << 8) | s0];
      dst[di + 1] = opaqueTable[(d1 << 8) | s1];
      dst[di + 2] = opaqueTable[(d2 << 8) | s2];
      return;
    }
  }
  const ab = abByte / 255;
  const ao = clip ? ab : as + ab - as * ab;
  const wS = as * (1 - ab);
  const wB = as * ab;
  const wC = clip ? 1 - as : (1 - as) * ab;
  const inv = clip ? 1 : 1 / ao;
  const b0 = table === null ? s0 : table[(d0 << 8) | s0];
  const b1 = table === null ? s1 : table[(d1 << 8) | s1];
  const b2 = table === null ? s2 : table[(d2 << 8) | s2];
  const c0 = (wS * s0 + wB * b0 + wC * d0) * inv;
  const c1 = (wS * s1 + wB * b1 + wC * d1) * inv;
  const c2 = (wS * s2 + wB * b2 + wC * d2) * inv;
  dst[di] = c0 <= 0 ? 0 : c0 >= 255 ? 255 : (c0 + 0.5) | 0;
  dst[di + 1] = c1 <= 0 ? 0 : c1 >= 255 ? 255 : (c1 + 0.5) | 0;
  dst[di + 2] = c2 <= 0 ? 0 : c2 >= 255 ? 255 : (c2 + 0.5) | 0;
  dst[di + 3] = (ao * 255 + 0.5) | 0;
}

const OPACITY_ONE = 1 / (255 * 255);

// 32-bit views of both images when their bytes allow it, so whole pixels move as one word.
function wordViews(canvas: RgbaImage, source: RgbaImage): { dst: Uint32Array; src: Uint32Array } | null {
  const a = canvas.data;
  const b = source.data;
  if (a.byteOffset % 4 !== 0 || b.byteOffset % 4 !== 0 || a.length % 4 !== 0 || b.length % 4 !== 0) return null;
  return { dst: new Uint32Array(a.buffer, a.byteOffset, a.length / 4), src: new Uint32Array(b.buffer, b.byteOffset, b.length / 4) };
}

// normal at full opacity, the commonest draw: the general formula above with as = sa / 255 and
// B(Cb, Cs) = Cs. An opaque source pixel, or any source pixel over a transparent backdrop, is the
// source pixel itself (ao = as, Co = Cs), so it is copied as one word; only partly transparent
// pixels over something take the formula.
function compositeNormalOpaque(canvas: RgbaImage, source: RgbaImage, words: { dst: Uint32Array; src: Uint32Array }, x0: number, y0: number, x1: number, y1: number): void {
  const dst = canvas.data;
  const src = source.data;
  const dst32 = words.dst;
  const src32 = words.src;
  for (let y = y0; y < y1; y++) {
    let sp = (y - source.top) * source.width + (x0 - source.left);
    let dp = (y - canvas.top) * canvas.width + (x0 - canvas.left);
    for (let x = x0; x < x1; x++, sp++, dp++) {
      const sa = src[sp * 4 + 3];
      if (sa === 0) continue;
      const di = dp * 4;
      const abByte = dst[di + 3];
      if (sa === 255 || abByte === 0) {
        dst32[dp] = src32[sp];
        continue;
      }
      const si = sp * 4;
      overPartly(dst, di, src[si], src[si + 1], src[si + 2], sa, abByte);
    }
  }
}

/**
 * A partly transparent straight-RGBA pixel (sa in 1..254) drawn normal at full opacity over a
 * canvas pixel that is not transparent (abByte > 0): the general loop's operations in the same
 * order, so the bytes are identical. Shared by compositeNormalOpaque and the sampler that draws
 * straight onto the canvas (affine-sample.ts).
 */
export function overPartly(dst: Uint8Array, di: number, r: number, g: number, b: number, sa: number, abByte: number): void {
  const as = sa * 255 * OPACITY_ONE;
  const ab = abByte / 255;
  const ao = as + ab - as * ab;
  const wS = as * (1 - ab);
  const wB = as * ab;
  const wC = (1 - as) * ab;
  const inv = 1 / ao;
  const c0 = (wS * r + wB * r + wC * dst[di]) * inv;
  const c1 = (wS * g + wB * g + wC * dst[di + 1]) * inv;
  const c2 = (wS * b + wB * b + wC * dst[di + 2]) * inv;
  dst[di] = c0 <= 0 ? 0 : c0 >= 255 ? 255 : (c0 + 0.5) | 0;
  dst[di + 1] = c1 <= 0 ? 0 : c1 >= 255 ? 255 : (c1 + 0.5) | 0;
  dst[di + 2] = c2 <= 0 ? 0 : c2 >= 255 ? 255 : (c2 + 0.5) | 0;
  dst[di + 3] = (ao * 255 + 0.5) | 0;
}

function compositeNonSeparable(
  canvas: RgbaImage, source: RgbaImage, options: CompositeOptions, blend: NonSeparableBlend,
  x0: number, y0: number, x1: number, y1: number,
): void {
  const clip = options.clipToBackdrop === true;
  const opacity = Math.min(1, options.opacity);
  const cb: Rgb = [0, 0, 0];
  const cs: Rgb = [0, 0, 0];
  const mixed: Rgb = [0, 0, 0];
  for (let y = y0; y < y1; y++) {
    for (let x = x0; x < x1; x++) {
      const si = ((y - source.top) * source.width + (x - source.left)) * 4;
      const di = ((y - canvas.top) * canvas.width + (x - canvas.left)) * 4;
      const m = options.mask ? maskAt(options.mask, x, y) : 255;
      const as = (source.data[si + 3] / 255) * opacity * (m / 255);
      if (as <= 0) continue;
      const ab = canvas.data[di + 3] / 255;
      if (ab === 0 && clip) continue;
      for (let c = 0; c < 3; c++) {
        cb[c] = canvas.data[di + c] / 255;
        cs[c] = source.data[si + c] / 255;
      }
      blend(cb, cs, mixed);
      const ao = clip ? ab : as + ab * (1 - as);
      for (let c = 0; c < 3; c++) {
        const blended = (1 - ab) * cs[c] + ab * mixed[c];
        const co = clip ? as * blended + (1 - as) * cb[c] : (as * blended + (1 - as) * ab * cb[c]) / ao;
        canvas.data[di + c] = Math.round(Math.min(1, Math.max(0, co)) * 255);
      }
      canvas.data[di + 3] = Math.round(ao * 255);
    }
  }
}

function maskAt(mask: MaskImage, x: number, y: number): number {
  const mx = x - mask.left;
  const my = y - mask.top;
  return mx >= 0 && my >= 0 && mx < mask.width && my < mask.height ? mask.data[my * mask.width + mx] : mask.defaultColor;
}

// Multiplies an image's alpha by a mask placed in the same pixel grid.
export function applyMask(image: RgbaImage, mask: MaskImage): void {
  const { data, width, height } = image;
  for (let y = 0; y < height; y++) {
    const my = image.top + y - mask.top;
    const rowInside = my >= 0 && my < mask.height;
    for (let x = 0; x < width; x++) {
      const p = (y * width + x) * 4 + 3;
      if (data[p] === 0) continue;
      const mx = image.left + x - mask.left;
      const m = rowInside && mx >= 0 && mx < mask.width ? mask.data[my * mask.width + mx] : mask.defaultColor;
      if (m !== 255) data[p] = Math.round((data[p] * m) / 255);
    }
  }
}
