import { describe, expect, it } from 'vitest';
import { movePlacements, renderPlan } from '@shared/scene';
import { layoutOf, motif, sceneOf, smallCard } from '@shared/scene/test-support/fixtures';
import { movedPlacementIds, splitAroundMoved } from './still-layers';

const three = () => layoutOf(motif({ id: 'kite', x: 100, y: 100 }), motif({ id: 'puffin', x: 200, y: 100 }), motif({ id: 'basket', x: 300, y: 100 }));

describe('still layers of a gesture', () => {
  it('names the placements a drag moved, and only those', () => {
    const snapshot = three();
    const dragged = movePlacements(snapshot, ['puffin'], { x: 40, y: 0 });
    expect([...movedPlacementIds(snapshot, dragged)!]).toEqual(['puffin']);
    expect(movedPlacementIds(snapshot, snapshot)!.size).toBe(0);
  });

  it('gives up when placements were added, removed or reordered, so the frame is drawn in full', () => {
    const snapshot = three();
    expect(movedPlacementIds(snapshot, { ...snapshot, placements: snapshot.placements.slice(1) })).toBeNull();
    expect(movedPlacementIds(snapshot, { ...snapshot, placements: [...snapshot.placements].reverse() })).toBeNull();
    expect(movedPlacementIds(snapshot, { ...snapshot, mirror: !snapshot.mirror })).toBeNull();
  });

  it('splits the plan around the moved placement in the plan’s own order', () => {
    const ops = renderPlan(sceneOf(...three().placements), smallCard, { clip: 'none' }).ops;
    const split = splitAroundMoved(ops, new Set(['puffin']));
    expect(split.below.map((o) => o.placementId)).toEqual(['kite']);
    expect(split.live.map((o) => o.placementId)).toEqual(['puffin']);
    expect(split.above.map((o) => o.placementId)).toEqual(['basket']);
    // drawn in that order the three parts are the plan again
    expect([...split.below, ...split.live, ...split.above]).toEqual(ops);
  });

  it('draws a still placement caught between two moved ones each frame, keeping the order', () => {
    const ops = renderPlan(sceneOf(...three().placements), smallCard, { clip: 'none' }).ops;
    const split = splitAroundMoved(ops, new Set(['kite', 'basket']));
    expect(split.below).toEqual([]);
    expect(split.live.map((o) => o.placementId)).toEqual(['kite', 'puffin', 'basket']);
    expect(split.above).toEqual([]);
  });

  it('keeps everything still when nothing has moved yet', () => {
    const ops = renderPlan(sceneOf(...three().placements), smallCard, { clip: 'none' }).ops;
    expect(splitAroundMoved(ops, new Set())).toEqual({ below: ops, live: [], above: [] });
  });
});
