import { pointsToPixels } from '@shared/templates';
import { createTextPlacement, type TextPlacement } from '@shared/scene';
import type { Vec } from '@shared/geometry';
import { resolveFontId, shippedFonts } from '@shared/text/shipped-fonts';
import { arcBoxWidth, arcSagitta, layoutLines } from '@shared/text/text-layout';
import { fontCache } from './render/font-cache';

/** Width in px of one line at `sizePx`, without letter spacing. */
export type MeasureLine = (line: string, sizePx: number) => number;

// Line height 1.2 em: common practice for display text.
export const LINE_HEIGHT_EM = 1.2;

/**
 * The text's box in template px: the widest line plus its letter spacing, one line height per
 * line; bent along an arc, the chord through the glyphs' outer edges and the arc's sagitta on top (as the print lays it out).
 */
export function measureTextBox(content: string, sizePx: number, letterSpacingThousandths: number, measure: MeasureLine, arcDeg = 0): { width: number; height: number } {
  const lines = (content || ' ').split('\n');
  const spacing = (letterSpacingThousandths / 1000) * sizePx;
  const widest = Math.max(...lines.map((l) => measure(l, sizePx) + spacing * Math.max(0, [...l].length - 1)));
  return { width: Math.max(sizePx * 0.5, arcBoxWidth(widest, arcDeg, sizePx)), height: lines.length * sizePx * LINE_HEIGHT_EM + arcSagitta(widest, arcDeg) };
}

let measuringContext: CanvasRenderingContext2D | null = null;

/** A measure for one font: its glyph outlines once loaded (as the print file lays them out), the page's font until then. */
export function measureFor(fontId: string): MeasureLine {
  return (line, sizePx) => {
    const stack = fontCache.get(fontId);
    if (stack) return layoutLines({ content: line, sizePx, letterSpacing: 0 }, stack).lines[0].width;
    measuringContext ??= typeof document === 'undefined' ? null : document.createElement('canvas').getContext('2d');
    if (!measuringContext) return line.length * sizePx * 0.5;
    measuringContext.font = `${sizePx}px "${resolveFontId(fontId).font.name}", sans-serif`;
    return measuringContext.measureText(line).width;
  };
}

export const measureWithCanvas: MeasureLine = measureFor('source-sans-3');

/** The same text with its box measured again after a change of content, size, spacing or arc. */
export function remeasured(p: TextPlacement, dpi: number, measure: MeasureLine = measureFor(p.fontId)): TextPlacement {
  const box = measureTextBox(p.content, pointsToPixels(p.sizePt, dpi), p.letterSpacing, measure, p.arcDeg);
  return box.width === p.boxWidth && box.height === p.boxHeight ? p : { ...p, boxWidth: box.width, boxHeight: box.height };
}

export const SHIPPED_FONTS = shippedFonts.map((f) => ({ id: f.id, name: `${f.name} (${f.character})` }));

export function newTextPlacement(at: Vec, dpi: number, measure: MeasureLine = measureWithCanvas, id: string = globalThis.crypto.randomUUID()): TextPlacement {
  const content = 'Coastal Spring';
  const sizePt = 36;
  const box = measureTextBox(content, pointsToPixels(sizePt, dpi), 0, measure);
  return createTextPlacement({ id, content, fontId: SHIPPED_FONTS[0].id, sizePt, boxWidth: box.width, boxHeight: box.height, x: at.x, y: at.y });
}
