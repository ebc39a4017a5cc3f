import type { Layer, Psd } from 'ag-psd';
import { cleanName, layerNameFromFile } from './layer-names';
import type { LayerScan, ScannedLayerRecord } from './scan-layer-records';
import { UnpackError } from './unpack-error';

// One layer or layer group: ag-psd's parsed metadata beside our scan of its record.
export type LayerNode = {
  layer: Layer;
  record: ScannedLayerRecord;
  name: string;
  // bottom to top, as stored
  children?: LayerNode[];
};

type RecordNode = { record: ScannedLayerRecord; children?: RecordNode[] };

// Spec, "Section divider setting" ('lsct'): type 1 open folder, 2 closed folder, 3 bounding
// divider. Records run bottom to top and a group's divider comes before its contents, so the
// tree is rebuilt top-down from the end, as ag-psd does; the two trees then line up one to one.
function recordTree(scan: LayerScan): RecordNode[] {
  const root: RecordNode = { record: undefined as never, children: [] };
  const stack: RecordNode[] = [root];
  for (let i = scan.records.length - 1; i >= 0; i--) {
    const record = scan.records[i];
    const parent = stack[stack.length - 1];
    if (record.sectionType === 1 || record.sectionType === 2) {
      const group: RecordNode = { record, children: [] };
      parent.children!.unshift(group);
      stack.push(group);
    } else if (record.sectionType === 3) {
      if (stack.length === 1) throw new UnpackError('psd.corrupt', 'The layer groups of this PSD file are not nested properly; the file is damaged');
      stack.pop();
    } else {
      parent.children!.unshift({ record });
    }
  }
  return root.children!;
}

export function buildLayerTree(psd: Psd, scan: LayerScan): LayerNode[] {
  return pair(psd.children ?? [], recordTree(scan));
}

function pair(layers: Layer[], records: RecordNode[]): LayerNode[] {
  if (layers.length !== records.length) throw mismatch();
  return layers.map((layer, i) => {
    const { record, children } = records[i];
    const isGroup = layer.children !== undefined;
    if (isGroup !== (children !== undefined)) throw mismatch();
    const name = cleanName(layerNameFromFile(layer.name, record), isGroup ? 'Unnamed group' : 'Unnamed layer');
    const node: LayerNode = { layer, record, name };
    if (isGroup) node.children = pair(layer.children ?? [], children ?? []);
    return node;
  });
}

function mismatch(): UnpackError {
  return new UnpackError('psd.corrupt', 'The layer structure of this PSD file is inconsistent; the file is damaged');
}

export function countLayers(nodes: readonly LayerNode[]): number {
  return nodes.reduce((sum, node) => sum + 1 + (node.children ? countLayers(node.children) : 0), 0);
}
