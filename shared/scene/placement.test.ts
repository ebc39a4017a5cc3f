import { describe, expect, it } from 'vitest';
import { applyToPoint } from '../geometry';
import { isMotifPlacement, isRepeatPlacement, isTextPlacement, placementBounds, placementKinds, placementSchema, placementToTemplate } from './placement';
import { motif, repeat, text } from './test-support/fixtures';

describe('placement kinds', () => {
  it('fills each kind’s defaults, with the aspect locked', () => {
    const p = motif();
    expect(p).toMatchObject({ scale: 1, stretchY: 1, aspectLocked: true, rotationDeg: 0, opacity: 1, blendMode: 'normal', locked: false, hidden: false, recolour: { kind: 'none' } });
    expect(text()).toMatchObject({ align: 'centre', letterSpacing: 0, arcDeg: 0, isQuote: false, quoteSource: '' });
    expect(repeat()).toMatchObject({ spacingX: 0, spacingY: 0, halfDrop: false });
    expect(placementKinds.motif.flags.aspectLockDefault).toBe(true);
    expect(placementKinds.text.flags.hasPixels).toBe(false);
  });

  it('tells the kinds apart with one guard each', () => {
    expect([motif(), text(), repeat()].map((p) => [isMotifPlacement(p), isTextPlacement(p), isRepeatPlacement(p)])).toEqual([
      [true, false, false],
      [false, true, false],
      [false, false, true],
    ]);
  });

  it('refuses an unknown kind, an opacity above 1 and a blend mode outside the list', () => {
    expect(placementSchema.safeParse({ ...motif(), type: 'sticker' }).success).toBe(false);
    expect(placementSchema.safeParse({ ...motif(), opacity: 1.5 }).success).toBe(false);
    expect(placementSchema.safeParse({ ...motif(), blendMode: 'dissolve' }).success).toBe(false);
    expect(placementSchema.safeParse({ ...text(), colour: 'blue' }).success).toBe(false);
  });

  it('maps a 100 x 50 motif at scale 2 turned 90° clockwise about its centre (500, 300)', () => {
    const p = motif({ scale: 2, rotationDeg: 90 });
    const m = placementToTemplate(p);
    // top-left (0,0) is (-100,-50) from the centre at scale 2; 90° clockwise takes (x,y) to (-y,x)
    const topLeft = applyToPoint(m, { x: 0, y: 0 });
    expect(topLeft.x).toBeCloseTo(550, 9);
    expect(topLeft.y).toBeCloseTo(200, 9);
    const b = placementBounds(p);
    expect([b.x, b.y, b.width, b.height].map((v) => Math.round(v * 1e9) / 1e9)).toEqual([450, 200, 100, 200]);
  });

  it('stretches a motif vertically when its aspect is unlocked, keeping the centre', () => {
    const b = placementBounds(motif({ scale: 2, stretchY: 1.5, aspectLocked: false }));
    expect(b).toEqual({ x: 400, y: 225, width: 200, height: 150 });
  });

  it('mirrors a flipped motif in its own axes', () => {
    const m = placementToTemplate(motif({ flipX: true }));
    expect(applyToPoint(m, { x: 0, y: 0 })).toEqual({ x: 550, y: 275 }); // left edge of the artwork lands on the right
  });
});
