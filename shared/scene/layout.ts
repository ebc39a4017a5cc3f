import { z } from 'zod';
import { MAX_PLACEMENTS } from './placement-base';
import { placementSchema, type Placement } from './placement';

export const LAYOUT_VERSION = 2;

export const layoutSchema = z
  .object({
    // the saved form's version, so migrateLayout knows which steps an old layout needs
    version: z.literal(LAYOUT_VERSION),
    // bottom to top: later placements are drawn over earlier ones
    placements: z.array(placementSchema).max(MAX_PLACEMENTS),
    // a mug's layout copied to the other side, so left- and right-handed drinkers both see it
    mirror: z.boolean().default(false),
  })
  .superRefine((layout, ctx) => {
    const seen = new Set<string>();
    layout.placements.forEach((p, i) => {
      if (seen.has(p.id)) ctx.addIssue({ code: 'custom', path: ['placements', i, 'id'], message: `Two placements share the id "${p.id.slice(0, 64)}"` });
      seen.add(p.id);
    });
  });

export type Layout = {
  readonly version: typeof LAYOUT_VERSION;
  readonly placements: readonly Placement[];
  readonly mirror: boolean;
};

/** The editor's document: a layout plus a version that every change bumps, so caches compare numbers, not trees. */
export type Scene = {
  readonly layout: Layout;
  readonly sceneVersion: number;
};

export const emptyLayout: Layout = { version: LAYOUT_VERSION, placements: [], mirror: false };

export function createScene(layout: Layout = emptyLayout, sceneVersion = 0): Scene {
  return { layout, sceneVersion };
}

/**
 * The one way to change a scene: `change` returns a new layout (sharing untouched placements)
 * or the same object for "nothing changed", which keeps the scene and its version as they were.
 */
export function updateScene(scene: Scene, change: (layout: Layout) => Layout): Scene {
  const layout = change(scene.layout);
  return layout === scene.layout ? scene : { layout, sceneVersion: scene.sceneVersion + 1 };
}

export function findPlacement(layout: Layout, id: string): Placement | undefined {
  return layout.placements.find((p) => p.id === id);
}
