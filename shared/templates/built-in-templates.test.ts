import { describe, expect, it } from 'vitest';
import { readReferenceCsv } from '../colour/test-support/reference-csv';
import { builtInTemplates, cardA6, printA3, printA4, stickerSheet } from './built-in-templates';
import { templatePixelSize } from './template-geometry';
import { templateSchema, type Template } from './template-schema';
import { toPixels, wholePixels } from './units';

// paper-sizes.csv: ISO 216 A-series trimmed sizes (mm) and pixel sizes at 300/150 PPI;
// US Letter per ANSI (8.5 x 11 in).
const papers = new Map(readReferenceCsv('paper-sizes.csv').map((r) => [r.name, r]));

function trimPixels(t: Template, dpi: number) {
  return [wholePixels(toPixels(t.size.width, t.unit, dpi)), wholePixels(toPixels(t.size.height, t.unit, dpi))];
}

describe('built-in templates', () => {
  it('all pass the template schema and have distinct ids', () => {
    for (const t of builtInTemplates) expect(templateSchema.safeParse(t).error?.issues ?? []).toEqual([]);
    expect(new Set(builtInTemplates.map((t) => t.id)).size).toBe(builtInTemplates.length);
  });

  it.each([
    ['A6', cardA6],
    ['A4', printA4],
    ['A3', printA3],
  ] as const)('gives %s its ISO 216 size and pixel counts', (name, t) => {
    const row = papers.get(name)!; // ISO 216, via paper-sizes.csv
    expect(t.unit).toBe('mm');
    expect([t.size.width, t.size.height]).toEqual([Number(row.width_mm), Number(row.height_mm)]);
    expect(trimPixels(t, 300)).toEqual([Number(row.px_at_300ppi_w), Number(row.px_at_300ppi_h)]);
    expect(trimPixels(t, 150)).toEqual([Number(row.px_at_150ppi_w), Number(row.px_at_150ppi_h)]);
  });

  it('adds 3 mm bleed to A4 as 216 x 303 mm', () => {
    const [w, h] = papers.get('A4')!.with_3mm_bleed_each_side_mm.split(' x ').map(Number); // paper-sizes.csv
    expect(templatePixelSize(printA4)).toEqual({ width: wholePixels((w / 25.4) * 300), height: wholePixels((h / 25.4) * 300) });
  });

  it('makes the sticker sheet a US Letter page of 2550 x 3300 px', () => {
    const row = papers.get('US Letter')!; // ANSI US Letter, via paper-sizes.csv
    expect(templatePixelSize(stickerSheet)).toEqual({ width: Number(row.px_at_300ppi_w), height: Number(row.px_at_300ppi_h) });
  });

  it('keeps every mug wrap strip shorter than the blank’s circumference, with the handle in the gap', () => {
    for (const t of builtInTemplates.filter((x) => x.kind === 'mug-wrap')) {
      const circumference = Math.PI * t.wrap!.diameter;
      expect(t.size.width).toBeLessThan(circumference);
      expect(t.wrap!.handleX).toBeGreaterThan(t.size.width);
      expect(t.wrap!.handleX).toBeLessThan(circumference);
    }
  });
});
