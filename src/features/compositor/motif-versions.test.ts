import { describe, expect, it } from 'vitest';
import { createMotifPlacement, createTextPlacement, emptyLayout, placementBounds } from '@shared/scene';
import { switchMotifVersion } from './motif-versions';
import { motifFromRepeat, repeatFromMotif } from './repeat-convert';

const puffin = createMotifPlacement({ id: 'p1', motifId: 'm-puffin', version: 1, naturalWidth: 400, naturalHeight: 600, x: 900, y: 500, scale: 0.5, rotationDeg: 15 });
const title = createTextPlacement({ id: 't', content: 'Puffin Picnic', fontId: 'source-sans-3', sizePt: 24, boxWidth: 400, boxHeight: 100, x: 100, y: 100 });

describe('updating a motif to its newer version', () => {
  it('keeps the printed width and the centre when the new version has another pixel size', () => {
    const layout = switchMotifVersion({ ...emptyLayout, placements: [puffin, title] }, 'm-puffin', 2, { width: 800, height: 1200 });
    const p = layout.placements[0];
    expect(p).toMatchObject({ version: 2, naturalWidth: 800, naturalHeight: 1200, x: 900, y: 500, rotationDeg: 15 });
    expect(placementBounds(p).width).toBeCloseTo(placementBounds(puffin).width, 9);
    expect(layout.placements[1]).toBe(title);
  });
});

describe('tiling a motif', () => {
  it('becomes a repeat with the same id, size and turn, and back again', () => {
    const r = repeatFromMotif(puffin);
    expect(r).toMatchObject({ type: 'repeat', id: 'p1', scale: 0.5, rotationDeg: 15, spacingX: 50, spacingY: 75 });
    expect(motifFromRepeat(r)).toMatchObject({ type: 'motif', id: 'p1', scale: 0.5, x: 900, y: 500 });
  });
});
