import { describe, expect, it } from 'vitest';
import { differenceCiede2000 } from 'culori';
import { deltaE2000 } from './ciede2000';
import { readReferenceCsv } from './test-support/reference-csv';

// Sharma, Wu & Dalal 2005, "The CIEDE2000 color-difference formula: implementation notes,
// supplementary test data, and mathematical observations", Table 1 (ciede2000-sharma2005.csv).
const pairs = readReferenceCsv('ciede2000-sharma2005.csv').map((r) => ({
  pair: Number(r.pair),
  x: { l: Number(r.L1), a: Number(r.a1), b: Number(r.b1) },
  y: { l: Number(r.L2), a: Number(r.a2), b: Number(r.b2) },
  expected: Number(r.dE00),
}));

describe('CIEDE2000 colour difference', () => {
  it('has all 34 published test pairs', () => expect(pairs).toHaveLength(34));

  it.each(pairs.map((p) => [p.pair, p] as const))('matches Sharma, Wu & Dalal 2005 pair %i to 4 decimals', (_n, p) => {
    expect(Math.abs(deltaE2000(p.x, p.y) - p.expected)).toBeLessThan(5e-5);
    // the published pairs are symmetric in their two colours
    expect(Math.abs(deltaE2000(p.y, p.x) - p.expected)).toBeLessThan(5e-5);
  });

  it('agrees with culori differenceCiede2000 given lab65 colours', () => {
    // culori 4.0.2; colours must be mode lab65 (reference README, trap 1)
    const theirs = differenceCiede2000();
    for (const p of pairs) {
      expect(deltaE2000(p.x, p.y)).toBeCloseTo(theirs({ mode: 'lab65', ...p.x }, { mode: 'lab65', ...p.y }), 9);
    }
  });

  it('is zero for identical colours and scales a pure lightness difference by kL', () => {
    const x = { l: 40, a: 10, b: -20 };
    expect(deltaE2000(x, x)).toBe(0);
    const y = { ...x, l: 45 };
    expect(deltaE2000(x, y, { kL: 2, kC: 1, kH: 1 })).toBeCloseTo(deltaE2000(x, y) / 2, 12);
  });
});
