import type { Vec } from '@shared/geometry';
import { createMotifPlacement, type MotifPlacement } from '@shared/scene';
import type { TemplateGeometry } from '@shared/templates';

export type PlaceableMotif = { id: string; version: number; width: number; height: number };
export type OriginalMotif = PlaceableMotif & { offsetX: number; offsetY: number; hiddenInOriginal: boolean };

const newId = () => globalThis.crypto.randomUUID();

// A freshly placed motif takes at most this share of the print area, so it lands whole and visible.
const FIRST_SIZE_SHARE = 0.45;

/** Where Enter places a motif: a wrap's front centre, else the print area's centre. */
export function frontCentre(g: TemplateGeometry): Vec {
  return { x: g.frontCentreX ?? g.printArea.x + g.printArea.width / 2, y: g.printArea.y + g.printArea.height / 2 };
}

/** A motif placed at `at`, never enlarged past its own pixels (that would lower its print resolution). */
export function placementForMotif(motif: PlaceableMotif, at: Vec, g: TemplateGeometry, makeId: () => string = newId): MotifPlacement {
  const fit = Math.min((g.printArea.width * FIRST_SIZE_SHARE) / motif.width, (g.printArea.height * FIRST_SIZE_SHARE * 1.6) / motif.height);
  return createMotifPlacement({
    id: makeId(), motifId: motif.id, version: motif.version, naturalWidth: motif.width, naturalHeight: motif.height,
    x: at.x, y: at.y, scale: Math.min(1, fit),
  });
}

/**
 * The original's visible motifs with the same relative positions as in it, the group scaled as
 * one (never up) to fit the print area and centred on the front.
 */
export function placementsAsInOriginal(motifs: readonly OriginalMotif[], g: TemplateGeometry, makeId: () => string = newId): MotifPlacement[] {
  const shown = motifs.filter((m) => !m.hiddenInOriginal && m.width > 0 && m.height > 0);
  if (shown.length === 0) return [];
  const left = Math.min(...shown.map((m) => m.offsetX));
  const top = Math.min(...shown.map((m) => m.offsetY));
  const right = Math.max(...shown.map((m) => m.offsetX + m.width));
  const bottom = Math.max(...shown.map((m) => m.offsetY + m.height));
  const s = Math.min(1, (g.printArea.width * 0.9) / (right - left), (g.printArea.height * 0.9) / (bottom - top));
  const centre = frontCentre(g);
  const groupCentre = { x: (left + right) / 2, y: (top + bottom) / 2 };
  return shown.map((m) =>
    createMotifPlacement({
      id: makeId(), motifId: m.id, version: m.version, naturalWidth: m.width, naturalHeight: m.height,
      x: centre.x + (m.offsetX + m.width / 2 - groupCentre.x) * s,
      y: centre.y + (m.offsetY + m.height / 2 - groupCentre.y) * s,
      scale: s,
    }),
  );
}

/** The original that most of a product's placements were cut from (ties: the first named), if any. */
export function usualOriginalOf(uses: readonly { originalId: string; placementIds: readonly string[] }[]): string | undefined {
  const counts = new Map<string, number>();
  for (const u of uses) counts.set(u.originalId, (counts.get(u.originalId) ?? 0) + u.placementIds.length);
  let best: string | undefined;
  for (const [id, n] of counts) if (best === undefined || n > counts.get(best)!) best = id;
  return best;
}
