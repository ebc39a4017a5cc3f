import { describe, expect, it } from 'vitest';
import { grayOnWhite } from './gray-for-hash';

// The plain definition, pixel by pixel: each source pixel adds its alpha-weighted colour and its
// count to the cell floor(x·w / W), floor(y·h / H); the cell's colour is the weighted mean, its
// alpha the mean alpha; luma (Rec. 601 weights 0.299, 0.587, 0.114) is composited on white.
function reference(data: Uint8Array, W: number, H: number, w: number, h: number): Uint8Array {
  const sums = Array.from({ length: w * h }, () => [0, 0, 0, 0, 0]);
  for (let y = 0; y < H; y++) {
    for (let x = 0; x < W; x++) {
      const cell = sums[Math.min(h - 1, Math.floor((y * h) / H)) * w + Math.min(w - 1, Math.floor((x * w) / W))];
      const p = (y * W + x) * 4;
      const a = data[p + 3];
      cell[0] += data[p] * a;
      cell[1] += data[p + 1] * a;
      cell[2] += data[p + 2] * a;
      cell[3] += a;
      cell[4] += 1;
    }
  }
  const byte = (v: number) => (v <= 0 ? 0 : v >= 255 ? 255 : Math.floor(v + 0.5));
  return Uint8Array.from(sums, ([r, g, b, a, n]) => {
    const [cr, cg, cb] = a > 0 ? [byte(r / a), byte(g / a), byte(b / a)] : [0, 0, 0];
    const alpha = (n > 0 ? byte(a / n) : 0) / 255;
    return byte((0.299 * cr + 0.587 * cg + 0.114 * cb) * alpha + 255 * (1 - alpha));
  });
}

describe('grayOnWhite', () => {
  it('gives the bytes of averaging every pixel in turn, for odd sizes and transparent areas', () => {
    let seed = 7;
    const random = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
    for (let k = 0; k < 60; k++) {
      const W = 1 + Math.floor(random() * 90);
      const H = 1 + Math.floor(random() * 90);
      const w = 1 + Math.floor(random() * 10);
      const h = 1 + Math.floor(random() * 10);
      const data = new Uint8Array(W * H * 4).map(() => (random() < 0.3 ? 0 : Math.floor(random() * 256)));
      expect(grayOnWhite({ data, width: W, height: H }, w, h)).toEqual(reference(data, W, H, w, h));
    }
  });

  it('reads a transparent image as white and an opaque black one as black', () => {
    expect([...grayOnWhite({ data: new Uint8Array(4 * 4 * 4), width: 4, height: 4 }, 2, 2)]).toEqual([255, 255, 255, 255]);
    const black = new Uint8Array(4 * 4 * 4).map((_, i) => (i % 4 === 3 ? 255 : 0));
    expect([...grayOnWhite({ data: black, width: 4, height: 4 }, 2, 2)]).toEqual([0, 0, 0, 0]);
  });
});
