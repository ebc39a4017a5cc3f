import { describe, expect, it } from 'vitest';
import { wcagContrast } from 'culori';
import { WCAG_THRESHOLDS, contrastRatio, relativeLuminance } from './contrast';
import { hexToRgb } from './srgb';
import { readReferenceCsv } from './test-support/reference-csv';

// W3C WCAG 2.2 definitions of relative luminance and contrast ratio, worked values in
// wcag-contrast.csv (cross-checked there with culori 4.0.2).
const reference = readReferenceCsv('wcag-contrast.csv');

describe('WCAG 2.x contrast', () => {
  const luminanceRows = reference.filter((r) => r.kind === 'luminance');
  const contrastRows = reference.filter((r) => r.kind === 'contrast');

  it.each(luminanceRows.map((r) => [r.name_or_fg, r] as const))('gives the relative luminance of %s', (hex, r) => {
    expect(relativeLuminance(hexToRgb(hex))).toBeCloseTo(Number(r['value_thr_0.04045']), 8);
  });

  it.each(contrastRows.map((r) => [`${r.name_or_fg} on ${r.bg}`, r] as const))('gives the contrast ratio of %s', (_n, r) => {
    const ratio = contrastRatio(hexToRgb(r.name_or_fg), hexToRgb(r.bg));
    expect(ratio).toBeCloseTo(Number(r['value_thr_0.04045']), 5);
    expect(ratio).toBeCloseTo(wcagContrast(r.name_or_fg, r.bg), 9); // culori 4.0.2
  });

  it('passes #767676 on white for AA body text and fails #777777', () => {
    // WCAG 2.2 SC 1.4.3; thresholds as listed in wcag-contrast.csv
    const aa = Number(reference.find((r) => r.name_or_fg === 'AA_normal_text')!.value);
    expect(WCAG_THRESHOLDS.aaNormalText).toBe(aa);
    const white = { r: 255, g: 255, b: 255 };
    expect(contrastRatio(hexToRgb('#767676'), white)).toBeGreaterThanOrEqual(aa);
    expect(contrastRatio(hexToRgb('#777777'), white)).toBeLessThan(aa);
  });
});
