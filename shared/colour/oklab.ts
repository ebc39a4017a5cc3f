import { BYTE_TO_LINEAR, byteToLinear, clampByte, linearToByte, linearToSrgb, type Rgb } from './srgb';
import type { Xyz } from './lab';

export type Oklab = { l: number; a: number; b: number };
/** OKLab in polar form; h in degrees. */
export type Oklch = { l: number; c: number; h: number };

// Matrices from B. Ottosson, "A perceptual color space for image processing" (2020):
// linear sRGB → LMS, its inverse, XYZ (D65) → LMS (M1), and LMS' → Lab (M2) with its inverse.

export function linearRgbToOklab(r: number, g: number, b: number): Oklab {
  const l = Math.cbrt(0.4122214708 * r + 0.5363325363 * g + 0.0514459929 * b);
  const m = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * b);
  const s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * b);
  return lmsPrimeToOklab(l, m, s);
}

function lmsPrimeToOklab(l: number, m: number, s: number): Oklab {
  return {
    l: 0.2104542553 * l + 0.793617785 * m - 0.0040720468 * s,
    a: 1.9779984951 * l - 2.428592205 * m + 0.4505937099 * s,
    b: 0.0259040371 * l + 0.7827717662 * m - 0.808675766 * s,
  };
}

/** Linear sRGB, unclamped (may leave 0..1 for colours outside the sRGB gamut). */
export function oklabToLinearRgb(o: Oklab): { r: number; g: number; b: number } {
  const l = (o.l + 0.3963377774 * o.a + 0.2158037573 * o.b) ** 3;
  const m = (o.l - 0.1055613458 * o.a - 0.0638541728 * o.b) ** 3;
  const s = (o.l - 0.0894841775 * o.a - 1.291485548 * o.b) ** 3;
  return {
    r: 4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s,
    g: -1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s,
    b: -0.0041960863 * l - 0.7034186147 * m + 1.707614701 * s,
  };
}

export function xyzToOklab(xyz: Xyz): Oklab {
  const l = Math.cbrt(0.8189330101 * xyz.x + 0.3618667424 * xyz.y - 0.1288597137 * xyz.z);
  const m = Math.cbrt(0.0329845436 * xyz.x + 0.9293118715 * xyz.y + 0.0361456387 * xyz.z);
  const s = Math.cbrt(0.0482003018 * xyz.x + 0.2643662691 * xyz.y + 0.633851707 * xyz.z);
  return lmsPrimeToOklab(l, m, s);
}

export function rgbToOklab(c: Rgb): Oklab {
  return linearRgbToOklab(byteToLinear(c.r), byteToLinear(c.g), byteToLinear(c.b));
}

/** sRGB channels on the 0–255 scale, neither rounded nor clamped. */
export function oklabToRgbFloat(o: Oklab): Rgb {
  const lin = oklabToLinearRgb(o);
  return { r: linearToSrgb(lin.r) * 255, g: linearToSrgb(lin.g) * 255, b: linearToSrgb(lin.b) * 255 };
}

/** Clamped per channel to 0–255 and rounded: out-of-gamut colours are clipped, not gamut-mapped. */
export function oklabToRgb(o: Oklab): Rgb {
  const f = oklabToRgbFloat(o);
  return { r: clampByte(f.r), g: clampByte(f.g), b: clampByte(f.b) };
}

export function oklabToOklch(o: Oklab): Oklch {
  const c = Math.hypot(o.a, o.b);
  const h = c === 0 ? 0 : (Math.atan2(o.b, o.a) * 180) / Math.PI;
  return { l: o.l, c, h: h < 0 ? h + 360 : h };
}

export function oklchToOklab(o: Oklch): Oklab {
  const rad = (o.h * Math.PI) / 180;
  return { l: o.l, a: o.c * Math.cos(rad), b: o.c * Math.sin(rad) };
}

export function oklabDistance(x: Oklab, y: Oklab): number {
  return Math.hypot(x.l - y.l, x.a - y.a, x.b - y.b);
}

/** Allocation-free form for pixel loops: writes the OKLab of a packed 0xRRGGBB colour into `out`. */
export function packedRgbToOklabInto(packed: number, out: Float64Array): void {
  const r = BYTE_TO_LINEAR[packed >> 16];
  const g = BYTE_TO_LINEAR[(packed >> 8) & 0xff];
  const b = BYTE_TO_LINEAR[packed & 0xff];
  const l = Math.cbrt(0.4122214708 * r + 0.5363325363 * g + 0.0514459929 * b);
  const m = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * b);
  const s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * b);
  out[0] = 0.2104542553 * l + 0.793617785 * m - 0.0040720468 * s;
  out[1] = 1.9779984951 * l - 2.428592205 * m + 0.4505937099 * s;
  out[2] = 0.0259040371 * l + 0.7827717662 * m - 0.808675766 * s;
}

/** Allocation-free form for pixel loops: OKLab to a packed, clipped 0xRRGGBB colour. */
export function oklabToPackedRgb(L: number, A: number, B: number): number {
  const l0 = L + 0.3963377774 * A + 0.2158037573 * B;
  const m0 = L - 0.1055613458 * A - 0.0638541728 * B;
  const s0 = L - 0.0894841775 * A - 1.291485548 * B;
  const l = l0 * l0 * l0;
  const m = m0 * m0 * m0;
  const s = s0 * s0 * s0;
  const r = linearToByte(4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s);
  const g = linearToByte(-1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s);
  const b = linearToByte(-0.0041960863 * l - 0.7034186147 * m + 1.707614701 * s);
  return (r << 16) | (g << 8) | b;
}
