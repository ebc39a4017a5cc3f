import type { Placement } from './placement';

/**
 * Motif pixels per inch at the placed size, the lower of the two axes (rotation does not change
 * it). Text is drawn from outlines and has no pixel resolution: null. `motifPixels` is the motif
 * version's real pixel size when it differs from the size saved in the placement.
 */
export function effectivePpi(p: Placement, template: { readonly dpi: number }, motifPixels?: { width: number; height: number }): number | null {
  if (p.type === 'text') return null;
  const stretchY = p.type === 'motif' ? p.stretchY : 1;
  const placedWidthIn = (p.naturalWidth * p.scale) / template.dpi;
  const placedHeightIn = (p.naturalHeight * p.scale * stretchY) / template.dpi;
  const width = motifPixels?.width ?? p.naturalWidth;
  const height = motifPixels?.height ?? p.naturalHeight;
  return Math.min(width / placedWidthIn, height / placedHeightIn);
}
