import { byteToLinear, type Rgb } from './srgb';

// WCAG 2.x "relative luminance": Rec. 709 luma weights on linearised sRGB.
export function relativeLuminance(c: Rgb): number {
  return 0.2126 * byteToLinear(c.r) + 0.7152 * byteToLinear(c.g) + 0.0722 * byteToLinear(c.b);
}

// WCAG 2.x "contrast ratio": (L1 + 0.05) / (L2 + 0.05), lighter over darker, 1..21.
export function contrastRatio(a: Rgb, b: Rgb): number {
  const la = relativeLuminance(a);
  const lb = relativeLuminance(b);
  return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
}

// WCAG 2.2 SC 1.4.3 (AA), 1.4.6 (AAA) and 1.4.11 (non-text, AA) thresholds.
export const WCAG_THRESHOLDS = {
  aaNormalText: 4.5,
  aaLargeText: 3,
  aaaNormalText: 7,
  aaaLargeText: 4.5,
  nonTextGraphics: 3,
} as const;
