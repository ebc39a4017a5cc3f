import { describe, expect, it } from 'vitest';
import { alignPlacements, distributePlacements, selectionBounds } from './align';
import { placementBounds } from './placement';
import { layoutOf, motif } from './test-support/fixtures';

// 100 x 50 motifs at scale 1: bounds are x-50..x+50, y-25..y+25.
const trio = layoutOf(motif({ id: 'a', x: 100, y: 100 }), motif({ id: 'b', x: 400, y: 200 }), motif({ id: 'c', x: 250, y: 160, scale: 2 }));

describe('align and distribute', () => {
  it('aligns left edges to the selection’s left edge', () => {
    const l = alignPlacements(trio, ['a', 'b', 'c'], 'left');
    expect(l.placements.map((p) => placementBounds(p).x)).toEqual([50, 50, 50]);
  });

  it('centres on the print area and leaves locked placements in place', () => {
    const layout = layoutOf(motif({ id: 'a', x: 100 }), motif({ id: 'b', x: 900, locked: true }));
    const l = alignPlacements(layout, ['a', 'b'], 'centre', { x: 0, y: 0, width: 2550, height: 1050 });
    expect(l.placements.map((p) => p.x)).toEqual([1275, 900]);
    expect(alignPlacements(layout, ['a'], 'bottom', { x: 0, y: 0, width: 2550, height: 1050 }).placements[0].y).toBe(1025);
  });

  it('aligns middles to the selection bounds, rotated placements by their rotated bounds', () => {
    const l = alignPlacements(layoutOf(motif({ id: 'a', y: 100 }), motif({ id: 'b', y: 300, rotationDeg: 90 })), ['a', 'b'], 'top');
    // b turned 90° is 50 wide and 100 tall: top 250; selection top is a's 75
    expect(l.placements.map((p) => Math.round(placementBounds(p).y))).toEqual([75, 75]);
    expect(l.placements[1].y).toBeCloseTo(125, 9);
  });

  it('distributes three placements with equal gaps, the outer two fixed', () => {
    // bounds: a 50..150, c 100..300 (scale 2, 100 tall), b 650..750
    const uneven = layoutOf(motif({ id: 'a', x: 100 }), motif({ id: 'b', x: 700 }), motif({ id: 'c', x: 200, scale: 2 }));
    const l = distributePlacements(uneven, ['a', 'b', 'c'], 'horizontal');
    // span 50..750 = 700, sizes 100 + 200 + 100 = 400, two gaps of 150: c from 300 to 500
    expect(l.placements.map((p) => p.x)).toEqual([100, 700, 400]);
    expect(selectionBounds(l, ['a', 'b', 'c'])).toEqual({ x: 50, y: 250, width: 700, height: 100 });
  });

  it('needs at least three placements to distribute', () => {
    const pair = layoutOf(motif({ id: 'a' }), motif({ id: 'b', x: 900 }));
    expect(distributePlacements(pair, ['a', 'b'], 'vertical')).toBe(pair);
  });
});
