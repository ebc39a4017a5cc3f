import { describe, expect, it } from 'vitest';
import { pointInTransformedRect } from '../geometry';
import { hitTest } from './hit-test';
import { templatePoint } from './placement-base';
import { placementToTemplate } from './placement';
import { createScene } from './layout';
import { layoutOf, motif, repeat, sceneOf } from './test-support/fixtures';

// All motifs here are 100 x 50 px, centred at (500, 300) unless said otherwise.
describe('hit-testing', () => {
  it('misses a point inside a 45° placement’s bounds but outside its rotated box', () => {
    const scene = sceneOf(motif({ rotationDeg: 45 }));
    // (45, 45) from the centre: inside the bounds (half-size 53.0) but 63.6 px along the artwork's x axis
    expect(hitTest(scene, templatePoint(545, 345))).toBeNull();
    const hit = hitTest(scene, templatePoint(530, 300));
    expect(hit?.placement.id).toBe('puffin');
    expect(hit!.local.x).toBeCloseTo(50 + 30 * Math.SQRT1_2, 9);
    expect(hit!.local.y).toBeCloseTo(25 - 30 * Math.SQRT1_2, 9);
  });

  it('agrees with the geometry module’s exact box test', () => {
    const p = motif({ rotationDeg: 30, scale: 1.7, flipY: true });
    const scene = sceneOf(p);
    const ours: boolean[] = [];
    const reference: boolean[] = [];
    for (let x = 380; x <= 620; x += 12) {
      for (let y = 200; y <= 400; y += 12) {
        ours.push(hitTest(scene, templatePoint(x, y)) !== null);
        reference.push(pointInTransformedRect(placementToTemplate(p), 100, 50, { x, y }));
      }
    }
    expect(ours).toEqual(reference);
    expect(ours.filter(Boolean).length).toBeGreaterThan(20); // the grid really crosses the placement
  });

  it('reports the local point of a flipped placement mirrored', () => {
    expect(hitTest(sceneOf(motif()), templatePoint(540, 300))?.local).toEqual({ x: 90, y: 25 });
    expect(hitTest(sceneOf(motif({ flipX: true })), templatePoint(540, 300))?.local).toEqual({ x: 10, y: 25 });
  });

  it('returns the topmost visible placement, passing hidden ones and, if asked, locked ones', () => {
    const scene = sceneOf(motif({ id: 'bottom' }), motif({ id: 'middle', locked: true }), motif({ id: 'top', hidden: true }));
    expect(hitTest(scene, templatePoint(500, 300))?.placement.id).toBe('middle');
    expect(hitTest(scene, templatePoint(500, 300), { skipLocked: true })?.placement.id).toBe('bottom');
    expect(hitTest(scene, templatePoint(700, 300))).toBeNull();
  });

  it('selects a placement by its mirrored copy when the layout is mirrored', () => {
    const scene = createScene({ ...layoutOf(motif()), mirror: true });
    expect(hitTest(scene, templatePoint(2050, 300), { mirrorAxisX: 1275 })).toMatchObject({ placement: { id: 'puffin' }, role: 'mirror' });
    expect(hitTest(scene, templatePoint(2050, 300))).toBeNull(); // no axis given: copies are not known
  });

  it('hits a repeat’s tiles but not the gaps between them, half-drop included', () => {
    // 100 px tiles, 20 px apart: column 1 spans x 120..220
    const straight = sceneOf(repeat({ spacingX: 20, spacingY: 20 }));
    expect(hitTest(straight, templatePoint(110, 50))).toBeNull();
    expect(hitTest(straight, templatePoint(170, 50))).toMatchObject({ role: 'tile', local: { x: 50, y: 50 } });
    // half-drop: column 1 drops by 60, so its tiles span y -60..40 and 60..160
    const dropped = sceneOf(repeat({ spacingX: 20, spacingY: 20, halfDrop: true }));
    expect(hitTest(dropped, templatePoint(170, 50))).toBeNull();
    expect(hitTest(dropped, templatePoint(170, 65))?.local).toEqual({ x: 50, y: 5 });
    expect(hitTest(dropped, templatePoint(170, 65), { repeatArea: { x: 0, y: 0, width: 150, height: 150 } })).toBeNull();
  });
});
