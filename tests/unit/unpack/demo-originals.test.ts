import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { drawDemoOriginals } from '../../../scripts/demo/draw-originals';
import { scanLayerRecords } from '../../../server/features/originals/unpack/scan-layer-records';
import { unpackOriginal } from '../../../server/features/originals/unpack/unpack-original';

const dir = mkdtempSync(join(tmpdir(), 'unpack-demo-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('the demo originals', () => {
  it('draw "Puffin Picnic" as groups and layers that unpack into the studio\'s motifs', async () => {
    // a quarter-size copy keeps the test fast; the artwork and layer structure are the same
    const [puffinPicnic] = await drawDemoOriginals(dir, { scale: 0.25, only: ['Puffin Picnic'] });
    expect(puffinPicnic.name).toBe('Puffin Picnic');
    const file = readFileSync(puffinPicnic.file);
    // ag-psd writes layer channels RLE-compressed (spec compression 1) unless asked for zip
    const compressions = new Set(scanLayerRecords(file, 1).records.flatMap((r) => r.channels.filter((c) => c.dataLength > 0).map((c) => c.compression)));
    expect(compressions).toEqual(new Set([1]));

    const result = await unpackOriginal({ filePath: puffinPicnic.file, outDir: mkdtempSync(join(dir, 'out-')), cut: 'groups' });
    expect(result.document).toMatchObject({ width: 375, height: 525, colourMode: 'RGB', depth: 8, ppi: 75 });
    expect(result.motifs.map((m) => `${m.kind}:${m.name}`)).toEqual([
      'layer:Background', 'layer:Clouds', 'layer:Wave band', 'group:Kite', 'group:Puffin Red Jumper',
      'group:Picnic basket', 'group:Sandwiches', 'group:Puffin Teal Jumper', 'text:Title', 'layer:Sketch',
    ]);
    const byName = new Map(result.motifs.map((m) => [m.name, m]));
    expect(byName.get('Wave band')).toMatchObject({ blendMode: 'multiply' });
    expect(byName.get('Wave band')!.opacity).toBeCloseTo(0.8, 2);
    expect(byName.get('Sketch')!.hidden).toBe(true);
    expect(byName.get('Title')!.text).toEqual({ content: 'Puffin Picnic', fontName: 'Source Sans 3', sizePt: 44 });
    expect(byName.get('Puffin Red Jumper')!.suggestedTags).toEqual(['puffin', 'red', 'jumper']);
    // the red jumper (#d6453d in the drawing) is the puffin's biggest colour
    const [r, g, b] = [1, 3, 5].map((i) => parseInt(byName.get('Puffin Red Jumper')!.colours[0].hex.slice(i, i + 2), 16));
    expect(Math.max(Math.abs(r - 0xd6), Math.abs(g - 0x45), Math.abs(b - 0x3d))).toBeLessThan(8);
    // everything in the demo is something the cut can draw
    expect(result.report).toEqual({ skipped: [], unsupported: [], notes: [] });
  }, 60_000);
});
