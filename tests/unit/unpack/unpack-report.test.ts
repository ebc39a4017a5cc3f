import { mkdtempSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { unpackOriginal } from '../../../server/features/originals/unpack/unpack-original';
import { writeFileSync } from 'node:fs';
import { layer, solid, writeTestPsd } from './support/ag-psd-files';
import { readPngRgba } from './support/pixels';
import { writeRawPsd } from './support/raw-psd';

const dirs: string[] = [];
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));

describe('the import report', () => {
  it('lists skipped layers and what the cut cannot render, and never drops them silently', async () => {
    const { file, dir } = writeTestPsd({
      width: 30, height: 30,
      children: [
        layer('Background', 0, 0, solid(30, 30, [255, 255, 255, 255])),
        { name: 'Empty', left: 0, top: 0 },
        { name: 'Warmer', adjustment: { type: 'brightness/contrast', brightness: 20, contrast: 0 } },
        layer('Shadowed', 2, 2, solid(5, 5, [10, 10, 10, 255]), {
          effects: { dropShadow: [{ enabled: true, size: { units: 'Pixels', value: 4 }, distance: { units: 'Pixels', value: 2 } }] },
        }),
        layer('Speckle', 8, 8, solid(4, 4, [0, 0, 0, 255]), { blendMode: 'dissolve' }),
        { name: 'Sea', opened: true, children: [
          layer('Water', 0, 20, solid(30, 10, [40, 120, 200, 255])),
          { name: 'Cooler', adjustment: { type: 'brightness/contrast', brightness: -20, contrast: 0 } },
        ] },
        layer('Caption', 1, 1, solid(8, 3, [0, 0, 0, 255]), { text: { text: 'Hello\rsea', style: { font: { name: 'SourceSans3-Bold' }, fontSize: 12 }, transform: [2, 0, 0, 2, 1, 1] } }),
      ],
    });
    dirs.push(dir);
    const result = await unpackOriginal({ filePath: file, outDir: mkdtempSync(join(dir, 'out-')), cut: 'groups' });
    expect(result.motifs.map((m) => m.name)).toEqual(['Background', 'Shadowed', 'Speckle', 'Sea', 'Caption']);
    expect(result.report.skipped).toEqual([
      { sourcePath: 'Warmer', reason: 'adjustment layer (no pixels of its own)' },
      { sourcePath: 'Empty', reason: 'empty layer' },
    ]);
    expect(result.report.unsupported).toEqual([
      { sourcePath: 'Shadowed', feature: 'layer effects not rendered (drop shadow)' },
      { sourcePath: 'Speckle', feature: 'blend mode "dissolve" drawn as normal' },
      { sourcePath: 'Sea/Cooler', feature: 'adjustment layer not applied to the layers below' },
    ]);
    // text keeps its words, font and size; the size is scaled by the text transform (2x)
    expect(result.motifs.at(-1)).toMatchObject({ kind: 'text', text: { content: 'Hello\nsea', fontName: 'SourceSans3-Bold', sizePt: 24 } });
  });

  it('makes one motif of a PSD that has only its merged image', async () => {
    const { dir } = writeTestPsd({ width: 1, height: 1 });
    dirs.push(dir);
    const file = join(dir, 'flat.psd');
    // spec "Image Data Section": compression 0, then the planes R, G, B one after another
    writeFileSync(file, writeRawPsd({ width: 2, height: 1, layers: [], merged: Buffer.from([10, 20, 30, 40, 50, 60]) }));
    const out = mkdtempSync(join(dir, 'out-'));
    const result = await unpackOriginal({ filePath: file, outDir: out, cut: 'groups', originalName: 'Harbour.psd' });
    expect(result.motifs).toHaveLength(1);
    expect(result.motifs[0]).toMatchObject({ name: 'Harbour', width: 2, height: 1 });
    expect(result.report.notes).toEqual(['The file has no layers; its merged image is one motif']);
    expect(Array.from((await readPngRgba(join(out, result.motifs[0].pngFile))).data)).toEqual([10, 30, 50, 255, 20, 40, 60, 255]);
  });
});
