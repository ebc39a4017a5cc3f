import { describe, expect, it } from 'vitest';
import { createHistory } from './history';
import { updateScene } from './layout';
import { movePlacements } from './operations';
import { motif, sceneOf } from './test-support/fixtures';

const step = (scene: ReturnType<typeof sceneOf>, dx: number) => updateScene(scene, (l) => movePlacements(l, ['puffin'], { x: dx, y: 0 }));
const xOf = (scene: ReturnType<typeof sceneOf> | null) => scene?.layout.placements[0].x;

describe('undo history', () => {
  it('undoes and redoes one entry per gesture', () => {
    const h = createHistory(sceneOf(motif()));
    h.push(step(h.present, 10));
    h.push(step(h.present, 10));
    expect(xOf(h.present)).toBe(520);
    expect(xOf(h.undo())).toBe(510);
    expect(xOf(h.undo())).toBe(500);
    expect(h.undo()).toBeNull();
    expect(xOf(h.redo())).toBe(510);
    expect(h.canRedo).toBe(true);
  });

  it('drops the redo steps when a new change is pushed', () => {
    const h = createHistory(sceneOf(motif()));
    h.push(step(h.present, 10));
    h.undo();
    h.push(step(h.present, 50));
    expect(h.canRedo).toBe(false);
    expect(xOf(h.present)).toBe(550);
  });

  it('keeps at most `limit` steps', () => {
    const h = createHistory(sceneOf(motif()), 100);
    for (let i = 0; i < 150; i++) h.push(step(h.present, 1));
    let undos = 0;
    while (h.undo()) undos++;
    expect(undos).toBe(100);
    expect(xOf(h.present)).toBe(550);
  });

  it('only ever raises the scene version, even when undo brings back an earlier layout', () => {
    const h = createHistory(sceneOf(motif()));
    h.push(step(h.present, 10)); // version 1
    const undone = h.undo()!;
    expect(undone.sceneVersion).toBe(2);
    h.push(step(h.present, 30));
    expect(h.present.sceneVersion).toBe(3); // not 1 again: caches keyed by version stay right
  });

  it('records nothing for a push that did not change the layout', () => {
    const h = createHistory(sceneOf(motif()));
    h.push(step(h.present, 0));
    expect(h.canUndo).toBe(false);
  });
});
