import { describe, expect, it } from 'vitest';
import { degrees, normaliseDegrees, radians, toDegrees, toRadians } from './angle';

describe('angles', () => {
  it('converts a quarter turn between degrees and radians', () => {
    expect(toRadians(degrees(90))).toBeCloseTo(Math.PI / 2, 15);
    expect(toDegrees(radians(Math.PI))).toBeCloseTo(180, 12);
    expect(toDegrees(toRadians(degrees(-33.5)))).toBeCloseTo(-33.5, 12);
  });

  it('normalises any rotation into 0 up to 360 degrees', () => {
    expect(normaliseDegrees(360)).toBe(0);
    expect(normaliseDegrees(-90)).toBe(270);
    expect(normaliseDegrees(725)).toBe(5);
    expect(normaliseDegrees(-720)).toBe(0);
    expect(Object.is(normaliseDegrees(-0), 0)).toBe(true);
    expect(normaliseDegrees(359.5)).toBe(359.5);
  });

  it('keeps degrees and radians apart at compile time', () => {
    // @ts-expect-error degrees are not radians
    const wrong: Parameters<typeof toDegrees>[0] = degrees(90);
    expect(wrong).toBe(90);
  });
});
