import { describe, expect, it } from 'vitest';
import { mug11oz } from '../templates';
import { effectivePpi } from './effective-ppi';
import { motif, repeat, text } from './test-support/fixtures';

describe('effective resolution', () => {
  it('gives 300 PPI for 2550 px across the 8.5 in wrap', () => {
    // print-trade-facts.md worked example (derived): 2550 px over an 8.5 in wrap = 300 PPI
    expect(effectivePpi(motif({ naturalWidth: 2550, naturalHeight: 1050, scale: 1 }), mug11oz)).toBe(300);
  });

  it('halves when the motif is placed at twice its pixel size, whatever the rotation', () => {
    expect(effectivePpi(motif({ scale: 2, rotationDeg: 37 }), mug11oz)).toBe(150);
    expect(effectivePpi(repeat({ scale: 0.5 }), { dpi: 300 })).toBe(600);
  });

  it('takes the lower axis of a stretched motif', () => {
    expect(effectivePpi(motif({ scale: 1, stretchY: 2, aspectLocked: false }), { dpi: 300 })).toBe(150);
  });

  it('uses the motif version’s real pixels when they differ from the saved size', () => {
    expect(effectivePpi(motif({ naturalWidth: 600, naturalHeight: 600 }), { dpi: 300 }, { width: 1200, height: 1200 })).toBe(600);
  });

  it('has none for text, which is drawn from outlines', () => {
    expect(effectivePpi(text(), { dpi: 300 })).toBeNull();
  });
});
