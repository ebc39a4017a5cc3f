import { describe, expect, it } from 'vitest';
import { fitViewport, MAX_ZOOM, screenRectToTemplate, screenToTemplate, templateToScreen, zoomAbout, zoomStep } from './viewport';

describe('viewport maths', () => {
  const v = { zoom: 0.25, panX: 40, panY: 30 };

  it('maps screen points to template pixels and back', () => {
    const t = screenToTemplate(v, { x: 140, y: 80 });
    // worked by hand: (140 − 40) / 0.25 = 400, (80 − 30) / 0.25 = 200
    expect(t).toEqual({ x: 400, y: 200 });
    expect(templateToScreen(v, t)).toEqual({ x: 140, y: 80 });
  });

  it('keeps the point under the pointer still while zooming', () => {
    const anchor = { x: 300, y: 220 };
    const before = screenToTemplate(v, anchor);
    const zoomed = zoomAbout(v, 1.7, anchor);
    const after = screenToTemplate(zoomed, anchor);
    expect(zoomed.zoom).toBe(1.7);
    expect(after.x).toBeCloseTo(before.x, 9);
    expect(after.y).toBeCloseTo(before.y, 9);
  });

  it('never zooms past its limits', () => {
    let z = v;
    for (let i = 0; i < 100; i++) z = zoomStep(z, 'in', { x: 0, y: 0 });
    expect(z.zoom).toBe(MAX_ZOOM);
  });

  it('fits an 11 oz wrap print file into the canvas, centred, with the margin kept', () => {
    // 8.5 + 2 × bleed… here simply a 2625 × 1125 px file (8.75 × 3.75 in at 300 DPI)
    const content = { x: 0, y: 0, width: 2625, height: 1125 };
    const screen = { width: 1000, height: 600 };
    const f = fitViewport(content, screen, 40);
    // width-bound: (1000 − 80) / 2625
    expect(f.zoom).toBeCloseTo(920 / 2625, 9);
    const tl = templateToScreen(f, { x: 0, y: 0 });
    const br = templateToScreen(f, { x: 2625, y: 1125 });
    expect(tl.x).toBeCloseTo(40, 6);
    expect(br.x).toBeCloseTo(960, 6);
    expect((tl.y + br.y) / 2).toBeCloseTo(300, 6);
  });

  it('turns a marquee dragged right-to-left into a rect with positive size', () => {
    const r = screenRectToTemplate(v, { x: 140, y: 80 }, { x: 40, y: 30 });
    expect(r).toEqual({ x: 0, y: 0, width: 400, height: 200 });
  });
});
