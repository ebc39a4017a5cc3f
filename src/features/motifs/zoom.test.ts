import { describe, expect, it } from 'vitest';
import { fitZoom, nextZoom } from './zoom';

describe('motif preview zoom', () => {
  it('fits a large motif inside the box, keeping its proportions', () => {
    // A 1500 x 2100 px card in an 600 x 600 box: the height decides, 600 / 2100.
    expect(fitZoom(1500, 2100, 600, 600)).toBeCloseTo(600 / 2100, 6);
  });

  it('enlarges a small motif to fill the box, but at most four times', () => {
    expect(fitZoom(100, 50, 300, 300)).toBe(3);
    expect(fitZoom(20, 20, 600, 600)).toBe(4);
  });

  it('steps from an in-between zoom to the next step in each direction', () => {
    expect(nextZoom(0.2857, 'in')).toBe(0.5);
    expect(nextZoom(0.2857, 'out')).toBe(0.25);
    expect(nextZoom(1, 'in')).toBe(1.5);
    expect(nextZoom(1, 'out')).toBe(0.75);
  });

  it('stops at the smallest and largest zoom', () => {
    expect(nextZoom(16, 'in')).toBe(16);
    expect(nextZoom(0.05, 'out')).toBe(0.05);
  });
});
