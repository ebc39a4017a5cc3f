import { describe, expect, it } from 'vitest';
import { mug11oz, templateGeometry } from '../templates';
import { wrapCylinder } from './cylinder';
import { handleInView, visibleStripRanges, type WrapView } from './wrap-views';

// 11 oz wrap: 2550 px strip, front centre 1275, C = 3063.05 px, so a quarter turn is 765.76 px.
const cyl = wrapCylinder(templateGeometry(mug11oz))!;
const quarter = (Math.PI * 3.25 * 300) / 4;
const ranges = (view: WrapView) => visibleStripRanges(cyl, view).map((r) => [Math.round(r.from * 100) / 100, Math.round(r.to * 100) / 100]);

describe('the four views of a mug', () => {
  it('shows the strip’s middle from the front and both ends, around the handle, from the back', () => {
    expect(ranges('front')).toEqual([[Math.round((1275 - quarter) * 100) / 100, Math.round((1275 + quarter) * 100) / 100]]);
    expect(ranges('back')).toEqual([
      [0, Math.round((1275 - quarter) * 100) / 100],
      [Math.round((1275 + quarter) * 100) / 100, 2550],
    ]);
  });

  it('shows one half of the strip from each handle side', () => {
    expect(ranges('handle-right')).toEqual([[1275, 2550]]);
    expect(ranges('handle-left')).toEqual([[0, 1275]]);
  });

  it('puts the handle beside the body on the named side, and behind it from the front', () => {
    expect(handleInView(cyl, 'handle-right')).toMatchObject({ side: 'right' });
    expect(handleInView(cyl, 'handle-right').x).toBeCloseTo(487.5, 9);
    expect(handleInView(cyl, 'handle-left').x).toBeCloseTo(-487.5, 9);
    expect(handleInView(cyl, 'front').side).toBe('behind');
    expect(handleInView(cyl, 'back').side).toBe('in-front');
  });
});
