import { byteToLinear, type Rgb } from './srgb';

/** CIE XYZ with the white's Y = 1. */
export type Xyz = { x: number; y: number; z: number };
/** CIELAB (L* 0–100) relative to D65. */
export type Lab = { l: number; a: number; b: number };

// Convention pinned here: the CSS Color 4 sRGB→XYZ matrix in its exact rational form, derived
// from the sRGB primaries and D65 xy (0.3127, 0.3290) (W3C CSS Color 4 sample code; the same
// numbers culori uses). Its white is X 0.95045593, Z 1.08905775. Tables built on the older
// 7-digit matrix with white 0.95047/1.08883 differ from ours by up to ~0.011 in L*a*b*.
const M = [
  [506752 / 1228815, 87881 / 245763, 12673 / 70218],
  [87098 / 409605, 175762 / 245763, 12673 / 175545],
  [7918 / 409605, 87881 / 737289, 1001167 / 1053270],
] as const;

export const D65_WHITE: Xyz = { x: 0.3127 / 0.329, y: 1, z: (1 - 0.3127 - 0.329) / 0.329 };

// CIE 15 constants in exact form: epsilon = (6/29)^3, kappa = (29/3)^3.
const EPSILON = 216 / 24389;
const KAPPA = 24389 / 27;

export function linearRgbToXyz(r: number, g: number, b: number): Xyz {
  return {
    x: M[0][0] * r + M[0][1] * g + M[0][2] * b,
    y: M[1][0] * r + M[1][1] * g + M[1][2] * b,
    z: M[2][0] * r + M[2][1] * g + M[2][2] * b,
  };
}

export function rgbToXyz(c: Rgb): Xyz {
  return linearRgbToXyz(byteToLinear(c.r), byteToLinear(c.g), byteToLinear(c.b));
}

function labF(t: number): number {
  return t > EPSILON ? Math.cbrt(t) : (KAPPA * t + 16) / 116;
}

export function xyzToLab(xyz: Xyz, white: Xyz = D65_WHITE): Lab {
  const fx = labF(xyz.x / white.x);
  const fy = labF(xyz.y / white.y);
  const fz = labF(xyz.z / white.z);
  return { l: 116 * fy - 16, a: 500 * (fx - fy), b: 200 * (fy - fz) };
}

export function rgbToLab(c: Rgb): Lab {
  return xyzToLab(rgbToXyz(c));
}
