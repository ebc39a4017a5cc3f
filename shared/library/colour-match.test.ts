import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deltaE2000 } from '../colour/ciede2000';
import { rgbToLab } from '../colour/lab';
import { hexToRgb } from '../colour/srgb';
import { readReferenceCsv } from '../colour/test-support/reference-csv';
import { bestColourMatch, lightnessRulesOut, MAX_LIGHTNESS_WEIGHT } from './colour-match';

const lab = (hex: string) => rgbToLab(hexToRgb(hex));
const labArb = fc.record({ l: fc.double({ min: 0, max: 100, noNaN: true }), a: fc.double({ min: -128, max: 127, noNaN: true }), b: fc.double({ min: -128, max: 127, noNaN: true }) });

describe('the lightness shortcut of colour search', () => {
  it('never rules out a pair of the published CIEDE2000 test data that is within its distance', () => {
    // Sharma, Wu & Dalal 2005, Table 1 (ciede2000-sharma2005.csv): ΔE00 ≥ |ΔL*| / 1.747 for every pair.
    for (const r of readReferenceCsv('ciede2000-sharma2005.csv')) {
      const x = { l: Number(r.L1), a: Number(r.a1), b: Number(r.b1) };
      const y = { l: Number(r.L2), a: Number(r.a2), b: Number(r.b2) };
      expect(Number(r.dE00)).toBeGreaterThanOrEqual(Math.abs(x.l - y.l) / MAX_LIGHTNESS_WEIGHT - 1e-4);
    }
  });

  it('never rules out a colour the full formula would accept', () => {
    fc.assert(
      fc.property(labArb, fc.double({ min: -30, max: 30, noNaN: true }), labArb, fc.double({ min: 0.5, max: 40, noNaN: true }), (x, dL, y, limit) => {
        // Lightness differences near the limit, where the shortcut decides.
        y = { ...y, l: Math.min(100, Math.max(0, x.l + dL)) };
        if (lightnessRulesOut(x, y, limit)) expect(deltaE2000(x, y)).toBeGreaterThan(limit);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('a motif matching a picked colour', () => {
  it('matches through its nearest palette colour within the distance', () => {
    const palette = [
      { hex: '#1d1f2a', share: 0.6, lab: lab('#1d1f2a') },
      { hex: '#c8283c', share: 0.3, lab: lab('#c8283c') },
    ];
    const match = bestColourMatch(lab('#c32a3a'), palette, 12);
    expect(match?.hex).toBe('#c8283c');
    expect(match!.deltaE).toBeCloseTo(deltaE2000(lab('#c32a3a'), lab('#c8283c')), 9);
    expect(bestColourMatch(lab('#2a8cc8'), palette, 12)).toBeNull();
  });

  it('ranks a colour covering most of a motif before a speck of a slightly closer one', () => {
    const target = lab('#c8283c');
    const mostlyRed = bestColourMatch(target, [{ hex: '#c42a3e', share: 0.9, lab: lab('#c42a3e') }], 12)!;
    const redSpeck = bestColourMatch(target, [{ hex: '#c8293c', share: 0.02, lab: lab('#c8293c') }], 12)!;
    expect(redSpeck.deltaE).toBeLessThan(mostlyRed.deltaE);
    expect(mostlyRed.rank).toBeLessThan(redSpeck.rank);
  });
});
