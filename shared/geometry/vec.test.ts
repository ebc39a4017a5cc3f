import { describe, expect, it } from 'vitest';
import { radians } from './angle';
import { add, distance, dot, length, lerp, rotate, scale, sub } from './vec';

describe('vectors', () => {
  it('adds, subtracts and scales', () => {
    expect(add({ x: 1, y: 2 }, { x: 3, y: -5 })).toEqual({ x: 4, y: -3 });
    expect(sub({ x: 1, y: 2 }, { x: 3, y: -5 })).toEqual({ x: -2, y: 7 });
    expect(scale({ x: 1.5, y: -2 }, 2)).toEqual({ x: 3, y: -4 });
    expect(dot({ x: 2, y: 3 }, { x: 4, y: -1 })).toBe(5);
  });

  it('measures a 3-4-5 triangle', () => {
    expect(length({ x: 3, y: 4 })).toBe(5);
    expect(distance({ x: 1, y: 1 }, { x: 4, y: 5 })).toBe(5);
  });

  it('rotates a quarter turn clockwise on screen (y down)', () => {
    const turned = rotate({ x: 1, y: 0 }, radians(Math.PI / 2));
    expect(turned.x).toBeCloseTo(0, 15);
    expect(turned.y).toBeCloseTo(1, 15);
    expect(length(rotate({ x: 3, y: 4 }, radians(1.234)))).toBeCloseTo(5, 12);
  });

  it('interpolates between two points', () => {
    expect(lerp({ x: 0, y: 10 }, { x: 10, y: 20 }, 0.25)).toEqual({ x: 2.5, y: 12.5 });
    expect(lerp({ x: 0, y: 10 }, { x: 10, y: 20 }, 1)).toEqual({ x: 10, y: 20 });
  });
});
