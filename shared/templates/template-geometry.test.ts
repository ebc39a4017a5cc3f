import { describe, expect, it } from 'vitest';
import { card5x7Front, cardA6, mug11oz } from './built-in-templates';
import { blankColoursOf, templateGeometry, templatePixelSize } from './template-geometry';
import { parseTemplate, templateSchema, type Template } from './template-schema';

describe('template pixel size and geometry', () => {
  it('makes the 5 x 7 in card front with 0.125 in bleed 1575 x 2175 px at 300 PPI', () => {
    // worked example in print-trade-facts.md and paper-sizes.csv: 5.25 x 7.25 in with bleed
    expect(templatePixelSize(card5x7Front)).toEqual({ width: 1575, height: 2175 });
    const g = templateGeometry(card5x7Front);
    expect(g.trim).toEqual({ x: 37.5, y: 37.5, width: 1500, height: 2100 });
    expect(g.safeRect).toEqual({ x: 75, y: 75, width: 1425, height: 2025 });
    expect(g.bleedRect).toEqual({ x: 0, y: 0, width: 1575, height: 2175 });
    expect(g.printArea).toEqual(g.bleedRect);
    expect(g.keepOuts[0].rect).toEqual({ x: 0, y: 0, width: 75, height: 2175 });
    expect(g.seamX).toBeNull();
    expect(g.frontCentreX).toBeNull();
  });

  it('makes the A6 card with 3 mm bleed 111 x 154 mm, rounded to 1311 x 1819 px', () => {
    // 111 x 154 mm: paper-sizes.csv (ISO 216 A6 plus 3 mm each side); 111/25.4·300 = 1311.02, 154/25.4·300 = 1818.90
    expect(templatePixelSize(cardA6)).toEqual({ width: 1311, height: 1819 });
    const g = templateGeometry(cardA6);
    expect(g.trim.width).toBeCloseTo((105 / 25.4) * 300, 9);
    expect(g.trim.x).toBeCloseTo((1311 - (105 / 25.4) * 300) / 2, 9);
  });

  it('puts the 11 oz mug front centre in the middle of the strip, opposite the handle', () => {
    expect(templatePixelSize(mug11oz)).toEqual({ width: 2550, height: 1050 }); // 8.5 x 3.5 in x 300 (print-trade-facts.md, derived)
    const g = templateGeometry(mug11oz);
    const wrap = g.wrap!;
    expect(wrap.circumferencePx).toBeCloseTo(3063.05, 2); // pi x 3.25 in x 300 (print-trade-facts.md, derived)
    expect(wrap.radiusPx).toBe(487.5);
    expect(g.frontCentreX).toBeCloseTo(1275, 9);
    expect(wrap.handleX - g.frontCentreX!).toBeCloseTo(wrap.circumferencePx / 2, 9);
    expect(g.seamX).toBe(0);
    // handle gap 10.21 - 8.5 = 1.71 in (derived): keep-outs 1.25 - 0.855 in wide at both ends
    const clearance = (1.25 - (Math.PI * 3.25 - 8.5) / 2) * 300;
    expect(g.keepOuts.map((k) => [k.rect.x, k.rect.width])).toEqual([
      [0, clearance],
      [2550 - clearance, clearance],
    ]);
  });

  it('applies a variant’s colours over the blank', () => {
    expect(blankColoursOf(mug11oz, 'black-handle')).toMatchObject({ body: '#fbfaf7', handle: '#1f2024', inside: '#1f2024' });
    expect(blankColoursOf(mug11oz, 'no-such-variant')).toEqual(mug11oz.blank);
  });
});

describe('template validation', () => {
  const base: Template = card5x7Front;

  it('accepts every field of a valid template', () => {
    expect(templateSchema.safeParse(base).success).toBe(true);
  });

  it('refuses a JPEG output that keeps transparency, with a field message', () => {
    const r = parseTemplate({ ...base, output: { ...base.output, format: 'jpeg', transparency: 'keep' } });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe('template.invalid');
      expect(r.error.fields['output.transparency']).toMatch(/JPEG/);
    }
  });

  it('refuses print files beyond 30 000 px a side', () => {
    const r = parseTemplate({ ...base, size: { width: 120, height: 7 } }); // 120 in at 300 dpi = 36 000 px
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.fields.size).toMatch(/36075 x 2175/);
  });

  it('refuses a mug wrap without wrap geometry and an output DPI that differs from the template', () => {
    const r = parseTemplate({ ...mug11oz, wrap: null, output: { ...mug11oz.output, dpi: 150 } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(Object.keys(r.error.fields).sort()).toEqual(['output.dpi', 'wrap']);
  });
});
