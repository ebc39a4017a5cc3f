import { describe, expect, it } from 'vitest';
import { createMotifPlacement, emptyLayout, type Layout } from '@shared/scene';
import { mug11oz } from '@shared/templates';
import { ProductEditor } from '../editor';
import { screenPoint, templateToScreen } from '../viewport';
import { SelectTool, type ToolHost } from './select-tool';
import { selectionHandles } from './handles';

const puffin = createMotifPlacement({ id: 'puffin', motifId: 'm-puffin', version: 1, naturalWidth: 400, naturalHeight: 600, x: 1000, y: 500, scale: 0.5 });
const kite = createMotifPlacement({ id: 'kite', motifId: 'm-kite', version: 1, naturalWidth: 200, naturalHeight: 200, x: 2000, y: 500 });
const layout: Layout = { ...emptyLayout, placements: [puffin, kite] };

function setUp() {
  // zoom 0.5, no pan: screen = template / 2
  const editor = new ProductEditor(mug11oz, layout, { zoom: 0.5, panX: 0, panY: 0 });
  const tool = new SelectTool(editor);
  const at = (x: number, y: number) => {
    const s = templateToScreen(editor.viewport, { x, y });
    return screenPoint(s.x, s.y);
  };
  return { editor, tool, at };
}

const none = { shift: false, alt: true }; // alt: no snapping, so the numbers stay hand-checkable

