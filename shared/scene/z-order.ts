import type { Layout } from './layout';
import type { PlacementIds } from './operations';
import type { Placement } from './placement';

export type ZOrderMove = 'forward' | 'backward' | 'front' | 'back';

/** Moves the selection one step or all the way up or down the stack; the selection keeps its own order. */
export function reorderPlacements(layout: Layout, ids: PlacementIds, move: ZOrderMove): Layout {
  const selected = new Set(ids);
  const list = [...layout.placements];
  if (move === 'front' || move === 'back') {
    const chosen = list.filter((p) => selected.has(p.id));
    const others = list.filter((p) => !selected.has(p.id));
    return sameOrder(layout.placements, move === 'front' ? [...others, ...chosen] : [...chosen, ...others], layout);
  }
  // One step: each selected placement swaps with the unselected neighbour it passes.
  if (move === 'forward') {
    for (let i = list.length - 2; i >= 0; i--) if (selected.has(list[i].id) && !selected.has(list[i + 1].id)) swap(list, i, i + 1);
  } else {
    for (let i = 1; i < list.length; i++) if (selected.has(list[i].id) && !selected.has(list[i - 1].id)) swap(list, i, i - 1);
  }
  return sameOrder(layout.placements, list, layout);
}

function swap(list: Placement[], i: number, j: number): void {
  [list[i], list[j]] = [list[j], list[i]];
}

function sameOrder(before: readonly Placement[], after: Placement[], layout: Layout): Layout {
  return before.every((p, i) => p === after[i]) ? layout : { ...layout, placements: after };
}
