import type { Affine } from '../geometry';
import { glyphFor, type FontStack, type OutlineCommand, type OutlineFont, type OutlineGlyph } from './outline-font';

// Line height 1.2 em: common practice for display text.
export const LINE_HEIGHT_EM = 1.2;

export type TextStyle = {
  content: string;
  sizePx: number;
  align: 'left' | 'centre' | 'right';
  /** Thousandths of an em added after every character but the last of a line. */
  letterSpacing: number;
  /** The angle the baseline bends through; positive bows the middle upwards. */
  arcDeg: number;
};

type PlacedGlyph = { font: OutlineFont; glyph: OutlineGlyph; x: number; advance: number };
type Line = { glyphs: PlacedGlyph[]; width: number };

export type LaidOutText = {
  lines: Line[];
  width: number;
  height: number;
  /** Characters no shipped subset has (drawn as the font's empty box). */
  missing: string[];
};

/** Pen positions of every glyph, line by line, with kerning and letter spacing, before any bending. */
export function layoutLines(style: Pick<TextStyle, 'content' | 'sizePx' | 'letterSpacing'>, stack: FontStack): { lines: Line[]; missing: string[] } {
  const spacing = (style.letterSpacing / 1000) * style.sizePx;
  const missing = new Set<string>();
  const lines = (style.content || ' ').split('\n').map((text) => {
    const chars = [...text];
    const glyphs: PlacedGlyph[] = [];
    let pen = 0;
    chars.forEach((char, i) => {
      const found = glyphFor(stack, char);
      if (found.missing && char.trim()) missing.add(char);
      const scale = style.sizePx / found.font.unitsPerEm;
      const prev = glyphs[glyphs.length - 1];
      // kerning only between glyphs of the same subset file
      if (prev && prev.font === found.font) pen += found.font.getKerningValue(prev.glyph, found.glyph) * scale;
      const advance = (found.glyph.advanceWidth ?? 0) * scale;
      glyphs.push({ font: found.font, glyph: found.glyph, x: pen, advance });
      pen += advance + (i < chars.length - 1 ? spacing : 0);
    });
    return { glyphs, width: pen };
  });
  return { lines, missing: [...missing] };
}

const radians = (deg: number) => (deg * Math.PI) / 180;

/** How far the ends of a line of this width drop (or rise) when bent through arcDeg: the arc's sagitta. */
export function arcSagitta(width: number, arcDeg: number): number {
  const angle = Math.abs(radians(arcDeg));
  if (angle < 1e-6 || width <= 0) return 0;
  const r = width / angle;
  // beyond half a turn the ends curl back past the middle; the drop is then the full diameter at most
  return r * (1 - Math.cos(Math.min(angle / 2, Math.PI)));
}

/** The box the laid-out text needs: its widest line, one line height per line, plus the bend. */
export function measureText(style: TextStyle, stack: FontStack): LaidOutText {
  const { lines, missing } = layoutLines(style, stack);
  const widest = Math.max(...lines.map((l) => l.width));
  const width = Math.max(style.sizePx * 0.5, arcBoxWidth(widest, style.arcDeg, style.sizePx));
  const height = lines.length * style.sizePx * LINE_HEIGHT_EM + arcSagitta(widest, style.arcDeg);
  return { lines, width, height, missing };
}

/**
 * How far a glyph may reach out from its baseline, in em, away from the circle's centre: one
 * line height, which the tallest accented capital or deepest swash of the fonts we ship stays under.
 */
export const ARC_LEAN_EM = 1.2;

/**
 * The width a bent line's ink needs: the glyphs at its ends turn outwards, so the box is the
 * chord of the circle through their outer edges, not of the baseline (a full diameter once the
 * ends turn past upright).
 */
export function arcBoxWidth(width: number, arcDeg: number, sizePx: number): number {
  const angle = Math.abs(radians(arcDeg));
  if (angle < 1e-6 || width <= 0) return width;
  const outer = width / angle + sizePx * ARC_LEAN_EM;
  return 2 * outer * Math.sin(Math.min(angle / 2, Math.PI / 2));
}

function transformCommands(commands: OutlineCommand[], m: Affine, out: string[]): void {
  const [a, b, c, d, e, f] = m;
  const px = (x: number, y: number) => `${round(a * x + c * y + e)} ${round(b * x + d * y + f)}`;
  for (const cmd of commands) {
    if (cmd.type === 'M') out.push(`M${px(cmd.x, cmd.y)}`);
    else if (cmd.type === 'L') out.push(`L${px(cmd.x, cmd.y)}`);
    else if (cmd.type === 'Q') out.push(`Q${px(cmd.x1, cmd.y1)} ${px(cmd.x, cmd.y)}`);
    else if (cmd.type === 'C') out.push(`C${px(cmd.x1, cmd.y1)} ${px(cmd.x2, cmd.y2)} ${px(cmd.x, cmd.y)}`);
    else out.push('Z');
  }
}

const round = (n: number) => Math.round(n * 100) / 100;

/**
 * The text as one SVG path (outline data) in its own box's pixels, the same on the editor's
 * canvas (Path2D) and in the print file (librsvg): lines 1.2 em apart and centred in the box as
 * a block, each line's em-box middle on its line, aligned in the box; bent lines follow a
 * circular arc whose length is the line's width, each glyph turned to the arc's tangent.
 */
export function textOutlinePath(style: TextStyle, box: { width: number; height: number }, stack: FontStack): string {
  const { lines } = layoutLines(style, stack);
  const lineHeight = style.sizePx * LINE_HEIGHT_EM;
  const font = stack[0];
  const middleToBaseline = ((font.ascender + font.descender) / 2 / font.unitsPerEm) * style.sizePx;
  const angle = radians(style.arcDeg);
  const bent = Math.abs(angle) >= 1e-6;
  const widest = Math.max(...lines.map((l) => l.width));
  const sag = bent ? arcSagitta(widest, style.arcDeg) : 0;
  const sign = angle > 0 ? 1 : -1;
  // the bend takes `sag` of the box's height; the straight block sits in the rest
  const top = box.height / 2 - ((lines.length - 1) * lineHeight) / 2 - (bent ? (sign * sag) / 2 : 0);
  const out: string[] = [];
  lines.forEach((line, i) => {
    const baseline = top + i * lineHeight + middleToBaseline;
    if (!bent) {
      const x0 = style.align === 'left' ? 0 : style.align === 'right' ? box.width - line.width : (box.width - line.width) / 2;
      for (const g of line.glyphs) transformCommands(g.glyph.getPath(0, 0, style.sizePx).commands, [1, 0, 0, 1, x0 + g.x, baseline], out);
      return;
    }
    const r = line.width / Math.abs(angle);
    const chord = arcBoxWidth(line.width, style.arcDeg, style.sizePx);
    const mid = style.align === 'left' ? chord / 2 : style.align === 'right' ? box.width - chord / 2 : box.width / 2;
    for (const g of line.glyphs) {
      // arc length from the line's middle to this glyph's centre, as an angle
      const theta = (g.x + g.advance / 2 - line.width / 2) / r;
      const x = mid + r * Math.sin(theta);
      const y = baseline + sign * r * (1 - Math.cos(theta));
      const turn = sign * theta;
      const cos = Math.cos(turn);
      const sin = Math.sin(turn);
      // turn about the glyph's baseline centre: T(x, y) · R(turn) · T(-advance / 2, 0)
      const m: Affine = [cos, sin, -sin, cos, x - cos * (g.advance / 2), y - sin * (g.advance / 2)];
      transformCommands(g.glyph.getPath(0, 0, style.sizePx).commands, m, out);
    }
  });
  return out.join('');
}
