// The few things text layout needs from a font; opentype.js's Font and Glyph have this shape, so
// the browser and the server pass their parsed fonts straight in.

export type OutlineCommand =
  | { type: 'M'; x: number; y: number }
  | { type: 'L'; x: number; y: number }
  | { type: 'C'; x1: number; y1: number; x2: number; y2: number; x: number; y: number }
  | { type: 'Q'; x1: number; y1: number; x: number; y: number }
  | { type: 'Z' };

export interface OutlineGlyph {
  /** In font units. */
  advanceWidth?: number;
  /** The outline with its origin (left end of the baseline) at (x, y), y downwards, at fontSize px per em. */
  getPath(x: number, y: number, fontSize: number): { commands: OutlineCommand[] };
}

export interface OutlineFont {
  unitsPerEm: number;
  ascender: number;
  descender: number;
  /** 0 when the font has no glyph for the character (.notdef). */
  charToGlyphIndex(c: string): number;
  charToGlyph(c: string): OutlineGlyph;
  getKerningValue(left: OutlineGlyph, right: OutlineGlyph): number;
}

/**
 * One typeface as shipped: its subsets (Latin, then Latin Extended) searched in order for each
 * character, so a name like "Łucja" finds its letter in the second file.
 */
export type FontStack = readonly OutlineFont[];

export function glyphFor(stack: FontStack, char: string): { font: OutlineFont; glyph: OutlineGlyph; missing: boolean } {
  for (const font of stack) {
    if (font.charToGlyphIndex(char) > 0) return { font, glyph: font.charToGlyph(char), missing: false };
  }
  const font = stack[0];
  return { font, glyph: font.charToGlyph(char), missing: true };
}
