import { invert, type Affine, type Rect } from '../../../shared/geometry';
import type { RgbaImage } from './rgba-image';

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
  const inverse = invert(matrix);
  if (!inverse) return null;
  const box = transformedBox(matrix, source.width, source.height, clip);
  if (!box) return null;
  const width = box.right - box.left;
  const height = box.bottom - box.top;
  const out = new Uint8Array(width * height * 4);
  const [ia, ib, ic, id, ie, iff] = inverse;
  const src = source.data;
  const sw = source.width;
  const sh = source.height;
  for (let y = 0; y < height; y++) {
    const ty = box.top + y + 0.5;
    // Source coordinates of the row's first centre, moved by (ia, ib) per output pixel.
    let u = ia * (box.left + 0.5) + ic * ty + ie - 0.5;
    let v = ib * (box.left + 0.5) + id * ty + iff - 0.5;
    let o = y * width * 4;
    for (let x = 0; x < width; x++, u += ia, v += ib, o += 4) {
      if (u <= -1 || v <= -1 || u >= sw || v >= sh) continue;
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
      if (al <= 0) continue;
      out[o] = (r / al + 0.5) | 0;
      out[o + 1] = (g / al + 0.5) | 0;
      out[o + 2] = (bl / al + 0.5) | 0;
      out[o + 3] = (al + 0.5) | 0;
    }
  }
  return { data: out, width, height, left: box.left, top: box.top };
}

/** How much the matrix shrinks the source (the smaller axis), so the caller can pre-reduce it with a proper filter. */
export function shrinkFactor(matrix: Affine): number {
  const sx = Math.hypot(matrix[0], matrix[1]);
  const sy = Math.hypot(matrix[2], matrix[3]);
  return Math.min(sx, sy);
}
