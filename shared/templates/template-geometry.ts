import type { Rect } from '../geometry';
import type { KeepOut, PhysicalRect, Template, TemplateVariant, BlankColours } from './template-schema';
import { toPixels, wholePixels } from './units';

export type PixelSize = { width: number; height: number };

/**
 * The print file's exact pixel size: trim plus bleed on both sides, converted at the template's
 * DPI, then rounded to the nearest whole pixel (halves up; see wholePixels).
 */
export function templatePixelSize(t: Template): PixelSize {
  return {
    width: wholePixels(toPixels(t.size.width + 2 * t.bleed, t.unit, t.dpi)),
    height: wholePixels(toPixels(t.size.height + 2 * t.bleed, t.unit, t.dpi)),
  };
}

export type KeepOutPx = { id: string; label: string; reason: KeepOut['reason']; rect: Rect };

export type WrapGeometry = {
  radiusPx: number;
  circumferencePx: number;
  heightPx: number;
  /** Strip x (template px) of the handle's centre line; may lie in the unprinted gap. */
  handleX: number;
  seamX: number;
  /** The point opposite the handle, brought to the representative nearest the strip's middle. */
  frontCentreX: number;
};

/** All in template pixels of the print file (origin at its top-left); rects are exact, not rounded. */
export type TemplateGeometry = {
  size: PixelSize;
  pxPerUnit: number;
  trim: Rect;
  bleedRect: Rect;
  safeRect: Rect;
  printArea: Rect;
  keepOuts: KeepOutPx[];
  seamX: number | null;
  frontCentreX: number | null;
  wrap: WrapGeometry | null;
};

export function templateGeometry(t: Template): TemplateGeometry {
  const size = templatePixelSize(t);
  const pxPerUnit = toPixels(1, t.unit, t.dpi);
  const trimWidth = t.size.width * pxPerUnit;
  const trimHeight = t.size.height * pxPerUnit;
  // Centred, so the half pixel lost or gained by rounding the file size is shared by both edges.
  const trim: Rect = { x: (size.width - trimWidth) / 2, y: (size.height - trimHeight) / 2, width: trimWidth, height: trimHeight };
  const fromTrim = (r: PhysicalRect): Rect => ({
    x: trim.x + r.x * pxPerUnit,
    y: trim.y + r.y * pxPerUnit,
    width: r.width * pxPerUnit,
    height: r.height * pxPerUnit,
  });
  const safe = t.safeMargin * pxPerUnit;
  const bleedRect: Rect = { x: 0, y: 0, width: size.width, height: size.height };
  const wrap = t.wrap ? wrapGeometry(t, trim.x, pxPerUnit, trimWidth) : null;
  return {
    size,
    pxPerUnit,
    trim,
    bleedRect,
    safeRect: { x: trim.x + safe, y: trim.y + safe, width: trimWidth - 2 * safe, height: trimHeight - 2 * safe },
    printArea: t.printArea ? fromTrim(t.printArea) : bleedRect,
    keepOuts: t.keepOuts.map((k) => ({ id: k.id, label: k.label, reason: k.reason, rect: fromTrim(k.rect) })),
    seamX: wrap?.seamX ?? null,
    frontCentreX: wrap?.frontCentreX ?? null,
    wrap,
  };
}

function wrapGeometry(t: Template, trimX: number, pxPerUnit: number, trimWidth: number): WrapGeometry {
  const spec = t.wrap!;
  const circumferencePx = Math.PI * spec.diameter * pxPerUnit;
  const handleX = trimX + spec.handleX * pxPerUnit;
  const opposite = handleX + circumferencePx / 2;
  const middle = trimX + trimWidth / 2;
  return {
    radiusPx: (spec.diameter * pxPerUnit) / 2,
    circumferencePx,
    heightPx: spec.height * pxPerUnit,
    handleX,
    seamX: trimX + spec.seamX * pxPerUnit,
    frontCentreX: opposite - circumferencePx * Math.round((opposite - middle) / circumferencePx),
  };
}

/** The blank's colours with a variant's overrides applied; unknown variant ids fall back to the plain blank. */
/** The variant's coating hides the print (a heat-changing blank while cold): the design is not seen on it. */
export const printHiddenOn = (t: Template, variantId: string | null | undefined): boolean => t.variants.some((v) => v.id === variantId && v.hidesPrint === true);

export function blankColoursOf(t: Template, variantId?: string | null): BlankColours {
  const variant: TemplateVariant | undefined = t.variants.find((v) => v.id === variantId);
  return variant ? { ...t.blank, ...variant.blank } : t.blank;
}
