import { createMotifPlacement, layoutSchema, type Layout, type MotifPlacement } from '../../shared/scene';
import { findBuiltInTemplate, templateGeometry, type Template, type TemplateGeometry } from '../../shared/templates';
import { frontCentre, placementForMotif, placementsAsInOriginal, type OriginalMotif } from '../../src/features/compositor/place-motifs';

// The demo products' layouts, built from the imported demo motifs with the same placing
// functions the editor uses ("place as in the original", "place at the front").

export type DemoMotif = OriginalMotif & { name: string; originalName: string };

/** The imported motifs by original and name: "Puffin Picnic/Kite". */
export type MotifIndex = Map<string, DemoMotif>;

export const motifKey = (originalName: string, motifName: string) => `${originalName}/${motifName}`;

export function pickMotifs(index: MotifIndex, originalName: string, names: readonly string[]): DemoMotif[] {
  return names.map((name) => {
    const m = index.get(motifKey(originalName, name));
    if (!m) throw new Error(`The demo original "${originalName}" has no motif "${name}"; was it imported?`);
    return m;
  });
}

export type LayoutRecipe = (index: MotifIndex, g: TemplateGeometry) => { placements: MotifPlacement[]; mirror?: boolean };

/** As in the original, but scaled as one group by `factor` about the group's centre (a deliberate enlargement). */
function scaledGroup(placements: MotifPlacement[], factor: number, about: { x: number; y: number }): MotifPlacement[] {
  return placements.map((p) => ({ ...p, x: about.x + (p.x - about.x) * factor, y: about.y + (p.y - about.y) * factor, scale: p.scale * factor }));
}

const PUFFIN = 'Puffin Picnic';
const LANTERN = 'Lantern Walk';
const picnicScene = ['Clouds', 'Wave band', 'Puffin Red Jumper', 'Picnic basket', 'Sandwiches', 'Puffin Teal Jumper'];

export const layoutRecipes = {
  // The picnic in the middle of the wrap's front, opposite the handle.
  mug: (index, g) => ({ placements: placementsAsInOriginal(pickMotifs(index, PUFFIN, picnicScene), g) }),
  // The whole picture with its kite and title, enlarged by 40 % for the bag (it prints a little soft).
  tote: (index, g) => {
    const shown = placementsAsInOriginal(pickMotifs(index, PUFFIN, ['Kite', ...picnicScene, 'Title']), g);
    return { placements: scaledGroup(shown, 1.4, frontCentre(g)) };
  },
  // Five characters in a loose grid, each at its own size, for kiss-cut stickers.
  stickers: (index, g) => {
    const names = ['Puffin Red Jumper', 'Puffin Teal Jumper', 'Picnic basket', 'Sandwiches', 'Kite'];
    const area = g.safeRect;
    const cells = [
      { x: 0.27, y: 0.24 }, { x: 0.73, y: 0.24 }, { x: 0.27, y: 0.58 }, { x: 0.73, y: 0.6 }, { x: 0.5, y: 0.84 },
    ];
    const placements = pickMotifs(index, PUFFIN, names).map((m, i) => {
      const at = { x: area.x + area.width * cells[i].x, y: area.y + area.height * cells[i].y };
      return placementForMotif(m, at, g);
    });
    // the kite lies on its side along the bottom of the sheet
    placements[4] = { ...placements[4], rotationDeg: 90 };
    return { placements };
  },
  // The original card artwork, just covering the bleed (the PSD is drawn at the trim size).
  card: (index, g) => coverBleed(pickMotifs(index, PUFFIN, ['Background', 'Clouds', 'Wave band', 'Kite', 'Puffin Red Jumper', 'Picnic basket', 'Sandwiches', 'Puffin Teal Jumper', 'Title']), g),
  lanternCard: (index, g) => coverBleed(pickMotifs(index, LANTERN, ['Background', 'Moon', 'Trees', 'Lantern glow', 'Falling leaves', 'Fox with Lantern', 'Little Fox with Lantern', 'Title']), g),
  // Only an idea so far: the fox dropped on the front of the wrap.
  lanternMug: (index, g) => ({ placements: [placementForMotif(pickMotifs(index, LANTERN, ['Fox with Lantern'])[0], frontCentre(g), g)] }),
} satisfies Record<string, LayoutRecipe>;

export type LayoutRecipeName = keyof typeof layoutRecipes;

function coverBleed(motifs: DemoMotif[], g: TemplateGeometry) {
  const placed = placementsAsInOriginal(motifs, g);
  const background = motifs[0];
  const factor = Math.max(g.bleedRect.width / (background.width * placed[0].scale), g.bleedRect.height / (background.height * placed[0].scale));
  return { placements: scaledGroup(placed, factor, frontCentre(g)) };
}

/** A saved layout the products service would accept: validated by the layout schema. */
export function buildLayout(recipe: LayoutRecipeName, templateId: string, index: MotifIndex): { layout: Layout; template: Template } {
  const template = findBuiltInTemplate(templateId);
  if (!template) throw new Error(`No built-in template "${templateId}"`);
  const build: LayoutRecipe = layoutRecipes[recipe];
  const { placements, mirror = false } = build(index, templateGeometry(template));
  const layout = layoutSchema.parse({ version: 2, placements: placements.map((p) => createMotifPlacement(p)), mirror }) as Layout;
  return { layout, template };
}
