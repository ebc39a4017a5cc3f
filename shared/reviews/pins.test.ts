import { describe, expect, it } from 'vitest';
import { anchorLabel, nudgePreviewPoint, pinNumbers, pinOnView, previewPointFromClick, previewViewsFor } from './pins';

describe('pin placement on a preview image', () => {
  const image = { left: 100, top: 50, width: 400, height: 200 };

  it('turns a click into a share of the image’s width and height', () => {
    expect(previewPointFromClick(200, 100, image)).toEqual({ x: 0.25, y: 0.25 });
    expect(previewPointFromClick(500, 250, image)).toEqual({ x: 1, y: 1 });
  });

  it('keeps a click on the image’s edge on the image, and rounds to four decimals', () => {
    expect(previewPointFromClick(90, 260, image)).toEqual({ x: 0, y: 1 });
    expect(previewPointFromClick(100 + 400 / 3, 50, image)).toEqual({ x: 0.3333, y: 0 });
  });

  it('places nothing on an image that has no size yet', () => {
    expect(previewPointFromClick(10, 10, { left: 0, top: 0, width: 0, height: 0 })).toBeNull();
  });

  it('nudges a keyboard pin and stops at the edges', () => {
    expect(nudgePreviewPoint({ x: 0.5, y: 0.5 }, 0.02, -0.02)).toEqual({ x: 0.52, y: 0.48 });
    expect(nudgePreviewPoint({ x: 0.99, y: 0.01 }, 0.02, -0.02)).toEqual({ x: 1, y: 0 });
  });

  it('shows a pin only on the view it was placed on', () => {
    const anchor = { surface: 'preview' as const, view: 'back' as const, x: 0.1, y: 0.75 };
    expect(pinOnView(anchor, 'back')).toEqual({ leftPercent: 10, topPercent: 75 });
    expect(pinOnView(anchor, 'front')).toBeNull();
    expect(pinOnView({ surface: 'layout', x: 10, y: 20 }, 'back')).toBeNull();
    expect(pinOnView(null, 'flat')).toBeNull();
  });

  it('numbers pins in the order threads were opened', () => {
    const numbers = pinNumbers([
      { id: 'b', createdAt: '2026-03-02T10:00:00.000Z' },
      { id: 'a', createdAt: '2026-03-01T10:00:00.000Z' },
      { id: 'c', createdAt: '2026-03-02T10:00:00.000Z' },
    ]);
    expect([...numbers.entries()]).toEqual([['a', 1], ['b', 2], ['c', 3]]);
  });

  it('knows a wrap’s four views and a flat product’s one', () => {
    expect(previewViewsFor({ wrap: { circumference: 1 } })).toEqual(['front', 'handle-right', 'back', 'handle-left']);
    expect(previewViewsFor({ wrap: null })).toEqual(['flat']);
  });

  it('says in words where a thread is pinned', () => {
    expect(anchorLabel(null)).toBe('General comment');
    expect(anchorLabel({ surface: 'preview', view: 'front', x: 0.426, y: 0.3 })).toBe('On the front preview, 43 % across, 30 % down');
    expect(anchorLabel({ surface: 'layout', x: 1200.4, y: 399.6 })).toBe('On the layout at 1200 × 400 px');
  });
});
