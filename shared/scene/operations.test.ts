import { describe, expect, it } from 'vitest';
import { updateScene } from './layout';
import {
  addPlacement, duplicatePlacements, flipPlacements, movePlacements, nudgePlacements, removePlacements,
  rotatePlacements, scalePlacements, setHidden, setLocked, snapRotation, stretchPlacements,
} from './operations';
import { layoutOf, motif, sceneOf, text } from './test-support/fixtures';

describe('scene updates', () => {
  it('bumps the scene version once per change and keeps it when nothing changed', () => {
    const scene = sceneOf(motif());
    const moved = updateScene(scene, (l) => movePlacements(l, ['puffin'], { x: 10, y: 0 }));
    expect(moved.sceneVersion).toBe(1);
    expect(moved.layout.placements[0].x).toBe(510);
    expect(updateScene(moved, (l) => movePlacements(l, ['nobody'], { x: 10, y: 0 }))).toBe(moved);
    expect(scene.layout.placements[0].x).toBe(500); // the earlier snapshot is untouched
  });

  it('shares untouched placements between snapshots', () => {
    const layout = layoutOf(motif(), motif({ id: 'kite' }));
    const next = movePlacements(layout, ['kite'], { x: 1, y: 1 });
    expect(next.placements[0]).toBe(layout.placements[0]);
    expect(next.placements[1]).not.toBe(layout.placements[1]);
  });

  it('adds at a z position and refuses a taken id', () => {
    const layout = addPlacement(layoutOf(motif()), motif({ id: 'kite' }), 0);
    expect(layout.placements.map((p) => p.id)).toEqual(['kite', 'puffin']);
    expect(() => addPlacement(layout, motif())).toThrow(expect.objectContaining({ code: 'scene.duplicate_id' }));
    expect(removePlacements(layout, ['kite']).placements.map((p) => p.id)).toEqual(['puffin']);
  });

  it('leaves locked placements where they are when moving, nudging, scaling or rotating', () => {
    const layout = layoutOf(motif({ locked: true }));
    expect(movePlacements(layout, ['puffin'], { x: 5, y: 5 })).toBe(layout);
    expect(nudgePlacements(layout, ['puffin'], 'left', 10)).toBe(layout);
    expect(scalePlacements(layout, ['puffin'], 2)).toBe(layout);
    expect(rotatePlacements(layout, ['puffin'], 15)).toBe(layout);
  });

  it('nudges a whole selection with the arrow keys', () => {
    const layout = nudgePlacements(layoutOf(motif(), motif({ id: 'kite', x: 0 })), ['puffin', 'kite'], 'up', 10);
    expect(layout.placements.map((p) => [p.x, p.y])).toEqual([[500, 290], [0, 290]]);
  });

  it('scales about the centre by default, and about a given point for a group', () => {
    const own = scalePlacements(layoutOf(motif({ scale: 0.5 })), ['puffin'], 3).placements[0];
    expect([own.x, own.y, own.type === 'motif' && own.scale]).toEqual([500, 300, 1.5]);
    const grouped = scalePlacements(layoutOf(motif()), ['puffin'], 2, { x: 400, y: 300 }).placements[0];
    expect([grouped.x, grouped.y]).toEqual([600, 300]); // 100 px from the pivot becomes 200
  });

  it('scales text by its point size and measured box, keeping it at print size', () => {
    const t = scalePlacements(layoutOf(text({ sizePt: 12 })), ['title'], 1.5).placements[0];
    expect(t).toMatchObject({ sizePt: 18, boxWidth: 600, boxHeight: 150 });
  });

  it('stretches only motifs whose aspect is unlocked', () => {
    const [locked, free] = stretchPlacements(layoutOf(motif(), motif({ id: 'kite', aspectLocked: false })), ['puffin', 'kite'], 2, 3).placements;
    expect(locked).toMatchObject({ scale: 1, stretchY: 1 });
    expect(free).toMatchObject({ scale: 2, stretchY: 1.5 }); // vertical 2 x 1.5 = 3
  });

  it('rotates clockwise in degrees, normalised, and about a pivot', () => {
    const [p] = rotatePlacements(layoutOf(motif({ rotationDeg: 350 })), ['puffin'], 20).placements;
    expect(p.rotationDeg).toBe(10);
    const [q] = rotatePlacements(layoutOf(motif({ x: 600, y: 300 })), ['puffin'], 90, { x: 500, y: 300 }).placements;
    expect(q.x).toBeCloseTo(500, 9); // +x turns to +y (clockwise on screen, y down)
    expect(q.y).toBeCloseTo(400, 9);
  });

  it('snaps rotation to 15° steps', () => {
    expect([22, 23, -7, 352, 353, 7.5].map((d) => snapRotation(d))).toEqual([15, 30, 0, 345, 0, 15]);
    expect(snapRotation(44, 45)).toBe(45);
  });

  it('flips, locks and hides without touching other fields', () => {
    const layout = layoutOf(motif());
    const flipped = flipPlacements(flipPlacements(layout, ['puffin'], 'horizontal'), ['puffin'], 'vertical').placements[0];
    expect([flipped.flipX, flipped.flipY, flipped.x]).toEqual([true, true, 500]);
    expect(setLocked(layout, ['puffin'], true).placements[0].locked).toBe(true);
    expect(setHidden(layout, ['puffin'], false)).toBe(layout);
  });

  it('duplicates the selection onto the top, offset, and returns the new ids', () => {
    let n = 0;
    const { layout, ids } = duplicatePlacements(layoutOf(motif(), text(), motif({ id: 'kite' })), ['kite', 'puffin'], { makeId: () => `copy-${++n}`, offset: { x: 30, y: 0 } });
    expect(ids).toEqual(['copy-1', 'copy-2']);
    expect(layout.placements.map((p) => `${p.id}@${p.x}`)).toEqual(['puffin@500', 'title@1000', 'kite@500', 'copy-1@530', 'copy-2@530']);
  });
});
