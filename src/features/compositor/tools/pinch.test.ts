import { describe, expect, it } from 'vitest';
import { MAX_ZOOM, screenToTemplate } from '../viewport';
import { pinchViewport, TouchPinch } from './pinch';

describe('two-finger pinch on the canvas', () => {
  const start = { viewport: { zoom: 0.5, panX: 100, panY: 50 }, a: { x: 200, y: 200 }, b: { x: 400, y: 200 } };

  it('zooms by the change in the fingers’ spread about their midpoint', () => {
    // worked by hand: midpoint (300, 200) is template ((300 − 100) / 0.5, (200 − 50) / 0.5) = (400, 300);
    // the spread grows from 200 to 400 px, so zoom 0.5 → 1; the new midpoint (350, 250) must show
    // (400, 300): pan = (350 − 400 × 1, 250 − 300 × 1) = (−50, −50)
    const v = pinchViewport(start, { x: 150, y: 250 }, { x: 550, y: 250 });
    expect(v.zoom).toBeCloseTo(1, 12);
    expect(v.panX).toBeCloseTo(-50, 9);
    expect(v.panY).toBeCloseTo(-50, 9);
  });

  it('pans with the fingers when their spread stays the same', () => {
    // both fingers 30 px right and 20 px up: same zoom, pan moves by (30, −20) to (130, 30)
    const v = pinchViewport(start, { x: 230, y: 180 }, { x: 430, y: 180 });
    expect(v).toEqual({ zoom: 0.5, panX: 130, panY: 30 });
  });

  it('measures the spread along any direction (a turned pinch keeps its zoom)', () => {
    // the pair turned 90° about its midpoint: spread still 200 px, so nothing changes
    const v = pinchViewport(start, { x: 300, y: 100 }, { x: 300, y: 300 });
    expect(v.zoom).toBeCloseTo(0.5, 12);
    expect(v.panX).toBeCloseTo(100, 9);
    expect(v.panY).toBeCloseTo(50, 9);
  });

  it('stops at the zoom limit and still keeps the midpoint’s template point under it', () => {
    const v = pinchViewport(start, { x: -10_000, y: 200 }, { x: 10_600, y: 200 });
    expect(v.zoom).toBe(MAX_ZOOM);
    const under = screenToTemplate(v, { x: 300, y: 200 });
    expect(under.x).toBeCloseTo(400, 9);
    expect(under.y).toBeCloseTo(300, 9);
  });

  it('hands the first finger to the tool and the second to the pinch until all fingers lift', () => {
    const pinch = new TouchPinch();
    expect(pinch.down(1, { x: 200, y: 200 }, start.viewport)).toBe('tool');
    expect(pinch.move(1, { x: 210, y: 200 })).toBeNull();
    expect(pinch.down(2, { x: 410, y: 200 }, start.viewport)).toBe('pinch');
    expect(pinch.active).toBe(true);
    // spread 200 → 400 from the pinch's own start (210 and 410)
    expect(pinch.move(2, { x: 610, y: 200 })?.zoom).toBeCloseTo(1, 12);
    pinch.up(2);
    expect(pinch.move(1, { x: 100, y: 100 })).toBeNull();
    expect(pinch.active).toBe(true);
    pinch.up(1);
    expect(pinch.active).toBe(false);
    expect(pinch.down(3, { x: 0, y: 0 }, start.viewport)).toBe('tool');
  });
});