describe('select tool', () => {
  it('selects the placement under the pointer and drags it as one undo step', () => {
    const { editor, tool, at } = setUp();
    tool.pointerDown(at(1000, 500), none);
    expect(editor.selection).toEqual(['puffin']);
    for (let i = 1; i <= 5; i++) tool.pointerMove(at(1000 + 20 * i, 500 + 10 * i), none);
    expect(tool.state.name).toBe('translating');
    tool.pointerUp();
    expect(editor.layout.placements[0]).toMatchObject({ x: 1100, y: 550 });
    editor.undo();
    expect(editor.layout.placements[0]).toMatchObject({ x: 1000, y: 500 });
    expect(editor.getState().canUndo).toBe(false);
  });

  it('rolls a drag back to where it started when Escape is pressed', () => {
    const { editor, tool, at } = setUp();
    tool.pointerDown(at(1000, 500), none);
    tool.pointerMove(at(1300, 700), none);
    expect(editor.layout.placements[0].x).toBe(1300);
    expect(tool.cancel()).toBe(true);
    expect(tool.state.name).toBe('idle');
    expect(editor.layout.placements[0]).toMatchObject({ x: 1000, y: 500 });
    expect(editor.getState().canUndo).toBe(false);
  });

  it('treats a press without movement as a click, not a move', () => {
    const { editor, tool, at } = setUp();
    tool.pointerDown(at(1000, 500), none);
    tool.pointerMove({ ...at(1000, 500), x: at(1000, 500).x + 1 } as ReturnType<typeof at>, none);
    tool.pointerUp();
    expect(editor.layout).toBe(layout);
    expect(editor.getState().canUndo).toBe(false);
  });

  it('snaps a dragged placement onto the front centre line of the mug', () => {
    const { editor, tool, at } = setUp();
    const front = editor.geometry.frontCentreX!;
    tool.pointerDown(at(1000, 500), { shift: false, alt: false });
    // 4 template px short of the line is 2 screen px: within the 6 px snap distance
    tool.pointerMove(at(front - 4, 500), { shift: false, alt: false });
    expect(editor.layout.placements[0].x).toBeCloseTo(front, 6);
    expect(editor.getState().guides.some((g) => g.kind === 'front-centre')).toBe(true);
    tool.pointerUp();
    expect(editor.getState().guides).toEqual([]);
  });

  it('turns in 15° steps while Shift is held on the turn handle', () => {
    const { editor, tool, at } = setUp();
    editor.select(['puffin']);
    const rotate = selectionHandles(editor.selectionBounds()!, editor.viewport).find((h) => h.kind === 'rotate')!;
    tool.pointerDown(screenPoint(rotate.screen.x, rotate.screen.y), none);
    expect(tool.state.name).toBe('rotating');
    // the pointer goes round to the right of the centre: about +80° clockwise from straight up
    const c = templateToScreen(editor.viewport, { x: 1000, y: 500 });
    tool.pointerMove(screenPoint(c.x + 200, c.y - 35), { shift: true, alt: false });
    tool.pointerUp();
    expect(editor.layout.placements[0].rotationDeg).toBe(75);
  });

  it('scales about the centre from a corner handle', () => {
    const { editor, tool } = setUp();
    editor.select(['puffin']);
    const se = selectionHandles(editor.selectionBounds()!, editor.viewport).find((h) => h.kind === 'scale-se')!;
    tool.pointerDown(screenPoint(se.screen.x, se.screen.y), none);
    const c = templateToScreen(editor.viewport, { x: 1000, y: 500 });
    // twice as far from the centre: twice the size
    tool.pointerMove(screenPoint(c.x + 2 * (se.screen.x - c.x), c.y + 2 * (se.screen.y - c.y)), none);
    tool.pointerUp();
    expect(editor.layout.placements[0]).toMatchObject({ x: 1000, y: 500 });
    expect((editor.layout.placements[0] as typeof puffin).scale).toBeCloseTo(1, 9);
  });

  it('snaps the dragged corner’s edge while scaling and shows the guide', () => {
    const { editor, tool, at } = setUp();
    editor.select(['puffin']);
    // the puffin is 200 × 300 about (1000, 500); dragged to ×2.74 its right edge would sit at 1274,
    // 1 px from the front centre (within 6 screen px = 12 template px at zoom 0.5): it lands at ×2.75
    tool.pointerDown(at(1100, 650), { shift: false, alt: false });
    tool.pointerMove(at(1000 + 2.74 * 100, 500 + 2.74 * 150), { shift: false, alt: false });
    expect(editor.getState().guides.map((g) => [g.axis, g.position])).toContainEqual(['x', 1275]);
    tool.pointerUp();
    expect((editor.layout.placements[0] as typeof puffin).scale).toBeCloseTo(0.5 * 2.75, 9);
    expect(editor.getState().guides).toEqual([]);
  });

  it('selects every placement a marquee touches', () => {
    const { editor, tool, at } = setUp();
    tool.pointerDown(at(500, 100), none);
    tool.pointerMove(at(2200, 900), none);
    expect(editor.getState().marquee).not.toBeNull();
    tool.pointerUp();
    expect([...editor.selection].sort()).toEqual(['kite', 'puffin']);
    expect(editor.getState().marquee).toBeNull();
    expect(editor.getState().canUndo).toBe(false);
  });

  it('drives any host through the same gesture calls: one begin, many previews, one commit', () => {
    const calls: string[] = [];
    let selection: readonly string[] = [];
    const real = new ProductEditor(mug11oz, layout, { zoom: 1, panX: 0, panY: 0 });
    const fake: ToolHost = {
      get layout() { return layout; },
      get selection() { return selection; },
      viewport: { zoom: 1, panX: 0, panY: 0 },
      geometry: real.geometry,
      select: (ids) => { selection = ids; },
      toggleSelected: () => {},
      selectionBounds: () => (selection.length ? { x: 900, y: 350, width: 200, height: 300 } : null),
      beginGesture: () => { calls.push('begin'); return layout; },
      previewGesture: () => { calls.push('preview'); },
      commitGesture: () => { calls.push('commit'); },
      cancelGesture: () => { calls.push('cancel'); },
    };
    const tool = new SelectTool(fake);
    tool.pointerDown(screenPoint(1000, 500), none);
    tool.pointerMove(screenPoint(1010, 500), none);
    tool.pointerMove(screenPoint(1020, 500), none);
    tool.pointerUp();
    expect(calls).toEqual(['begin', 'preview', 'preview', 'commit']);
  });
});
