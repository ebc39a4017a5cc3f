import { describe, expect, it } from 'vitest';
import { LAYOUT_VERSION } from './layout';
import { migrateLayout, readSavedLayout } from './migrate-layout';
import { layoutOf, motif, text } from './test-support/fixtures';

const v1Motif = { id: 'puffin', motifId: 'm-puffin', version: 3, naturalWidth: 800, naturalHeight: 600, x: 1275, y: 525, scale: 0.5, rotation: Math.PI / 6 };

describe('opening saved layouts', () => {
  it('opens a v1 layout: untyped placements become motifs and radians become degrees', () => {
    const result = readSavedLayout({ version: 1, placements: [v1Motif, { ...v1Motif, id: 'kite', rotation: -Math.PI / 2 }] });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.applied).toEqual(['tag-untyped-placements-as-motifs', 'rotation-radians-to-degrees']);
    expect(result.layout.version).toBe(LAYOUT_VERSION);
    expect(result.layout.placements.map((p) => [p.type, p.rotationDeg])).toEqual([
      ['motif', 30],
      ['motif', -90],
    ]);
    expect(result.layout.placements[0]).not.toHaveProperty('rotation');
    expect(result.layout.mirror).toBe(false);
  });

  it('treats a layout without a version as v1', () => {
    const layout = migrateLayout({ placements: [v1Motif] });
    expect(layout.placements[0].rotationDeg).toBe(30);
  });

  it('opens a current layout unchanged, with no migration applied', () => {
    const saved = JSON.parse(JSON.stringify(layoutOf(motif({ rotationDeg: 45 }), text())));
    const result = readSavedLayout(saved);
    expect(result).toMatchObject({ ok: true, applied: [] });
    if (result.ok) expect(result.layout).toEqual(saved);
  });

  it('answers a layout from a newer version with a clear error value', () => {
    const result = readSavedLayout({ version: LAYOUT_VERSION + 1, placements: [] });
    expect(result).toMatchObject({ ok: false, error: { code: 'layout.too_new' } });
  });

  it('names the broken field of an invalid layout, and migrateLayout throws with the code', () => {
    const result = readSavedLayout({ version: 2, placements: [{ ...motif(), opacity: 3 }] });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error.message).toMatch(/placements\.0\.opacity/);
    expect(() => migrateLayout('not a layout')).toThrow(expect.objectContaining({ code: 'layout.invalid' }));
  });

  it('refuses two placements with the same id', () => {
    const result = readSavedLayout(layoutOf(motif(), motif()));
    expect(result).toMatchObject({ ok: false, error: { code: 'layout.invalid' } });
  });

  it('refuses an oversized placement list before migrating it', () => {
    const result = readSavedLayout({ version: 1, placements: new Array(2_001).fill(v1Motif) });
    expect(result).toMatchObject({ ok: false, error: { code: 'layout.invalid', message: expect.stringMatching(/at most 2000/) } });
  });
});
