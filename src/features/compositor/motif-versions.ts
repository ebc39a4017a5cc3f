import { mapPlacements, type Layout } from '@shared/scene';

/**
 * Moves every placement of `motifId` to another version, keeping each placement's printed width
 * (a new version may be cut at another pixel size), its centre, turn and colour.
 */
export function switchMotifVersion(layout: Layout, motifId: string, version: number, size: { width: number; height: number }): Layout {
  const ids = layout.placements.filter((p) => p.type !== 'text' && p.motifId === motifId && p.version !== version).map((p) => p.id);
  return mapPlacements(layout, ids, (p) => {
    if (p.type === 'text') return p;
    const scale = (p.scale * p.naturalWidth) / size.width;
    return { ...p, version, naturalWidth: size.width, naturalHeight: size.height, scale };
  });
}
