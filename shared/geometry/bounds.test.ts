import { describe, expect, it } from 'vitest';
import { pointInTransformedRect, rectContains, rectsIntersect, transformedBounds, unionRects } from './bounds';
import { identity, placementMatrix, scale } from './matrix';

const motif = { x: 500, y: 300, width: 200, height: 100, scale: 1, rotationDeg: 0, flipX: false, flipY: false };

describe('bounds of placed motifs', () => {
  it('gives the box of an unrotated motif', () => {
    expect(transformedBounds(placementMatrix(motif), 200, 100)).toEqual({ x: 400, y: 250, width: 200, height: 100 });
  });

  it('grows the box of a motif turned 45°', () => {
    // half-diagonal extents: (100 + 50)·cos45 each way
    const r = transformedBounds(placementMatrix({ ...motif, rotationDeg: 45 }), 200, 100);
    const half = 150 * Math.SQRT1_2;
    expect(r.x).toBeCloseTo(500 - half, 9);
    expect(r.y).toBeCloseTo(300 - half, 9);
    expect(r.width).toBeCloseTo(2 * half, 9);
    expect(r.height).toBeCloseTo(2 * half, 9);
  });

  it('tells overlapping rects from ones that only touch', () => {
    const a = { x: 0, y: 0, width: 10, height: 10 };
    expect(rectsIntersect(a, { x: 5, y: 5, width: 10, height: 10 })).toBe(true);
    expect(rectsIntersect(a, { x: 10, y: 0, width: 5, height: 5 })).toBe(false);
    expect(rectsIntersect(a, { x: 2, y: 20, width: 5, height: 5 })).toBe(false);
  });

  it('checks containment of points and rects, edges included', () => {
    const printArea = { x: 0, y: 0, width: 100, height: 50 };
    expect(rectContains(printArea, { x: 100, y: 50 })).toBe(true);
    expect(rectContains(printArea, { x: 100.01, y: 10 })).toBe(false);
    expect(rectContains(printArea, { x: 10, y: 10, width: 90, height: 40 })).toBe(true);
    expect(rectContains(printArea, { x: 10, y: 10, width: 91, height: 40 })).toBe(false);
  });

  it('unions rects given as a pair or a list', () => {
    const a = { x: 0, y: 0, width: 10, height: 10 };
    const b = { x: -5, y: 20, width: 5, height: 5 };
    expect(unionRects(a, b)).toEqual({ x: -5, y: 0, width: 15, height: 25 });
    expect(unionRects([a, b, { x: 30, y: 1, width: 1, height: 1 }])).toEqual({ x: -5, y: 0, width: 36, height: 25 });
    expect(unionRects([])).toBeNull();
  });
});

describe('hit-testing a placed motif', () => {
  const turned = placementMatrix({ ...motif, rotationDeg: 45 });

  it('hits points on the turned motif and misses the empty corners of its box', () => {
    expect(pointInTransformedRect(turned, 200, 100, { x: 500, y: 300 })).toBe(true);
    // inside the axis-aligned box but outside the turned motif
    const box = transformedBounds(turned, 200, 100);
    expect(pointInTransformedRect(turned, 200, 100, { x: box.x + 2, y: box.y + 2 })).toBe(false);
    expect(pointInTransformedRect(turned, 200, 100, { x: 0, y: 0 })).toBe(false);
  });

  it('counts the motif’s edges as inside', () => {
    expect(pointInTransformedRect(identity, 200, 100, { x: 200, y: 100 })).toBe(true);
    expect(pointInTransformedRect(identity, 200, 100, { x: 200.001, y: 50 })).toBe(false);
  });

  it('never hits a motif scaled to nothing', () => {
    expect(pointInTransformedRect(scale(0), 200, 100, { x: 0, y: 0 })).toBe(false);
  });
});
