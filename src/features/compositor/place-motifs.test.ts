import { describe, expect, it } from 'vitest';
import { placementBounds } from '@shared/scene';
import { mug11oz, templateGeometry } from '@shared/templates';
import { rectContains } from '@shared/geometry';
import { frontCentre, placementForMotif, placementsAsInOriginal, usualOriginalOf } from './place-motifs';
import { ppiLevel } from './placement-measures';

const g = templateGeometry(mug11oz);
let n = 0;
const ids = () => `p${++n}`;

describe('placing motifs', () => {
  it('places a motif at the front centre of the mug, never enlarged past its own pixels', () => {
    const p = placementForMotif({ id: 'puffin', version: 1, width: 369, height: 558 }, frontCentre(g), g, ids);
    expect(p.x).toBe(g.frontCentreX);
    expect(p.scale).toBe(1);
    expect(rectContains(g.printArea, placementBounds(p))).toBe(true);
  });

  it('shrinks a large motif so it lands whole inside the print area', () => {
    const p = placementForMotif({ id: 'wave', version: 1, width: 6000, height: 3000 }, frontCentre(g), g, ids);
    expect(p.scale).toBeLessThan(1);
    expect(rectContains(g.printArea, placementBounds(p))).toBe(true);
  });

  it('keeps the relative positions of an original’s motifs, leaving out hidden ones', () => {
    const ps = placementsAsInOriginal([
      { id: 'a', version: 1, width: 300, height: 600, offsetX: 100, offsetY: 200, hiddenInOriginal: false },
      { id: 'b', version: 2, width: 300, height: 600, offsetX: 900, offsetY: 200, hiddenInOriginal: false },
      { id: 'hidden', version: 1, width: 50, height: 50, offsetX: 0, offsetY: 0, hiddenInOriginal: true },
    ], g, ids);
    expect(ps.map((p) => p.motifId)).toEqual(['a', 'b']);
    // 800 px apart in the original, at the same scale on the mug
    expect(ps[1].x - ps[0].x).toBeCloseTo(800 * ps[0].scale, 9);
    expect(ps[0].y).toBe(ps[1].y);
    expect((ps[0].x + ps[1].x) / 2).toBeCloseTo(g.frontCentreX!, 9);
  });
});

describe('print resolution warning', () => {
  it('warns below the template DPI, and strongly below 150 PPI', () => {
    // 150 PPI: common practice floor for acceptable print; 300 DPI the template's target
    expect(ppiLevel(300, 300)).toBe('fine');
    expect(ppiLevel(240, 300)).toBe('below-template');
    expect(ppiLevel(149, 300)).toBe('too-low');
  });
});

describe('the original offered first in the tray', () => {
  it('is the one most placements were cut from', () => {
    expect(usualOriginalOf([
      { originalId: 'lanterns', placementIds: ['a'] },
      { originalId: 'puffins', placementIds: ['b', 'c'] },
      { originalId: 'lanterns', placementIds: [] },
    ])).toBe('puffins');
    expect(usualOriginalOf([{ originalId: 'puffins', placementIds: ['a'] }, { originalId: 'lanterns', placementIds: ['b'] }])).toBe('puffins');
    expect(usualOriginalOf([])).toBeUndefined();
  });
});
