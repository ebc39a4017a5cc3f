import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PNG } from 'pngjs';
import { describe, expect, it } from 'vitest';
import { compose, radians, rotate, scale, translate } from '../../../shared/geometry';
import type { MotifDrawOp, RenderPlan } from '../../../shared/scene';
import { mug11oz } from '../../../shared/templates';
import { encodePrintFile, pngChunkTypes, renderAndEncodePrintFile } from './print-file-encode';
import { pngRowStream } from './print-png-stream';
import { renderPrintFile } from './print-render';

function gradient(width: number, height: number) {
  const data = new Uint8Array(width * height * 4);
  for (let y = 0; y < height; y++) for (let x = 0; x < width; x++) data.set([x % 256, y % 256, (x * y) % 256, (x + 3 * y) % 256], (y * width + x) * 4);
  return { data, width, height, left: 0, top: 0 };
}

describe('print file PNG written as rows arrive', () => {
  it('holds exactly the rows given, read back by pngjs and ImageMagick, tagged sRGB and 300 DPI', async () => {
    const image = gradient(300, 150);
    const stream = pngRowStream(300, 150, { dpi: 300, level: 6 });
    for (const [top, bottom] of [[0, 64], [64, 128], [128, 150]]) await stream.writeRows(image, top, bottom);
    const png = await stream.finish();
    // pngjs: an independent decoder that also checks every chunk's CRC and the zlib stream's checksum
    const decoded = PNG.sync.read(png);
    expect([decoded.width, decoded.height]).toEqual([300, 150]);
    expect(Buffer.compare(decoded.data, Buffer.from(image.data))).toBe(0);
    expect(pngChunkTypes(png)).toEqual(['IHDR', 'sRGB', 'pHYs', 'IDAT', 'IEND']);
    // W3C PNG spec, pHYs: 300 dpi = 11811 px/m, unit 1 (metre); the same chunk bytes as the sharp-encoded file's
    const at = png.indexOf(Buffer.from('pHYs', 'latin1')) - 4;
    expect(png.subarray(at, at + 21).toString('hex')).toBe('000000097048597300002e2300002e230178a53f76');
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'print-')), 'rows.png');
    writeFileSync(file, png);
    // ImageMagick identify: the pixel checksum of what it decodes equals that of the raw RGBA it is given
    const sig = (args: string[]) => execFileSync('/usr/bin/identify', args, { encoding: 'utf8' }).trim();
    const raw = path.join(path.dirname(file), 'rows.rgba');
    writeFileSync(raw, image.data);
    expect(sig(['-format', '%#', file])).toBe(sig(['-size', '300x150', '-depth', '8', '-format', '%#', `rgba:${raw}`]));
    expect(sig(['-format', '%w %h %U %[channels]', file])).toBe('300 150 PixelsPerCentimeter srgba');
  });

  it('refuses rows out of order and a file cut short', async () => {
    const image = gradient(10, 10);
    const stream = pngRowStream(10, 10, { dpi: 300, level: 6 });
    await expect(stream.writeRows(image, 2, 4)).rejects.toThrow(/out of order/);
    await stream.writeRows(image, 0, 5);
    await expect(stream.finish()).rejects.toThrow(/5 of 10 rows/);
  });

  it('encodes while rendering to the same pixels as rendering, then encoding with sharp', async () => {
    const size = 140;
    const disc = gradient(size, size);
    const ops: MotifDrawOp[] = [0, 1, 2].map((i) => ({
      kind: 'motif', placementId: `p${i}`, role: 'placement', width: size, height: size, opacity: i === 2 ? 0.6 : 1,
      blendMode: (['normal', 'multiply', 'screen'] as const)[i], clip: { x: 10, y: 5, width: 380, height: 190 }, motifId: `m${i}`, version: 1, recolour: { kind: 'none' },
      matrix: compose(translate(-size / 2, -size / 2), scale(0.6 + 0.3 * i), rotate(radians(0.3 * i - 0.2)), translate(90 + 110 * i, 100)),
    }));
    const plan: RenderPlan = { size: { width: 400, height: 200 }, notes: [], ops };
    const loadMotif = async () => disc;
    const { render, encoded } = await renderAndEncodePrintFile(mug11oz.output, (onRows) => renderPrintFile(plan, { loadMotif, onRows }));
    const bySharp = await encodePrintFile((await renderPrintFile(plan, { loadMotif })).image, mug11oz.output);
    expect(Buffer.compare(PNG.sync.read(encoded.buffer).data, PNG.sync.read(bySharp.buffer).data)).toBe(0);
    expect(Buffer.compare(PNG.sync.read(encoded.buffer).data, Buffer.from(render.image.data))).toBe(0);
  });
});
