import { describe, expect, it } from 'vitest';
import { mug11oz } from '@shared/templates';
import { layoutLines, measureText } from '@shared/text/text-layout';
import { loadTestFontStack } from '@shared/text/test-fonts';
import { LINE_HEIGHT_EM, measureTextBox, newTextPlacement, type MeasureLine } from './text-measure';

// A fixed-width stand-in: every character half an em wide.
const mono = (line: string, sizePx: number) => line.length * sizePx * 0.5;

describe('text boxes', () => {
  it('is as wide as the widest line and one line height per line', () => {
    const box = measureTextBox('Puffin\nPicnic time', 100, 0, mono);
    expect(box.width).toBe(11 * 50);
    expect(box.height).toBe(2 * 100 * LINE_HEIGHT_EM);
  });

  it('adds letter spacing between characters, in thousandths of an em', () => {
    const box = measureTextBox('abcd', 100, 100, mono);
    // 3 gaps × 0.1 em × 100 px
    expect(box.width).toBe(200 + 30);
  });

  it('sizes new text in points at the template’s DPI', () => {
    const p = newTextPlacement({ x: 0, y: 0 }, mug11oz.dpi, mono, 't1');
    // 36 pt = 0.5 in = 150 px at 300 DPI (72 pt per inch, PostScript point)
    expect(p.boxHeight).toBe(150 * LINE_HEIGHT_EM);
  });
});

describe('text boxes on an arc', () => {
  const stack = loadTestFontStack('source-sans-3');
  // the glyph-outline measure the editor uses once the font is loaded
  const outlines: MeasureLine = (line, sizePx) => layoutLines({ content: line, sizePx, letterSpacing: 0 }, stack).lines[0].width;

  it('is the same box the shared layout (and so the print file) gives the bent text', () => {
    for (const [content, arcDeg, letterSpacing] of [['Coastal Spring', 90, 0], ['Lantern Walk', -120, 50], ['Puffin\nPicnic', 200, 0], ['Saltmarsh', 360, -20], ['Straight', 0, 0]] as const) {
      const ours = measureTextBox(content, 125, letterSpacing, outlines, arcDeg);
      const shared = measureText({ content, sizePx: 125, align: 'centre', letterSpacing, arcDeg }, stack);
      expect(ours.width).toBeCloseTo(shared.width, 6);
      expect(ours.height).toBeCloseTo(shared.height, 6);
    }
  });

  it('adds the circular arc\'s sagitta to the height', () => {
    // a 600 px line bent through 90°: r = 600 / (π/2); sagitta = r (1 − cos 45°) (circle geometry, worked by hand: 111.88 px)
    const box = measureTextBox('abcdefghijkl', 100, 0, mono, 90);
    const r = 600 / (Math.PI / 2);
    expect(box.height - 100 * LINE_HEIGHT_EM).toBeCloseTo(r * (1 - Math.SQRT1_2), 6);
    expect(box.height - 100 * LINE_HEIGHT_EM).toBeCloseTo(111.88, 1);
    // and the width is the chord 2 (r + 1.2 em) sin 45° through the glyphs' outer edges (709.9 px), not the straight length
    expect(box.width).toBeCloseTo(2 * (r + 120) * Math.SQRT1_2, 6);
    expect(box.width).toBeCloseTo(709.9, 1);
  });
});
