import { z } from 'zod';
import { oklabToPackedRgb, packedRgbToOklabInto, rgbToOklab } from './oklab';
import { mapPixelColours, type PixelBuffer } from './pixel-map';
import { clampByte, hexColourSchema, hexToRgb, type Rgb } from './srgb';

export const recolourSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('none') }),
  z.object({ kind: z.literal('hue'), degrees: z.number() }),
  z.object({ kind: z.literal('fill'), colour: hexColourSchema }),
  z.object({
    kind: z.literal('swap'),
    from: hexColourSchema,
    to: hexColourSchema,
    // OKLab distance; black to white is 1.0
    tolerance: z.number().min(0).max(1),
  }),
]);

export type Recolour = z.infer<typeof recolourSchema>;

/** The outer part of a swap's tolerance over which the swap fades out, so edges don't band. */
export const SWAP_SOFT_EDGE_FRACTION = 0.25;

/** Rotates every pixel's hue by `degrees` in OKLCh, keeping lightness and chroma; out-of-gamut results are clipped. */
export function hueShift(rgba: PixelBuffer, degrees: number): Uint8ClampedArray {
  const rad = ((Number.isFinite(degrees) ? degrees : 0) * Math.PI) / 180;
  const cos = Math.cos(rad);
  const sin = Math.sin(rad);
  const o = new Float64Array(3);
  return mapPixelColours(rgba, (packed) => {
    packedRgbToOklabInto(packed, o);
    return oklabToPackedRgb(o[0], o[1] * cos - o[2] * sin, o[1] * sin + o[2] * cos);
  });
}

/** Every pixel becomes `colour`; alpha keeps the motif's shape. */
export function solidFill(rgba: PixelBuffer, colour: Rgb): Uint8ClampedArray {
  const [r, g, b] = [clampByte(colour.r), clampByte(colour.g), clampByte(colour.b)];
  const out = new Uint8ClampedArray(rgba);
  const whole = out.length - (out.length % 4);
  for (let i = 0; i < whole; i += 4) {
    out[i] = r;
    out[i + 1] = g;
    out[i + 2] = b;
  }
  return out;
}

/** How much of the swap a pixel at OKLab distance `d` from the source colour receives (1 inside, 0 outside). */
export function swapWeight(d: number, tolerance: number): number {
  if (!(d <= tolerance)) return 0;
  const inner = tolerance * (1 - SWAP_SOFT_EDGE_FRACTION);
  if (d <= inner) return 1;
  const t = (tolerance - d) / (tolerance - inner);
  return t * t * (3 - 2 * t); // smoothstep
}

/**
 * Pixels within `toleranceOklab` of `from` move to `to`, each keeping its OKLab offset from
 * `from` (shading and anti-aliasing survive), fading out over the outer part of the tolerance.
 */
export function colourSwap(rgba: PixelBuffer, from: Rgb, to: Rgb, toleranceOklab: number): Uint8ClampedArray {
  const source = rgbToOklab(from);
  const target = rgbToOklab(to);
  const shift = { l: target.l - source.l, a: target.a - source.a, b: target.b - source.b };
  const tolerance = Number.isFinite(toleranceOklab) ? Math.max(0, toleranceOklab) : 0;
  const o = new Float64Array(3);
  return mapPixelColours(rgba, (packed) => {
    packedRgbToOklabInto(packed, o);
    const w = swapWeight(Math.hypot(o[0] - source.l, o[1] - source.a, o[2] - source.b), tolerance);
    if (w === 0) return packed;
    return oklabToPackedRgb(o[0] + w * shift.l, o[1] + w * shift.a, o[2] + w * shift.b);
  });
}

/** Applies a placement's saved recolour; always returns a new buffer. */
export function applyRecolour(rgba: PixelBuffer, recolour: Recolour): Uint8ClampedArray {
  switch (recolour.kind) {
    case 'none':
      return new Uint8ClampedArray(rgba);
    case 'hue':
      return hueShift(rgba, recolour.degrees);
    case 'fill':
      return solidFill(rgba, hexToRgb(recolour.colour));
    case 'swap':
      return colourSwap(rgba, hexToRgb(recolour.from), hexToRgb(recolour.to), recolour.tolerance);
  }
}
