import { describe, expect, it } from 'vitest';
import { mug11oz, templateGeometry } from '../templates';
import { snapMove, snapTargets } from './snapping';
import { layoutOf, motif } from './test-support/fixtures';

const mug = templateGeometry(mug11oz); // 2550 x 1050, front centre at 1275, safe area 75 in from the edges

describe('snapping a moving placement', () => {
  it('snaps the box’s centre to the mug’s front centre and draws both guides there', () => {
    const targets = snapTargets(layoutOf(), mug);
    const r = snapMove({ x: 1170, y: 500, width: 200, height: 100 }, targets, 8);
    expect(r.dx).toBe(5);
    expect(r.dy).toBe(0);
    expect(r.guides.map((g) => [g.axis, g.kind, g.position])).toEqual([
      ['x', 'print-area-centre', 1275],
      ['x', 'front-centre', 1275],
    ]);
  });

  it('snaps to the safe area edge on the other axis at the same time', () => {
    const r = snapMove({ x: 1000, y: 80, width: 200, height: 100 }, snapTargets(layoutOf(), mug), 8);
    expect([r.dx, r.dy]).toEqual([0, -5]);
    expect(r.guides).toEqual([{ axis: 'y', position: 75, kind: 'safe-edge', from: 75, to: 2475 }]);
  });

  it('snaps to another placement’s edge, with the guide spanning both boxes, and never to itself', () => {
    const layout = layoutOf(motif({ id: 'puffin', x: 500, y: 300 }), motif({ id: 'moving', x: 900, y: 700 })); // puffin 450..550 x 275..325
    const targets = snapTargets(layout, mug, ['moving']);
    expect(targets.x.some((l) => l.placementId === 'moving')).toBe(false);
    const r = snapMove({ x: 553, y: 700, width: 100, height: 50 }, targets, 8);
    expect(r.dx).toBe(-3);
    expect(r.guides).toContainEqual({ axis: 'x', position: 550, kind: 'placement-edge', placementId: 'puffin', from: 275, to: 750 });
  });

  it('takes the nearest line and leaves the box alone beyond the threshold', () => {
    const targets = snapTargets(layoutOf(motif({ x: 500, y: 300 })), mug);
    expect(snapMove({ x: 560, y: 600, width: 100, height: 50 }, targets, 8).dx).toBe(0); // 10 px from 550
    // left 446 is 4 from 450, right 552 is 2 from 550, centre 499 is 1 from the puffin's centre 500
    expect(snapMove({ x: 446, y: 600, width: 106, height: 50 }, targets, 8)).toMatchObject({ dx: 1, guides: [{ kind: 'placement-centre', position: 500 }] });
    expect(snapMove({ x: 560, y: 600, width: 100, height: 50 }, targets, 8).guides).toEqual([]);
  });
});
