import { describe, expect, it } from 'vitest';
import { converter } from 'culori';
import { D65_WHITE, linearRgbToXyz, rgbToLab, rgbToXyz } from './lab';
import { hexToRgb } from './srgb';
import { readReferenceCsv } from './test-support/reference-csv';

// Source: srgb-lab-reference.csv (IEC 61966-2-1, CSS Color 4 conversions; hex → CIELAB values
// from chroma.js's tests, with culori 4.0.2 values alongside).
const reference = readReferenceCsv('srgb-lab-reference.csv');
const row = (name: string) => reference.find((r) => r.name === name)!;
const triple = (r: Record<string, string>, prefix: string) => [1, 2, 3].map((i) => Number(r[`${prefix}${i}`]));
const toLab65 = converter('lab65');

describe('sRGB → XYZ (CSS Color 4 matrix)', () => {
  it('maps each sRGB primary to its CSS Color 4 matrix column', () => {
    const rows = ['row1', 'row2', 'row3'].map((r) => triple(row(`sRGB_to_XYZ_D65_CSS4_${r}`), 'expected_'));
    const columns = [linearRgbToXyz(1, 0, 0), linearRgbToXyz(0, 1, 0), linearRgbToXyz(0, 0, 1)];
    columns.forEach((xyz, col) => {
      expect(xyz.x).toBeCloseTo(rows[0][col], 9);
      expect(xyz.y).toBeCloseTo(rows[1][col], 9);
      expect(xyz.z).toBeCloseTo(rows[2][col], 9);
    });
  });

  it('agrees with the 4-digit IEC 61966-2-1 matrix to its printed precision', () => {
    const iec = ['row1', 'row2', 'row3'].map((r) => triple(row(`sRGB_to_XYZ_D65_IEC_${r}`), 'expected_'));
    const xyz = linearRgbToXyz(0, 1, 0);
    expect(Math.abs(xyz.x - iec[0][1])).toBeLessThan(1e-4);
    expect(Math.abs(xyz.y - iec[1][1])).toBeLessThan(1e-4);
    expect(Math.abs(xyz.z - iec[2][1])).toBeLessThan(1e-4);
  });

  it('puts sRGB white on the D65 white point of CSS Color 4', () => {
    const [x, y, z] = triple(row('D65_white_XYZ_CSS4'), 'expected_');
    const white = rgbToXyz({ r: 255, g: 255, b: 255 });
    expect(white.x).toBeCloseTo(x, 7);
    expect(white.y).toBeCloseTo(y, 7);
    expect(white.z).toBeCloseTo(z, 7);
    expect(D65_WHITE.x).toBeCloseTo(x, 7);
  });
});

describe('sRGB → CIELAB (D65)', () => {
  const labRows = reference.filter((r) => r.kind === 'sRGB->CIELAB' && r.white.startsWith('D65'));

  it.each(labRows.map((r) => [r.name, r] as const))('gives the published L*a*b* of %s', (_name, r) => {
    const lab = rgbToLab(hexToRgb(r.input));
    const published = triple(r, 'expected_');
    const culoriValues = triple(r, 'culori_');
    // Published table uses the other matrix convention: within 0.02 (reference README, trap 2).
    expect(Math.abs(lab.l - published[0])).toBeLessThan(0.02);
    expect(Math.abs(lab.a - published[1])).toBeLessThan(0.02);
    expect(Math.abs(lab.b - published[2])).toBeLessThan(0.02);
    // Same convention as culori 4.0.2: agrees with its tabulated values to their 6 decimals.
    expect(Math.abs(lab.l - culoriValues[0])).toBeLessThan(2e-6);
    expect(Math.abs(lab.a - culoriValues[1])).toBeLessThan(2e-6);
    expect(Math.abs(lab.b - culoriValues[2])).toBeLessThan(2e-6);
  });

  it('matches culori lab65 across the sRGB cube', () => {
    // culori 4.0.2, mode lab65 (its mode "lab" is D50 — reference README, trap 1)
    for (let r = 0; r <= 255; r += 17)
      for (let g = 0; g <= 255; g += 51)
        for (let b = 0; b <= 255; b += 15) {
          const ours = rgbToLab({ r, g, b });
          const theirs = toLab65({ mode: 'rgb', r: r / 255, g: g / 255, b: b / 255 });
          expect(ours.l).toBeCloseTo(theirs.l, 9);
          expect(ours.a).toBeCloseTo(theirs.a, 9);
          expect(ours.b).toBeCloseTo(theirs.b, 9);
        }
  });
});
