import { describe, expect, it } from 'vitest';
import { inchesToPixels, mmToPixels, pointsToPixels, toInches, toPixels, wholePixels } from './units';

describe('units', () => {
  it('turns inches and millimetres into pixels at a DPI', () => {
    expect(inchesToPixels(8.5, 300)).toBe(2550);
    expect(mmToPixels(25.4, 300)).toBeCloseTo(300, 12); // 1 in = 25.4 mm exactly
    expect(toPixels(210, 'mm', 300)).toBeCloseTo(2480.315, 3);
    expect(toPixels(3, 'in', 150)).toBe(450);
    expect(toInches(127, 'mm')).toBeCloseTo(5, 12);
  });

  it('gives a text size in points as template pixels', () => {
    // 1 pt = 1/72 in (ISO 32000-1 §8.3.2.1): 72 pt at 300 dpi is one inch
    expect(pointsToPixels(72, 300)).toBe(300);
    expect(pointsToPixels(8, 300)).toBeCloseTo(33.333, 3);
  });

  it('rounds a print file side to the nearest pixel with halves up, ignoring float noise', () => {
    expect(wholePixels(2480.3149)).toBe(2480);
    expect(wholePixels(1818.9)).toBe(1819);
    expect(wholePixels(637.5)).toBe(638);
    expect(wholePixels(mmToPixels(107.95, 150))).toBe(638); // 637.4999… in floats
  });
});
