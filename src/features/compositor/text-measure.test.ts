import { describe, expect, it } from 'vitest';
import { mug11oz } from '@shared/templates';
import { LINE_HEIGHT_EM, measureTextBox, newTextPlacement } from './text-measure';

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
