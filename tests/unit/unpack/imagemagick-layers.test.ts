import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runUnpack } from '../../../server/features/originals/unpack/run-unpack';
import { scanLayerRecords } from '../../../server/features/originals/unpack/scan-layer-records';
import { unpackOriginal } from '../../../server/features/originals/unpack/unpack-original';
import { differingPixels, patternPixels, readPngRgba, writePng, type Rgba } from './support/pixels';

// Reference writer and reader: ImageMagick 6 from Debian (/usr/bin/convert). It assembles a
// layered PSD from PNGs at known offsets (the first image is the merged image, the rest become
// layers named by their "label"); our unpack must return the same pixels, offsets and names,
// and match ImageMagick's own extraction of the layers.
const CONVERT = '/usr/bin/convert';
const hasImageMagick = existsSync(CONVERT);
if (!hasImageMagick) {
  console.warn('\n*** ImageMagick is missing: /usr/bin/convert not found, the ImageMagick PSD tests are SKIPPED ***\n'
    + '*** install it with: apt-get install -y imagemagick ***\n');
}

type Source = { name: string; expectedName: string; left: number; top: number; image: Rgba; file: string };

let dir = '';
let sources: Source[] = [];

beforeAll(async () => {
  if (!hasImageMagick) return;
  dir = mkdtempSync(join(tmpdir(), 'unpack-im-'));
  const specs = [
    // ImageMagick stores names only as raw UTF-8 Pascal strings: the name repair must undo that
    { name: 'Forêt <b>', left: 10, top: 20, width: 40, height: 30 },
    { name: 'Kite', left: 52, top: 5, width: 21, height: 11 },
    { name: 'Puffin/Left', left: 0, top: 47, width: 64, height: 33 },
  ];
  sources = await Promise.all(specs.map(async (spec, i) => {
    const image = patternPixels(spec.width, spec.height, 101 + i);
    const file = join(dir, `source-${i}.png`);
    await writePng(file, image);
    return { name: spec.name, expectedName: spec.name, left: spec.left, top: spec.top, image, file };
  }));
});

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

function assemble(out: string, compression: string, extra: string[] = []): void {
  const layers = sources.flatMap((s) => ['(', s.file, '-repage', `+${s.left}+${s.top}`, '-set', 'label', s.name, ')']);
  execFileSync(CONVERT, ['(', '-size', '100x80', 'xc:rgba(10,200,30,0)', ')', ...layers,
    '-depth', '8', '-type', 'TrueColorAlpha', '-compress', compression, ...extra, out]);
}

describe.skipIf(!hasImageMagick)('unpacking a PSD written by ImageMagick', () => {
  it.each(['RLE', 'Zip', 'None'])('returns every layer with the same pixels, offsets and names (%s compression)', async (compression) => {
    const psd = join(dir, `layers-${compression}.psd`);
    const out = mkdtempSync(join(dir, 'out-'));
    assemble(psd, compression);
    // spec compression codes: 0 raw, 1 RLE, 2 zip; make sure ImageMagick wrote what we test
    const codes = scanLayerRecords(readFileSync(psd), 1).records.flatMap((r) => r.channels.map((c) => c.compression));
    expect(new Set(codes)).toEqual(new Set([{ RLE: 1, Zip: 2, None: 0 }[compression]]));
    const result = await unpackOriginal({ filePath: psd, outDir: out, cut: 'layers' });
    expect(result.document).toMatchObject({ width: 100, height: 80, colourMode: 'RGB', depth: 8, layerCount: 3 });
    expect(result.motifs.map((m) => m.name)).toEqual(sources.map((s) => s.expectedName));
    expect(result.motifs.map((m) => m.sourcePath)).toEqual(['Forêt <b>', 'Kite', 'Puffin\\/Left']);
    for (const [i, motif] of result.motifs.entries()) {
      const source = sources[i];
      expect([motif.left, motif.top, motif.width, motif.height]).toEqual([source.left, source.top, source.image.width, source.image.height]);
      const pixels = await readPngRgba(join(out, motif.pngFile));
      expect(differingPixels(pixels, source.image)).toBe(0);
    }
  });

  it('cuts the same layer pixels as ImageMagick extracts from the same file', async () => {
    const psd = join(dir, 'compare.psd');
    assemble(psd, 'RLE');
    const extracted = mkdtempSync(join(dir, 'im-'));
    execFileSync(CONVERT, [psd, '+repage', join(extracted, 'layer-%d.png')]);
    // ImageMagick writes the merged image as layer-0 and the layers after it
    const files = readdirSync(extracted).filter((f) => f.startsWith('layer-')).sort((a, b) => parseInt(a.slice(6)) - parseInt(b.slice(6)));
    const offsets = execFileSync('/usr/bin/identify', ['-format', '%X %Y\n', psd], { encoding: 'utf8' }).trim().split('\n').slice(1);
    const out = mkdtempSync(join(dir, 'out-'));
    const result = await runUnpack({ filePath: psd, outDir: out, cut: 'layers' });
    expect(files).toHaveLength(result.motifs.length + 1);
    for (const [i, motif] of result.motifs.entries()) {
      const reference = await readPngRgba(join(extracted, files[i + 1]));
      const ours = await readPngRgba(join(out, motif.pngFile));
      // ImageMagick's PNG writer may drop the colour of fully transparent pixels
      expect(differingPixels(ours, reference, { ignoreColourUnderZeroAlpha: true })).toBe(0);
      expect(offsets[i]).toBe(`+${motif.left} +${motif.top}`);
    }
  }, 30_000);

  it('reads a large-format PSB the same way as a PSD', async () => {
    const psb = join(dir, 'layers.psb');
    const out = mkdtempSync(join(dir, 'out-'));
    assemble(psb, 'RLE');
    expect(readFileSync(psb).readUInt16BE(4)).toBe(2); // spec: version 2 = PSB
    const result = await unpackOriginal({ filePath: psb, outDir: out, cut: 'layers' });
    expect(result.motifs).toHaveLength(3);
    for (const [i, motif] of result.motifs.entries()) {
      expect(differingPixels(await readPngRgba(join(out, motif.pngFile)), sources[i].image)).toBe(0);
    }
  });

  it('reads an 8-bit Grayscale PSD as gray RGB pixels', async () => {
    const psd = join(dir, 'gray.psd');
    const out = mkdtempSync(join(dir, 'out-'));
    const layers = sources.flatMap((s) => ['(', s.file, '-colorspace', 'Gray', '-repage', `+${s.left}+${s.top}`, '-set', 'label', s.name, ')']);
    execFileSync(CONVERT, ['(', '-size', '100x80', 'xc:rgba(0,0,0,0)', '-colorspace', 'Gray', ')', ...layers, '-depth', '8', '-compress', 'RLE', psd]);
    const result = await unpackOriginal({ filePath: psd, outDir: out, cut: 'layers' });
    expect(result.document.colourMode).toBe('Grayscale');
    const reference = mkdtempSync(join(dir, 'gray-'));
    execFileSync(CONVERT, [psd, '+repage', join(reference, 'layer-%d.png')]);
    for (const [i, motif] of result.motifs.entries()) {
      const ours = await readPngRgba(join(out, motif.pngFile));
      const theirs = await readPngRgba(join(reference, `layer-${i + 1}.png`));
      expect(differingPixels(ours, theirs, { ignoreColourUnderZeroAlpha: true })).toBe(0);
      expect(ours.data[0]).toBe(ours.data[1]);
    }
  });
});
