import { describe, expect, it } from 'vitest';
import { convertOklabToRgb, converter } from 'culori';
import { oklabToOklch, oklabToRgb, oklabToRgbFloat, oklchToOklab, rgbToOklab, xyzToOklab } from './oklab';
import { hexToRgb } from './srgb';
import { readReferenceCsv } from './test-support/reference-csv';

const reference = readReferenceCsv('srgb-lab-reference.csv');
const triple = (r: Record<string, string>, prefix: string) => [1, 2, 3].map((i) => Number(r[`${prefix}${i}`]));
const toOklab = converter('oklab');

describe('XYZ → OKLab', () => {
  // Ottosson 2020, "A perceptual color space for image processing", table of example XYZ and
  // OKLab pairs (3 decimals), as copied into srgb-lab-reference.csv.
  const rows = reference.filter((r) => r.kind === 'XYZ->OKLab');

  it('has the four example pairs to check', () => expect(rows).toHaveLength(4));

  it.each(rows.map((r) => [r.name, r] as const))('reproduces Ottosson example %s', (_name, r) => {
    const [x, y, z] = r.input.split(' ').map(Number);
    const lab = xyzToOklab({ x, y, z });
    const [l, a, b] = triple(r, 'expected_');
    expect(Math.abs(lab.l - l)).toBeLessThanOrEqual(0.0005);
    expect(Math.abs(lab.a - a)).toBeLessThanOrEqual(0.0005);
    expect(Math.abs(lab.b - b)).toBeLessThanOrEqual(0.0005);
  });
});

describe('sRGB ↔ OKLab', () => {
  const rows = reference.filter((r) => r.kind === 'sRGB->OKLab');

  it.each(rows.map((r) => [r.name, r] as const))('gives the tabulated OKLab of %s', (_name, r) => {
    // Published values (chroma.js tests, 3 dp) and culori 4.0.2's values (6 dp) from the CSV.
    const lab = rgbToOklab(hexToRgb(r.input));
    const published = triple(r, 'expected_');
    const culoriValues = triple(r, 'culori_');
    [lab.l, lab.a, lab.b].forEach((v, i) => {
      expect(Math.abs(v - published[i])).toBeLessThanOrEqual(0.0005);
      expect(Math.abs(v - culoriValues[i])).toBeLessThan(2e-6);
    });
  });

  it('matches culori oklab across the sRGB cube and round-trips each colour exactly', () => {
    for (let r = 0; r <= 255; r += 15)
      for (let g = 0; g <= 255; g += 17)
        for (let b = 0; b <= 255; b += 51) {
          const ours = rgbToOklab({ r, g, b });
          // culori 4.0.2 oklab mode (reference implementation)
          const theirs = toOklab({ mode: 'rgb', r: r / 255, g: g / 255, b: b / 255 });
          expect(Math.abs(ours.l - theirs.l)).toBeLessThan(1e-7);
          expect(Math.abs(ours.a - theirs.a)).toBeLessThan(1e-7);
          expect(Math.abs(ours.b - theirs.b)).toBeLessThan(1e-7);
          expect(oklabToRgb(ours)).toEqual({ r, g, b });
        }
  });

  it('converts OKLab back to the same unrounded sRGB as culori', () => {
    for (const o of [
      { l: 0.7, a: 0.1, b: -0.05 },
      { l: 0.35, a: -0.02, b: 0.08 },
      { l: 0.9, a: 0.3, b: 0.2 }, // outside sRGB: channels go past 0..255 before clipping
    ]) {
      const ours = oklabToRgbFloat(o);
      const theirs = convertOklabToRgb(o); // culori 4.0.2
      expect(ours.r).toBeCloseTo(theirs.r * 255, 4);
      expect(ours.g).toBeCloseTo(theirs.g * 255, 4);
      expect(ours.b).toBeCloseTo(theirs.b * 255, 4);
    }
  });

  it('clips colours outside sRGB to whole bytes', () => {
    const rgb = oklabToRgb({ l: 0.9, a: 0.3, b: 0.2 });
    expect(oklabToRgbFloat({ l: 0.9, a: 0.3, b: 0.2 }).r).toBeGreaterThan(255);
    expect(rgb.r).toBe(255);
    for (const v of Object.values(rgb)) expect(Number.isInteger(v) && v >= 0 && v <= 255).toBe(true);
  });

  it('turns OKLab into OKLCh and back', () => {
    const o = rgbToOklab({ r: 40, g: 120, b: 200 });
    const lch = oklabToOklch(o);
    // culori 4.0.2 oklch mode
    const theirs = converter('oklch')({ mode: 'rgb', r: 40 / 255, g: 120 / 255, b: 200 / 255 });
    expect(lch.c).toBeCloseTo(theirs.c, 7);
    expect(lch.h).toBeCloseTo(theirs.h ?? 0, 5);
    const back = oklchToOklab(lch);
    expect(back.a).toBeCloseTo(o.a, 12);
    expect(back.b).toBeCloseTo(o.b, 12);
    expect(oklabToOklch({ l: 0.5, a: 0, b: 0 }).h).toBe(0);
  });
});
