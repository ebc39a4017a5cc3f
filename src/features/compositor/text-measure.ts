import { pointsToPixels } from '@shared/templates';
import { createTextPlacement, type TextPlacement } from '@shared/scene';
import type { Vec } from '@shared/geometry';
import { TEXT_FONT_FAMILY } from './render/draw-scene';

/** Width in px of one line at `sizePx`, without letter spacing. */
export type MeasureLine = (line: string, sizePx: number) => number;

// Line height 1.2 em: common practice for display text.
export const LINE_HEIGHT_EM = 1.2;

/** The text's box in template px: the widest line plus its letter spacing, and one line height per line. */
export function measureTextBox(content: string, sizePx: number, letterSpacingThousandths: number, measure: MeasureLine): { width: number; height: number } {
  const lines = (content || ' ').split('\n');
  const spacing = (letterSpacingThousandths / 1000) * sizePx;
  const width = Math.max(...lines.map((l) => measure(l, sizePx) + spacing * Math.max(0, [...l].length - 1)));
  return { width: Math.max(sizePx * 0.5, width), height: lines.length * sizePx * LINE_HEIGHT_EM };
}

let measuringContext: CanvasRenderingContext2D | null = null;

/** Measures with the browser's copy of the shipped font (outlines from opentype.js are a later step). */
export const measureWithCanvas: MeasureLine = (line, sizePx) => {
  measuringContext ??= typeof document === 'undefined' ? null : document.createElement('canvas').getContext('2d');
  if (!measuringContext) return line.length * sizePx * 0.5;
  measuringContext.font = `${sizePx}px ${TEXT_FONT_FAMILY}`;
  return measuringContext.measureText(line).width;
};

/** The same text with its box measured again after a change of content, size or spacing. */
export function remeasured(p: TextPlacement, dpi: number, measure: MeasureLine = measureWithCanvas): TextPlacement {
  const box = measureTextBox(p.content, pointsToPixels(p.sizePt, dpi), p.letterSpacing, measure);
  return box.width === p.boxWidth && box.height === p.boxHeight ? p : { ...p, boxWidth: box.width, boxHeight: box.height };
}

export const SHIPPED_FONTS = [{ id: 'source-sans-3', name: 'Source Sans 3' }] as const;

export function newTextPlacement(at: Vec, dpi: number, measure: MeasureLine = measureWithCanvas, id: string = globalThis.crypto.randomUUID()): TextPlacement {
  const content = 'Coastal Spring';
  const sizePt = 36;
  const box = measureTextBox(content, pointsToPixels(sizePt, dpi), 0, measure);
  return createTextPlacement({ id, content, fontId: SHIPPED_FONTS[0].id, sizePt, boxWidth: box.width, boxHeight: box.height, x: at.x, y: at.y });
}
