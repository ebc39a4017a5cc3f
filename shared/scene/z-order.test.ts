import { describe, expect, it } from 'vitest';
import { layoutOf, motif } from './test-support/fixtures';
import { reorderPlacements } from './z-order';

const stack = layoutOf(...['a', 'b', 'c', 'd'].map((id) => motif({ id })));
const order = (move: Parameters<typeof reorderPlacements>[2], ids: string[]) => reorderPlacements(stack, ids, move).placements.map((p) => p.id).join('');

describe('z-order', () => {
  it('brings a selection forward or back one step, keeping its own order', () => {
    expect(order('forward', ['a', 'b'])).toBe('cabd');
    expect(order('backward', ['c', 'd'])).toBe('acdb');
    expect(order('forward', ['d'])).toBe('abcd');
  });

  it('brings a selection to the front or sends it to the back', () => {
    expect(order('front', ['a', 'c'])).toBe('bdac');
    expect(order('back', ['b', 'd'])).toBe('bdac');
  });

  it('returns the same layout when the order does not change', () => {
    expect(reorderPlacements(stack, ['a'], 'back')).toBe(stack);
  });
});
