import { z } from 'zod';

export const lengthUnitSchema = z.enum(['in', 'mm']);
export type LengthUnit = z.infer<typeof lengthUnitSchema>;

// Exact by definition: the international inch of 1959 is 25.4 mm.
export const MM_PER_INCH = 25.4;
// PostScript/PDF point: 1/72 in (ISO 32000-1 §8.3.2.1); text sizes are given in these.
export const POINTS_PER_INCH = 72;

export const inchesToPixels = (inches: number, dpi: number): number => inches * dpi;
export const mmToPixels = (mm: number, dpi: number): number => (mm / MM_PER_INCH) * dpi;

export function toPixels(value: number, unit: LengthUnit, dpi: number): number {
  return unit === 'in' ? inchesToPixels(value, dpi) : mmToPixels(value, dpi);
}

export function toInches(value: number, unit: LengthUnit): number {
  return unit === 'in' ? value : value / MM_PER_INCH;
}

export const pixelsToInches = (px: number, dpi: number): number => px / dpi;
export const pointsToPixels = (pt: number, dpi: number): number => (pt / POINTS_PER_INCH) * dpi;
export const pixelsToPoints = (px: number, dpi: number): number => (px / dpi) * POINTS_PER_INCH;

/**
 * Whole pixels for a side of a print file: nearest, halves round up. Float noise below 1e-6 px is
 * ignored, so 4.25 in at 150 dpi entered as 107.95 mm (637.49999… px) still gives 638.
 */
export function wholePixels(px: number): number {
  return Math.floor(px + 0.5 + 1e-6);
}
