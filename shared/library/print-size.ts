import type { PrintSize } from '../contracts/motifs';

// 25.4 mm to the inch: the international inch (1959), exact.
const MM_PER_INCH = 25.4;

// 300 PPI for close viewing (cards, mugs) and 150 PPI as the floor for larger, further-viewed
// prints: common practice.
export const PRINT_PPI = [300, 150] as const;

const round = (v: number, places: number) => Math.round(v * 10 ** places) / 10 ** places;

// The largest size a motif prints at without upscaling, at a given resolution.
export function largestPrintSize(widthPx: number, heightPx: number, ppi: number): PrintSize {
  const widthIn = widthPx / ppi;
  const heightIn = heightPx / ppi;
  return {
    ppi,
    widthIn: round(widthIn, 2),
    heightIn: round(heightIn, 2),
    widthMm: round(widthIn * MM_PER_INCH, 1),
    heightMm: round(heightIn * MM_PER_INCH, 1),
  };
}

export const printSizesOf = (widthPx: number, heightPx: number) => PRINT_PPI.map((ppi) => largestPrintSize(widthPx, heightPx, ppi));
