import type { Rect } from '../geometry';
import type { SalesSplitRule } from '../contracts/sales';
import { placementLocalSize, placementToTemplate, type Layout, type MotifPlacement, type RepeatPlacement } from '../scene';
import { repeatSteps } from '../scene/repeat-tiles';

type MotifBearing = MotifPlacement | RepeatPlacement;

const bearsMotif = (p: Layout['placements'][number]): p is MotifBearing => (p.type === 'motif' || p.type === 'repeat') && !p.hidden;

/**
 * The area a placement covers in the print file, in template pixels²: its own box (motif pixels)
 * through the scene's placement matrix, whose determinant is the area scale (scale² × stretch).
 * A repeat covers the print area at the density of its tiles (tile area over step area); without
 * the print area it counts one tile.
 */
export function printedArea(p: MotifBearing, printArea?: Rect): number {
  const { width, height } = placementLocalSize(p);
  const [a, b, c, d] = placementToTemplate(p);
  const tile = Math.abs(a * d - b * c) * width * height;
  if (p.type === 'motif' || !printArea) return tile;
  const { stepX, stepY } = repeatSteps(p);
  return printArea.width * printArea.height * Math.min(1, tile / (stepX * stepY));
}

/**
 * How a product's sales are shared among the motifs its layout prints (hidden placements and text
 * print no motif): 'even' gives each distinct motif the same share; 'area' shares by printed area,
 * summed over a motif's placements. Shares add up to 1, or the map is empty for a layout with no motif.
 */
export function motifShares(layout: Layout, rule: SalesSplitRule, printArea?: Rect): Map<string, number> {
  const areas = new Map<string, number>();
  for (const p of layout.placements) {
    if (!bearsMotif(p)) continue;
    areas.set(p.motifId, (areas.get(p.motifId) ?? 0) + (rule === 'area' ? printedArea(p, printArea) : 0));
  }
  const shares = new Map<string, number>();
  if (areas.size === 0) return shares;
  const total = [...areas.values()].reduce((s, a) => s + a, 0);
  // Even split, or a layout whose motifs all have zero area (cannot happen with positive scales).
  if (rule === 'even' || total <= 0) {
    for (const id of areas.keys()) shares.set(id, 1 / areas.size);
    return shares;
  }
  for (const [id, area] of areas) shares.set(id, area / total);
  return shares;
}
