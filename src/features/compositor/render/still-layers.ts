import type { Layout, RenderPlan } from '@shared/scene';

type Op = RenderPlan['ops'][number];

/**
 * The placements a gesture has changed so far: those whose object differs from the snapshot taken
 * at pointer-down (scene updates keep untouched placements as the same objects). Null when the
 * list itself changed (added, removed or reordered), so the caller draws everything.
 */
export function movedPlacementIds(snapshot: Layout, layout: Layout): ReadonlySet<string> | null {
  const before = snapshot.placements;
  const now = layout.placements;
  if (before.length !== now.length || snapshot.mirror !== layout.mirror) return null;
  const moved = new Set<string>();
  for (let i = 0; i < now.length; i++) {
    if (now[i].id !== before[i].id) return null;
    if (now[i] !== before[i]) moved.add(now[i].id);
  }
  return moved;
}

export type OpsAroundMoved = { below: Op[]; live: Op[]; above: Op[] };

/**
 * Splits the plan's ops into those under every op of a moved placement, those from the first to the
 * last of them (drawn each frame) and those over all of them. Still ops caught between two moved
 * ones stay in `live`, so the drawing order is the plan's exactly.
 */
export function splitAroundMoved(ops: readonly Op[], moved: ReadonlySet<string>): OpsAroundMoved {
  let first = -1;
  let last = -1;
  ops.forEach((op, i) => {
    if (!moved.has(op.placementId)) return;
    if (first < 0) first = i;
    last = i;
  });
  if (first < 0) return { below: [...ops], live: [], above: [] };
  return { below: ops.slice(0, first), live: ops.slice(first, last + 1), above: ops.slice(last + 1) };
}
