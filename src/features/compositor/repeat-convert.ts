import { createMotifPlacement, createRepeatPlacement, type MotifPlacement, type RepeatPlacement } from '@shared/scene';

// A quarter of the tile as the first gap: airy enough to read as a pattern (our own choice).
const FIRST_GAP_SHARE = 0.25;

/** The motif tiled across the print area, keeping its id (so it stays selected), size, turn and colour. */
export function repeatFromMotif(p: MotifPlacement): RepeatPlacement {
  return createRepeatPlacement({
    id: p.id, motifId: p.motifId, version: p.version, naturalWidth: p.naturalWidth, naturalHeight: p.naturalHeight,
    x: p.x, y: p.y, rotationDeg: p.rotationDeg, flipX: p.flipX, flipY: p.flipY, opacity: p.opacity, blendMode: p.blendMode,
    locked: p.locked, hidden: p.hidden, scale: p.scale, recolour: p.recolour,
    spacingX: Math.round(p.naturalWidth * p.scale * FIRST_GAP_SHARE), spacingY: Math.round(p.naturalHeight * p.scale * FIRST_GAP_SHARE),
  });
}

export function motifFromRepeat(p: RepeatPlacement): MotifPlacement {
  return createMotifPlacement({
    id: p.id, motifId: p.motifId, version: p.version, naturalWidth: p.naturalWidth, naturalHeight: p.naturalHeight,
    x: p.x, y: p.y, rotationDeg: p.rotationDeg, flipX: p.flipX, flipY: p.flipY, opacity: p.opacity, blendMode: p.blendMode,
    locked: p.locked, hidden: p.hidden, scale: p.scale, recolour: p.recolour,
  });
}
