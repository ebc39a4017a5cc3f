import { MM_PER_INCH } from '@shared/templates';
import type { Placement } from '@shared/scene';
import type { RulerUnit } from './overlay-settings';

/** The placed box's unrotated size in template px. */
export function placedSizePx(p: Placement): { width: number; height: number } {
  if (p.type === 'text') return { width: p.boxWidth, height: p.boxHeight };
  const stretchY = p.type === 'motif' ? p.stretchY : 1;
  return { width: p.naturalWidth * p.scale, height: p.naturalHeight * p.scale * stretchY };
}

export function pxToUnit(px: number, dpi: number, unit: RulerUnit): number {
  const inches = px / dpi;
  return unit === 'in' ? inches : inches * MM_PER_INCH;
}

export type PpiLevel = 'fine' | 'below-template' | 'too-low';

// 150 PPI: common practice as the least that prints acceptably at arm's length; the template's DPI is the target.
export const MIN_ACCEPTABLE_PPI = 150;

export function ppiLevel(ppi: number, templateDpi: number): PpiLevel {
  if (ppi < MIN_ACCEPTABLE_PPI) return 'too-low';
  // half a pixel per inch of rounding slack, so a motif placed at exactly 1:1 does not warn
  if (ppi < templateDpi - 0.5) return 'below-template';
  return 'fine';
}
