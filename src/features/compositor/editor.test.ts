import { describe, expect, it } from 'vitest';
import { addPlacement, createMotifPlacement, emptyLayout, movePlacements } from '@shared/scene';
import { mug11oz } from '@shared/templates';
import { ProductEditor } from './editor';

const puffin = createMotifPlacement({ id: 'puffin', motifId: 'm-puffin', version: 1, naturalWidth: 400, naturalHeight: 600, x: 1000, y: 500 });

describe('product editor', () => {
  it('records one undo step per change and tells subscribers', () => {
    const editor = new ProductEditor(mug11oz, emptyLayout);
    let calls = 0;
    editor.subscribe(() => calls++);
    editor.change((l) => addPlacement(l, puffin), ['puffin']);
    expect(editor.selection).toEqual(['puffin']);
    expect(calls).toBeGreaterThan(0);
    editor.undo();
    expect(editor.layout.placements).toHaveLength(0);
    expect(editor.selection).toEqual([]);
    editor.redo();
    expect(editor.layout.placements).toHaveLength(1);
  });

  it('gives every frame of a gesture a new scene version, and the committed layout only at the end', () => {
    const editor = new ProductEditor(mug11oz, { ...emptyLayout, placements: [puffin] });
    const committed = editor.getState().committedLayout;
    const versions = new Set<number>();
    editor.beginGesture();
    for (let i = 1; i <= 4; i++) {
      editor.previewGesture((l) => movePlacements(l, ['puffin'], { x: i * 10, y: 0 }));
      versions.add(editor.scene.sceneVersion);
    }
    expect(versions.size).toBe(4);
    expect(editor.getState().committedLayout).toBe(committed);
    editor.commitGesture();
    expect(editor.getState().committedLayout.placements[0].x).toBe(1040);
  });

  it('keeps at least 100 undo steps', () => {
    const editor = new ProductEditor(mug11oz, { ...emptyLayout, placements: [puffin] });
    for (let i = 0; i < 150; i++) editor.change((l) => movePlacements(l, ['puffin'], { x: 1, y: 0 }));
    let steps = 0;
    while (editor.getState().canUndo) {
      editor.undo();
      steps++;
    }
    expect(steps).toBe(150);
    expect(editor.layout.placements[0].x).toBe(1000);
  });

  it('fits the whole print file into the screen', () => {
    const editor = new ProductEditor(mug11oz, emptyLayout);
    editor.fit({ width: 1000, height: 600 });
    const { zoom, panX } = editor.viewport;
    const fileWidth = editor.geometry.size.width;
    expect(panX + (fileWidth * zoom) / 2).toBeCloseTo(500, 6);
    expect(fileWidth * zoom).toBeLessThanOrEqual(1000 - 80 + 1e-9);
  });
});
