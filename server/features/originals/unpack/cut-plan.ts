import { isAdjustmentLayer, isTextLayer, unsupportedFeatures } from './layer-features';
import { sourcePathOf } from './layer-names';
import type { LayerNode } from './layer-tree';
import type { UnpackCut, UnpackReport } from './unpack-result';

// One motif to cut: a top-level group or layer (with the layers clipped to it) flattened, or
// in the layer-by-layer cut one pixel layer on its own.
export type PlannedMotif = {
  kind: 'group' | 'layer' | 'text';
  node: LayerNode;
  clipped: LayerNode[];
  // names from the top of the document down to the node
  path: string[];
  hidden: boolean;
};

export function planMotifs(tree: readonly LayerNode[], cut: UnpackCut, report: UnpackReport): PlannedMotif[] {
  listUnsupported(tree, [], report);
  const planned: PlannedMotif[] = [];
  if (cut === 'groups') planTopLevel(tree, planned, report);
  else planEachLayer(tree, [], false, planned, report);
  return planned;
}

function planTopLevel(tree: readonly LayerNode[], planned: PlannedMotif[], report: UnpackReport): void {
  for (const { node, clipped } of clipStacks(tree)) {
    const path = [node.name];
    if (isAdjustmentLayer(node.layer)) {
      report.skipped.push({ sourcePath: sourcePathOf(path), reason: 'adjustment layer (no pixels of its own)' });
      for (const c of clipped) report.skipped.push({ sourcePath: sourcePathOf([c.name]), reason: 'clipped to an adjustment layer' });
      continue;
    }
    const kind = node.children ? 'group' : isTextLayer(node.layer) && clipped.length === 0 ? 'text' : 'layer';
    if (clipped.length > 0) {
      report.notes.push(`${clipped.length} layer(s) clipped to "${sourcePathOf(path)}" are drawn into its motif`);
    }
    planned.push({ kind, node, clipped, path, hidden: node.layer.hidden === true });
  }
}

function planEachLayer(
  nodes: readonly LayerNode[], parents: string[], parentHidden: boolean,
  planned: PlannedMotif[], report: UnpackReport,
): void {
  for (const node of nodes) {
    const path = [...parents, node.name];
    const hidden = parentHidden || node.layer.hidden === true;
    if (node.children) {
      if (node.children.length === 0) report.skipped.push({ sourcePath: sourcePathOf(path), reason: 'empty group' });
      planEachLayer(node.children, path, hidden, planned, report);
      continue;
    }
    if (isAdjustmentLayer(node.layer)) {
      report.skipped.push({ sourcePath: sourcePathOf(path), reason: 'adjustment layer (no pixels of its own)' });
      continue;
    }
    if (node.layer.clipping) {
      report.notes.push(`"${sourcePathOf(path)}" is clipped to the layer below in the original; it is cut unclipped`);
    }
    planned.push({ kind: isTextLayer(node.layer) ? 'text' : 'layer', node, clipped: [], path, hidden });
  }
}

// A layer with the clipping flag is clipped to the nearest unclipped layer below it.
export function clipStacks(nodes: readonly LayerNode[]): { node: LayerNode; clipped: LayerNode[] }[] {
  const stacks: { node: LayerNode; clipped: LayerNode[] }[] = [];
  for (const node of nodes) {
    const base = stacks[stacks.length - 1];
    if (node.layer.clipping && base) base.clipped.push(node);
    else stacks.push({ node, clipped: [] });
  }
  return stacks;
}

function listUnsupported(nodes: readonly LayerNode[], parents: string[], report: UnpackReport): void {
  for (const node of nodes) {
    const path = [...parents, node.name];
    for (const feature of unsupportedFeatures(node.layer)) report.unsupported.push({ sourcePath: sourcePathOf(path), feature });
    if (node.children) listUnsupported(node.children, path, report);
  }
}
