import opentype from 'opentype.js';
import { describe, expect, it } from 'vitest';
import { shippedFonts, resolveFontId } from './shipped-fonts';
import { loadTestFontStack } from './test-fonts';
import { ARC_LEAN_EM, arcSagitta, layoutLines, measureText, textOutlinePath } from './text-layout';

const sourceSans = loadTestFontStack('source-sans-3');

// Bounding box of an SVG path made only of absolute M/L/Q/C/Z commands, from its points.
function pathBounds(d: string) {
  const nums = (d.match(/-?\d+(\.\d+)?/g) ?? []).map(Number);
  const xs = nums.filter((_, i) => i % 2 === 0);
  const ys = nums.filter((_, i) => i % 2 === 1);
  return { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) };
}

describe('text laid out from glyph outlines', () => {
  it('measures a straight line as opentype.js does, kerning included', () => {
    // reference: opentype.js's own Font.getAdvanceWidth (kerning on by default)
    const font = sourceSans[0] as unknown as opentype.Font;
    for (const text of ['Coastal Spring', 'AVATAR Ty', 'Puffin Picnic']) {
      const { lines } = layoutLines({ content: text, sizePx: 120, letterSpacing: 0 }, sourceSans);
      expect(lines[0].width).toBeCloseTo(font.getAdvanceWidth(text, 120), 6);
    }
  });

  it('draws a straight line where opentype.js draws it', () => {
    // reference: opentype.js's Font.getPath for the same text, size and baseline
    const font = sourceSans[0] as unknown as opentype.Font;
    const style = { content: 'Lantern Walk', sizePx: 100, align: 'left' as const, letterSpacing: 0, arcDeg: 0 };
    const box = measureText(style, sourceSans);
    const ours = pathBounds(textOutlinePath(style, box, sourceSans));
    const baseline = box.height / 2 + ((font.ascender + font.descender) / 2 / font.unitsPerEm) * 100;
    const theirs = font.getPath('Lantern Walk', 0, baseline, 100).getBoundingBox();
    // our bounds come from the control points, theirs from the curves: equal for this text's
    // straight-sided and extremum-pointed outlines within a hundredth of a pixel of rounding
    expect(ours.minX).toBeCloseTo(theirs.x1, 1);
    expect(ours.maxX).toBeCloseTo(theirs.x2, 1);
    expect(ours.minY).toBeCloseTo(theirs.y1, 1);
    expect(ours.maxY).toBeCloseTo(theirs.y2, 1);
  });

  it('adds letter spacing between characters, not after the last', () => {
    const plain = layoutLines({ content: 'kite', sizePx: 100, letterSpacing: 0 }, sourceSans).lines[0].width;
    const spaced = layoutLines({ content: 'kite', sizePx: 100, letterSpacing: 100 }, sourceSans).lines[0].width;
    // 100 thousandths of a 100 px em = 10 px, three gaps between four letters
    expect(spaced - plain).toBeCloseTo(30, 6);
  });

  it('bends a line along a circle whose arc length is the line', () => {
    // circle geometry (any handbook): r = s / θ, chord = 2 r sin(θ / 2), sagitta = r (1 − cos(θ / 2));
    // worked by hand for s = 100, θ = 90°: r = 63.662, chord = 90.032, sagitta = 18.646
    expect(arcSagitta(100, 90)).toBeCloseTo(18.646, 3);
    const style = { content: 'Coastal Spring', sizePx: 80, align: 'centre' as const, letterSpacing: 0, arcDeg: 90 };
    const straight = measureText({ ...style, arcDeg: 0 }, sourceSans);
    const bent = measureText(style, sourceSans);
    const s = straight.width;
    const r = s / (Math.PI / 2);
    // the box is the chord of the circle through the glyphs' outer edges, one lean beyond the baseline
    expect(bent.width).toBeCloseTo(2 * (r + 80 * ARC_LEAN_EM) * Math.sin(Math.PI / 4), 6);
    expect(bent.height - straight.height).toBeCloseTo(r * (1 - Math.cos(Math.PI / 4)), 6);
    // bowed upwards: the middle of the drawing is higher than its ends
    const path = textOutlinePath(style, bent, sourceSans);
    const b = pathBounds(path);
    expect(b.maxX - b.minX).toBeLessThan(straight.width);
    const down = textOutlinePath({ ...style, arcDeg: -90 }, bent, sourceSans);
    expect(pathBounds(down).maxY).not.toBeCloseTo(b.maxY, 0);
  });

  it('keeps the ink of bent text inside its box, whichever way and however far it bends', () => {
    // the outline's points (on-curve and control points, which bound a Bézier curve) must stay in the box;
    // a tenth of an em is allowed at the sides for letters whose ink overhangs their advance, as it does in straight text
    for (const font of shippedFonts) {
      const stack = loadTestFontStack(font.id);
      for (const arcDeg of [-360, -200, -120, -45, 30, 90, 125, 180, 270, 360]) {
        for (const content of ['Coastal Spring', 'Puffin\nPicnic', 'gjpqy Ågf']) {
          const style = { content, sizePx: 100, align: 'centre' as const, letterSpacing: 0, arcDeg };
          const box = measureText(style, stack);
          const b = pathBounds(textOutlinePath(style, box, stack));
          const where = `${font.id} ${arcDeg}° ${JSON.stringify(content)}`;
          expect(b.minX, where).toBeGreaterThanOrEqual(-10);
          expect(b.maxX, where).toBeLessThanOrEqual(box.width + 10);
        }
      }
    }
  });

  it('finds letters of Latin Extended in the second subset and names what no subset has', () => {
    const { missing } = layoutLines({ content: 'Łucja ☃', sizePx: 50, letterSpacing: 0 }, sourceSans);
    expect(missing).toEqual(['☃']);
  });

  it('ships every font it offers, each weight in both subsets', () => {
    for (const font of shippedFonts) {
      for (const weight of font.weights) expect(loadTestFontStack(`${font.id}-${weight}`)).toHaveLength(2);
    }
    expect(resolveFontId('source-sans-3-700')).toMatchObject({ weight: 700 });
    expect(resolveFontId('no-such-font').font.id).toBe('source-sans-3');
  });
});
