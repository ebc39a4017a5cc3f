import { describe, expect, it, vi } from 'vitest';
import { addPlacement, createMotifPlacement, emptyLayout, movePlacements } from '@shared/scene';
import { mug11oz } from '@shared/templates';
import { PANEL_CATCH_UP_MS, ProductEditor } from './editor';

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

  it('tells the canvas of every frame of a pointer drag and the panels at most every 100 ms and at its end', () => {
    vi.useFakeTimers();
    try {
      const editor = new ProductEditor(mug11oz, { ...emptyLayout, placements: [puffin] });
      const panelSaw: number[] = [];
      let frames = 0;
      editor.subscribe(() => panelSaw.push(editor.layout.placements[0].x));
      editor.subscribeFrames(() => frames++);
      editor.beginGesture('pointer');
      for (let i = 1; i <= 12; i++) {
        editor.previewGesture((l) => movePlacements(l, ['puffin'], { x: i, y: 0 }));
        vi.advanceTimersByTime(20);
      }
      expect(frames).toBe(12);
      // a move every 20 ms for 240 ms: the panels caught up twice, each time with the latest position
      expect(panelSaw).toEqual([1005, 1010]);
      editor.commitGesture();
      expect(panelSaw.at(-1)).toBe(1012);
      expect(panelSaw).toHaveLength(3);
      vi.advanceTimersByTime(PANEL_CATCH_UP_MS * 2);
      expect(panelSaw).toHaveLength(3);
    } finally {
      vi.useRealTimers();
    }
  });

  it('tells the panels at once during a gesture driven by a field, whose input shows the value', () => {
    const editor = new ProductEditor(mug11oz, { ...emptyLayout, placements: [puffin] });
    let panels = 0;
    editor.subscribe(() => panels++);
    editor.beginGesture();
    editor.previewGesture((l) => movePlacements(l, ['puffin'], { x: 5, y: 0 }));
    editor.previewGesture((l) => movePlacements(l, ['puffin'], { x: 6, y: 0 }));
    expect(panels).toBe(2);
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
