import { describe, expect, it } from 'vitest';
import { mug11oz, templateGeometry } from '../templates';
import { snapScale } from './snap-scale';
import { snapTargets } from './snapping';
import { layoutOf, motif } from './test-support/fixtures';

const mug = templateGeometry(mug11oz); // 2550 x 1050, front centre at 1275, safe area 75 in from the edges
const empty = snapTargets(layoutOf(), mug);

describe('snapping while scaling from a corner', () => {
  it('brings the dragged corner’s right edge onto the front centre', () => {
    // worked by hand: centre (1100, 450), half width 100; at ×1.76 the right edge is at 1276,
    // 1 px from the front centre 1275, so the factor becomes (1275 − 1100) / 100 = 1.75
    const r = snapScale({ x: 1000, y: 400, width: 200, height: 100 }, 1.76, { x: 1, y: 1 }, empty, 8);
    expect(r.factor).toBeCloseTo(1.75, 12);
    expect(r.guides.map((g) => [g.axis, g.kind, g.position])).toEqual([
      ['x', 'print-area-centre', 1275],
      ['x', 'front-centre', 1275],
    ]);
  });

  it('snaps the top-left corner’s left edge to the safe area, the nearer of its two edges', () => {
    // centre (200, 150): at ×1.3 left = 70 (5 from the safe edge 75), top = 85 (10 from 75, beyond 8);
    // left on 75 needs (200 − 75) / 100 = 1.25
    const r = snapScale({ x: 100, y: 100, width: 200, height: 100 }, 1.3, { x: -1, y: -1 }, empty, 8);
    expect(r.factor).toBeCloseTo(1.25, 12);
    expect(r.guides).toEqual([{ axis: 'x', position: 75, kind: 'safe-edge', from: 75, to: 975 }]);
  });

  it('snaps to another placement’s edge on the y axis when that is nearer', () => {
    // the puffin spans y 275..325; centre (900, 200), half height 50: at ×2.48 bottom = 324, 1 from 325
    // (right = 900 + 248 = 1148, nowhere near a line), so the factor becomes (325 − 200) / 50 = 2.5
    const targets = snapTargets(layoutOf(motif({ id: 'puffin', x: 500, y: 300 })), mug);
    const r = snapScale({ x: 800, y: 150, width: 200, height: 100 }, 2.48, { x: 1, y: 1 }, targets, 8);
    expect(r.factor).toBeCloseTo(2.5, 12);
    expect(r.guides).toContainEqual(expect.objectContaining({ axis: 'y', position: 325, kind: 'placement-edge', placementId: 'puffin' }));
  });

  it('leaves the factor alone with no line within reach, and never turns the box inside out', () => {
    // at ×1.9: right 1290 (15 from 1275), bottom 545 (20 from the print area's middle 525)
    const r = snapScale({ x: 1000, y: 400, width: 200, height: 100 }, 1.9, { x: 1, y: 1 }, empty, 8);
    expect(r).toEqual({ factor: 1.9, guides: [] });
    // shrunk almost to nothing, the nearest "line" (its own centre side) would need a factor ≤ 0
    const tiny = snapScale({ x: 1225, y: 400, width: 100, height: 100 }, 0.02, { x: -1, y: 1 }, empty, 8);
    expect(tiny.factor).toBeGreaterThan(0);
  });
});
