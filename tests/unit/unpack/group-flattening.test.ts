import { mkdtempSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { unpackOriginal } from '../../../server/features/originals/unpack/unpack-original';
import { layer, pixels, solid, writeTestPsd } from './support/ag-psd-files';
import { readPngRgba } from './support/pixels';

// Expected pixels are worked by hand from W3C "Compositing and Blending Level 1" section 9.1
// (source-over with blending: Cs' = (1 - ab) Cs + ab B(Cb, Cs); ao = as + ab (1 - as);
// Co = (as Cs' + (1 - as) ab Cb) / ao) and 10.1.2 (multiply: B = Cb x Cs), rounded to 8 bits.
const dirs: string[] = [];
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));

async function unpack(psd: Parameters<typeof writeTestPsd>[0], cut: 'groups' | 'layers' = 'groups') {
  const { file, dir } = writeTestPsd(psd);
  dirs.push(dir);
  const outDir = mkdtempSync(join(dir, 'out-'));
  const result = await unpackOriginal({ filePath: file, outDir, cut });
  const images = await Promise.all(result.motifs.map((m) => readPngRgba(join(outDir, m.pngFile))));
  return { result, images };
}

describe('flattening a layer group into one motif', () => {
  it('applies a layer\'s opacity and multiply blend like the compositing standard', async () => {
    const { result, images } = await unpack({
      width: 10, height: 4,
      children: [{
        name: 'Stack', opened: true, opacity: 0.5,
        children: [
          // opaque and half-transparent (alpha 128) orange
          layer('Base', 0, 0, pixels(2, 1, [[200, 100, 50, 255], [200, 100, 50, 128]])),
          // opacity 153/255 = 0.6, stored exactly as one byte
          layer('Shade', 0, 0, solid(3, 1, [100, 100, 100, 255]), { blendMode: 'multiply', opacity: 153 / 255 }),
          layer('Scribble', 0, 0, solid(3, 1, [255, 0, 0, 255]), { hidden: true }),
        ],
      }],
    });
    expect(result.motifs).toHaveLength(1);
    const motif = result.motifs[0];
    expect(motif).toMatchObject({ name: 'Stack', kind: 'group', left: 0, top: 0, width: 3, height: 1 });
    // the group's own opacity is kept as a value, not baked into its pixels
    expect(motif.opacity).toBeCloseTo(128 / 255, 5);
    expect(Array.from(images[0].data)).toEqual([
      // over opaque: 0.6 x (200 x 100 / 255) + 0.4 x 200 = 127.06; 63.53; 31.76
      127, 64, 32, 255,
      // over alpha 128: ao = 0.6 + 0.502 x 0.4 = 0.8008 (204.2); Co = 116.96, 77.14, 57.23
      117, 77, 57, 204,
      // over nothing: the source itself at 0.6 alpha
      100, 100, 100, 153,
    ]);
    expect(result.report.notes.some((n) => n.includes('Hidden "Stack/Scribble"'))).toBe(true);
  });

  it('draws a clipped layer only where the layer below it has pixels', async () => {
    const { images } = await unpack({
      width: 4, height: 1,
      children: [{
        name: 'Jumper', opened: true,
        children: [
          layer('Knit', 0, 0, pixels(3, 1, [[10, 20, 30, 255], [10, 20, 30, 0], [10, 20, 30, 255]])),
          layer('Stripes', 0, 0, solid(3, 1, [250, 240, 230, 255]), { clipping: true, opacity: 153 / 255 }),
        ],
      }],
    });
    // source-atop (W3C section 9.1.1 with ao = ab): 0.6 x 250 + 0.4 x 10 = 154; 152; 150
    expect(Array.from(images[0].data)).toEqual([154, 152, 150, 255, 0, 0, 0, 0, 154, 152, 150, 255]);
  });

  it('cuts each top-level group into one motif and each loose layer into another', async () => {
    const { result } = await unpack({
      width: 20, height: 20,
      children: [
        layer('Background', 0, 0, solid(20, 20, [255, 255, 255, 255])),
        { name: 'Puffin', opened: true, children: [layer('Body', 2, 2, solid(4, 4, [0, 0, 0, 255])), layer('Beak', 6, 3, solid(2, 1, [255, 128, 0, 255]))] },
        layer('Sketch', 1, 1, solid(3, 3, [80, 80, 80, 255]), { hidden: true }),
      ],
    });
    expect(result.motifs.map((m) => [m.sourcePath, m.kind, m.hidden, m.left, m.top, m.width, m.height])).toEqual([
      ['Background', 'layer', false, 0, 0, 20, 20],
      ['Puffin', 'group', false, 2, 2, 6, 4],
      ['Sketch', 'layer', true, 1, 1, 3, 3],
    ]);
  });

  it('cuts every pixel layer on its own, with its groups in the source path', async () => {
    const { result, images } = await unpack({
      width: 20, height: 20,
      children: [{ name: 'Puffin', opened: true, opacity: 0.5, children: [
        layer('Body', 2, 2, solid(4, 4, [0, 0, 0, 255])),
        layer('Beak', 6, 3, solid(2, 1, [255, 128, 0, 255]), { blendMode: 'screen', opacity: 0.4 }),
      ] }],
    }, 'layers');
    expect(result.motifs.map((m) => [m.sourcePath, m.blendMode, Math.round(m.opacity * 100)])).toEqual([
      ['Puffin/Body', 'normal', 100],
      ['Puffin/Beak', 'screen', 40],
    ]);
    // a layer's own opacity stays a value: its pixels are as stored
    expect(Array.from(images[1].data.subarray(0, 4))).toEqual([255, 128, 0, 255]);
  });
});
