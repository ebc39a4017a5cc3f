import { nonSeparableBlends, separableBlends, type NonSeparableBlend, type Rgb, type SeparableBlend } from './blend-modes';
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

// Source-over (or source-atop) with blending, on straight 8-bit RGBA, following W3C
// "Compositing and Blending Level 1", section 9.1 (general formula): Cs' = (1 - ab) Cs +
// ab B(Cb, Cs); ao = as + ab (1 - as); Co = (as Cs' + (1 - as) ab Cb) / ao. Rounded to the
// nearest 8-bit value after each layer, like an 8-bit document.
export function compositeOnto(canvas: RgbaImage, source: RgbaImage, options: CompositeOptions): void {
  const x0 = Math.max(canvas.left, source.left);
  const y0 = Math.max(canvas.top, source.top);
  const x1 = Math.min(canvas.left + canvas.width, source.left + source.width);
  const y1 = Math.min(canvas.top + canvas.height, source.top + source.height);
  if (x1 <= x0 || y1 <= y0 || options.opacity <= 0) return;

  const nonSeparable = nonSeparableBlends[options.blendMode] as NonSeparableBlend | undefined;
  const separable = nonSeparable ? null : (separableBlends[options.blendMode] as SeparableBlend | undefined) ?? separableBlends.normal;
  const isNormal = separable === separableBlends.normal;
  const clip = options.clipToBackdrop === true;
  const { mask } = options;
  const opacity = Math.min(1, options.opacity);
  const dst = canvas.data;
  const src = source.data;
  const cb: Rgb = [0, 0, 0];
  const cs: Rgb = [0, 0, 0];
  const mixed: Rgb = [0, 0, 0];

  for (let y = y0; y < y1; y++) {
    let si = ((y - source.top) * source.width + (x0 - source.left)) * 4;
    let di = ((y - canvas.top) * canvas.width + (x0 - canvas.left)) * 4;
    const maskRow = mask && y >= mask.top && y < mask.top + mask.height ? (y - mask.top) * mask.width : -1;
    for (let x = x0; x < x1; x++, si += 4, di += 4) {
      const sa = src[si + 3];
      if (sa === 0) continue;
      let m = 255;
      if (mask) m = maskRow >= 0 && x >= mask.left && x < mask.left + mask.width ? mask.data[maskRow + x - mask.left] : mask.defaultColor;
      if (m === 0) continue;
      const as = (sa / 255) * opacity * (m / 255);
      const abByte = dst[di + 3];
      if (abByte === 0) {
        if (clip) continue;
        dst[di] = src[si];
        dst[di + 1] = src[si + 1];
        dst[di + 2] = src[si + 2];
        dst[di + 3] = Math.round(as * 255);
        continue;
      }
      if (isNormal && as >= 1) {
        dst[di] = src[si];
        dst[di + 1] = src[si + 1];
        dst[di + 2] = src[si + 2];
        if (!clip) dst[di + 3] = 255;
        continue;
      }
      const ab = abByte / 255;
      for (let c = 0; c < 3; c++) {
        cb[c] = dst[di + c] / 255;
        cs[c] = src[si + c] / 255;
      }
      if (separable) for (let c = 0; c < 3; c++) mixed[c] = separable(cb[c], cs[c]);
      else nonSeparable!(cb, cs, mixed);
      const ao = clip ? ab : as + ab * (1 - as);
      for (let c = 0; c < 3; c++) {
        const blended = (1 - ab) * cs[c] + ab * mixed[c];
        const co = clip ? as * blended + (1 - as) * cb[c] : (as * blended + (1 - as) * ab * cb[c]) / ao;
        dst[di + c] = Math.round(Math.min(1, Math.max(0, co)) * 255);
      }
      dst[di + 3] = Math.round(ao * 255);
    }
  }
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
