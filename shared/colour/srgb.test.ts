import { describe, expect, it } from 'vitest';
import { convertRgbToLrgb } from 'culori';
import { clampByte, hexToRgb, linearToByte, linearToSrgb, parseHexColour, rgbToHex, srgbToLinear } from './srgb';
import { readReferenceCsv } from './test-support/reference-csv';

// IEC 61966-2-1 constants as listed in srgb-lab-reference.csv (constant rows).
const constants = Object.fromEntries(
  readReferenceCsv('srgb-lab-reference.csv')
    .filter((row) => row.kind === 'constant')
    .map((row) => [row.name, Number(row.expected_1)]),
);

describe('hex colours', () => {
  it('reads #rrggbb and the #rgb shorthand in either case', () => {
    expect(hexToRgb('#1a2B3c')).toEqual({ r: 0x1a, g: 0x2b, b: 0x3c });
    expect(hexToRgb('#F80')).toEqual({ r: 0xff, g: 0x88, b: 0x00 });
  });

  it('writes lower-case #rrggbb, rounding and clamping channels', () => {
    expect(rgbToHex({ r: 255, g: 136, b: 0 })).toBe('#ff8800');
    expect(rgbToHex({ r: 0.4, g: 300, b: -5 })).toBe('#00ff00');
    expect(rgbToHex({ r: 15.6, g: 1, b: Number.NaN })).toBe('#100100');
  });

  it('round-trips every hex written back out', () => {
    for (const hex of ['#000000', '#ffffff', '#0a7f3e', '#c0ffee']) expect(rgbToHex(hexToRgb(hex))).toBe(hex);
  });

  it('refuses text that is not a colour with an error value', () => {
    for (const bad of ['', '#12', '#12345', 'ff8800', '#gggggg', '#ff8800aa', ' #fff']) {
      const parsed = parseHexColour(bad);
      expect(parsed.ok).toBe(false);
      if (!parsed.ok) expect(parsed.error.code).toBe('colour.invalid_hex');
    }
    expect(() => hexToRgb('#12')).toThrow(/not a colour/);
  });
});

describe('sRGB transfer function (IEC 61966-2-1)', () => {
  it('uses the standard thresholds and constants from the reference table', () => {
    expect(constants.srgb_decode_threshold).toBe(0.04045);
    const t = constants.srgb_decode_threshold;
    expect(srgbToLinear(t)).toBeCloseTo(t / constants.srgb_linear_slope, 12);
    // both branches meet at the threshold (continuity of the published curve)
    const curve = ((t + constants.srgb_offset_a) / (1 + constants.srgb_offset_a)) ** constants.srgb_exponent;
    expect(Math.abs(srgbToLinear(t) - curve)).toBeLessThan(1e-6);
    expect(linearToSrgb(constants.srgb_encode_threshold)).toBeCloseTo(0.0031308 * 12.92, 12);
  });

  it('decodes every 8-bit code as culori does', () => {
    // culori 4.0.2 convertRgbToLrgb (reference implementation)
    for (let v = 0; v < 256; v++) {
      expect(srgbToLinear(v / 255)).toBeCloseTo(convertRgbToLrgb({ r: v / 255, g: 0, b: 0 }).r, 12);
    }
  });

  it('encodes back to the same value for every 8-bit code', () => {
    for (let v = 0; v < 256; v++) expect(Math.round(linearToSrgb(srgbToLinear(v / 255)) * 255)).toBe(v);
  });

  it('mirrors negative values instead of returning NaN', () => {
    expect(srgbToLinear(-0.5)).toBeCloseTo(-srgbToLinear(0.5), 12);
    expect(linearToSrgb(-0.2)).toBeCloseTo(-linearToSrgb(0.2), 12);
  });

  it('encodes linear light straight to the nearest byte, as rounding the curve would', () => {
    for (let i = 0; i <= 200_000; i++) {
      const v = i / 200_000;
      const expected = clampByte(linearToSrgb(v) * 255);
      if (linearToByte(v) !== expected) throw new Error(`linear ${v}: ${linearToByte(v)} instead of ${expected}`);
    }
    expect([linearToByte(-0.1), linearToByte(1.5), linearToByte(Number.NaN), linearToByte(srgbToLinear(0.5))]).toEqual([0, 255, 0, 128]);
  });
});
