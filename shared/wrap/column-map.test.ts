import { describe, expect, it } from 'vitest';
import { mug11oz, templateGeometry } from '../templates';
import { wrapCylinder } from './cylinder';
import { wrapToCylinder } from './column-map';

const cyl = wrapCylinder(templateGeometry(mug11oz))!; // r = 487.5 px, front centre at strip x 1275

describe('column map of a wrap preview', () => {
  it('samples the strip through x = r·sin(s/r) for each output column', () => {
    const map = wrapToCylinder(cyl, 'front', { outputWidth: 975 }); // one column per template pixel of the diameter
    expect(map.scale).toBe(1);
    // column 768's centre is u = 281 px from the axis: s = r·asin(u/r) (elementary geometry)
    expect(map.sourceX[768]).toBeCloseTo(1275 + 487.5 * Math.asin(281 / 487.5), 9);
    expect(map.sourceX[487]).toBeCloseTo(1275, 9); // u = 0: the front centre
    // symmetric about the axis
    expect(map.sourceX[0] - 1275).toBeCloseTo(-(map.sourceX[974] - 1275), 9);
  });

  it('shades columns brighter in the middle and down to the ambient level at the edge', () => {
    const map = wrapToCylinder(cyl, 'front', { outputWidth: 975, ambient: 0.3 });
    expect(map.shade[487]).toBeCloseTo(1, 5);
    expect(map.shade[0]).toBeLessThan(0.4);
    expect(map.shade[0]).toBeGreaterThanOrEqual(0.3);
    expect(map.shade[200]).toBeLessThan(map.shade[400]);
  });

  it('marks the unprinted gap around the handle with -1 in the back view', () => {
    const map = wrapToCylinder(cyl, 'back', { outputWidth: 400 });
    expect(map.sourceX[200]).toBe(-1); // looking straight at the handle: the gap between the strip's ends
    // the gap is C − W = 513.05 px of arc centred on the handle: it covers |u| < r·sin(256.53/r) = 244.8 px
    const gapHalfWidth = 487.5 * Math.sin((Math.PI * 3.25 * 300 - 2550) / 2 / 487.5);
    const expectedPrinted = Array.from({ length: 400 }, (_, i) => ((i + 0.5) / 400) * 975 - 487.5).filter((u) => Math.abs(u) > gapHalfWidth).length;
    const printed = Array.from(map.sourceX).filter((x) => x >= 0);
    expect(printed.length).toBe(expectedPrinted);
    expect(expectedPrinted).toBeGreaterThan(190);
    expect(printed.every((x) => x <= 2550)).toBe(true);
  });
});
