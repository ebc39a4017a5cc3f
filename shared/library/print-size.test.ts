import { describe, expect, it } from 'vitest';
import { readReferenceCsv } from '../colour/test-support/reference-csv';
import { largestPrintSize, printSizesOf } from './print-size';

// ISO 216 / trade card sizes with their pixel counts at 300 and 150 PPI (paper-sizes.csv).
const sizes = readReferenceCsv('paper-sizes.csv');

describe('largest print size of a motif', () => {
  it.each(sizes.map((s) => [s.name, s] as const))('turns the pixels of %s at 300 and 150 PPI back into its paper size', (_name, s) => {
    for (const ppi of [300, 150] as const) {
      const size = largestPrintSize(Number(s[`px_at_${ppi}ppi_w`]), Number(s[`px_at_${ppi}ppi_h`]), ppi);
      // Pixel counts are rounded to whole pixels: within half a pixel of the true size.
      const halfPixelMm = (25.4 / ppi) / 2 + 0.05;
      expect(Math.abs(size.widthMm - Number(s.width_mm))).toBeLessThanOrEqual(halfPixelMm);
      expect(Math.abs(size.heightMm - Number(s.height_mm))).toBeLessThanOrEqual(halfPixelMm);
      expect(Math.abs(size.widthIn - Number(s.width_in))).toBeLessThanOrEqual(1 / ppi / 2 + 0.005);
    }
  });

  it('gives both the 300 PPI and the 150 PPI size, the second twice the first', () => {
    const [at300, at150] = printSizesOf(1500, 2100);
    expect(at300).toEqual({ ppi: 300, widthIn: 5, heightIn: 7, widthMm: 127, heightMm: 177.8 });
    expect(at150.widthIn).toBe(10);
  });
});
