import { z } from 'zod';

/** 8-bit sRGB channels, 0–255. */
export type Rgb = { r: number; g: number; b: number };

export type ColourError = { code: 'colour.invalid_hex'; message: string };

const HEX_PATTERN = /^#(?:[0-9a-f]{3}|[0-9a-f]{6})$/i;

export const hexColourSchema = z
  .string()
  .regex(HEX_PATTERN, { message: 'Colour must be written as #rgb or #rrggbb' });

export function isHexColour(hex: string): boolean {
  return HEX_PATTERN.test(hex);
}

/** Parses #rgb or #rrggbb; returns an error value for anything else. */
export function parseHexColour(hex: string): { ok: true; value: Rgb } | { ok: false; error: ColourError } {
  if (!HEX_PATTERN.test(hex)) {
    const shown = hex.length > 20 ? `${hex.slice(0, 20)}…` : hex;
    return {
      ok: false,
      error: { code: 'colour.invalid_hex', message: `"${shown}" is not a colour; write it as #rgb or #rrggbb` },
    };
  }
  const digits = hex.length === 4 ? [...hex.slice(1)].map((d) => d + d).join('') : hex.slice(1);
  const n = Number.parseInt(digits, 16);
  return { ok: true, value: { r: (n >> 16) & 0xff, g: (n >> 8) & 0xff, b: n & 0xff } };
}

/** Throws an Error carrying `code: 'colour.invalid_hex'` for malformed input; use parseHexColour for untrusted text. */
export function hexToRgb(hex: string): Rgb {
  const parsed = parseHexColour(hex);
  if (!parsed.ok) throw Object.assign(new Error(parsed.error.message), { code: parsed.error.code });
  return parsed.value;
}

export function clampByte(v: number): number {
  if (!(v > 0)) return 0; // also maps NaN to 0
  return v >= 255 ? 255 : Math.round(v);
}

export function rgbToHex(c: Rgb): string {
  const n = (clampByte(c.r) << 16) | (clampByte(c.g) << 8) | clampByte(c.b);
  return `#${n.toString(16).padStart(6, '0')}`;
}

// IEC 61966-2-1 transfer function. The 0.04045 threshold is the standard's; WCAG 2.0's 0.03928
// gives the same results for 8-bit values. Odd extension below 0 as in CSS Color 4.
export function srgbToLinear(v01: number): number {
  const abs = Math.abs(v01);
  const lin = abs <= 0.04045 ? abs / 12.92 : ((abs + 0.055) / 1.055) ** 2.4;
  return v01 < 0 ? -lin : lin;
}

export function linearToSrgb(v01: number): number {
  const abs = Math.abs(v01);
  const enc = abs <= 0.0031308 ? abs * 12.92 : 1.055 * abs ** (1 / 2.4) - 0.055;
  return v01 < 0 ? -enc : enc;
}

/** Linear value of each 8-bit code, so per-pixel code avoids a pow call. */
export const BYTE_TO_LINEAR: Float64Array = (() => {
  const table = new Float64Array(256);
  for (let i = 0; i < 256; i++) table[i] = srgbToLinear(i / 255);
  return table;
})();

/** Linear value of an sRGB channel given on the 0–255 scale (table lookup for whole bytes). */
export function byteToLinear(v: number): number {
  return Number.isInteger(v) && v >= 0 && v <= 255 ? BYTE_TO_LINEAR[v] : srgbToLinear(v / 255);
}

// Linear values halfway (in encoded sRGB) between neighbouring 8-bit codes, so encoding a
// linear value to a byte is a binary search instead of a pow call (hot path of recolours).
const BYTE_MIDPOINTS: Float64Array = (() => {
  const table = new Float64Array(255);
  for (let i = 0; i < 255; i++) table[i] = srgbToLinear((i + 0.5) / 255);
  return table;
})();

// Byte at the start of each of 4096 equal linear steps. A step is narrower than one code even
// where the curve is steepest (slope 12.92·255 near black), so at most one correction follows.
const ENCODE_STEPS = 4096;
const STEP_START_BYTE: Uint8Array = (() => {
  const table = new Uint8Array(ENCODE_STEPS);
  let byte = 0;
  for (let i = 0; i < ENCODE_STEPS; i++) {
    while (byte < 255 && BYTE_MIDPOINTS[byte] <= i / ENCODE_STEPS) byte++;
    table[i] = byte;
  }
  return table;
})();

/** Encodes a linear value to the nearest 8-bit sRGB code, clamping; same as rounding linearToSrgb(v)·255. */
export function linearToByte(v: number): number {
  if (!(v > 0)) return 0;
  if (v >= 1) return 255;
  let byte = STEP_START_BYTE[(v * ENCODE_STEPS) | 0];
  while (byte < 255 && BYTE_MIDPOINTS[byte] <= v) byte++;
  return byte;
}
