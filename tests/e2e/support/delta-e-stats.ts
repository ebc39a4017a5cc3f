import { deltaE2000, rgbToLab, type Lab } from '../../../shared/colour';

export type DeltaEStats = { mean: number; p99: number; max: number; over5Share: number; pixels: number };

/**
 * CIEDE2000 between two opaque RGB(A) images of the same size, pixel by pixel (alpha ignored:
 * both are flattened on the blank before this). The ΔE00 function is the one checked against
 * Sharma, Wu & Dalal (2005) in shared/colour.
 */
export function deltaEStats(a: Uint8Array, b: Uint8Array, channelsA: number, channelsB: number, pixels: number): DeltaEStats {
  const cache = new Map<number, Lab>();
  const lab = (r: number, g: number, bl: number) => {
    const key = (r << 16) | (g << 8) | bl;
    let v = cache.get(key);
    if (!v) {
      v = rgbToLab({ r, g, b: bl });
      if (cache.size < 500_000) cache.set(key, v);
    }
    return v;
  };
  // ΔE00 in steps of 0.01 up to 100, for the percentile without sorting millions of numbers
  const bins = new Uint32Array(10_001);
  let sum = 0;
  let max = 0;
  let over5 = 0;
  for (let p = 0; p < pixels; p++) {
    const i = p * channelsA;
    const j = p * channelsB;
    let d = 0;
    if (a[i] !== b[j] || a[i + 1] !== b[j + 1] || a[i + 2] !== b[j + 2]) d = deltaE2000(lab(a[i], a[i + 1], a[i + 2]), lab(b[j], b[j + 1], b[j + 2]));
    sum += d;
    if (d > max) max = d;
    if (d > 5) over5++;
    bins[Math.min(10_000, Math.round(d * 100))]++;
  }
  const target = Math.ceil(pixels * 0.99);
  let seen = 0;
  let p99 = 0;
  for (let k = 0; k < bins.length; k++) {
    seen += bins[k];
    if (seen >= target) { p99 = k / 100; break; }
  }
  return { mean: sum / pixels, p99, max, over5Share: over5 / pixels, pixels };
}
