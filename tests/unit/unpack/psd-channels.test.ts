import { deflateSync } from 'node:zlib';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { decodeChannel } from '../../../server/features/originals/unpack/decode-channel';
import { unpackOriginal } from '../../../server/features/originals/unpack/unpack-original';
import { readPngRgba } from './support/pixels';
import { rawChannel, writeRawPsd } from './support/raw-psd';

const dir = mkdtempSync(join(tmpdir(), 'unpack-channels-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function decode(compression: number, data: Buffer, width: number, height: number): number[] {
  const file = Buffer.concat([Buffer.alloc(3), data]);
  const out = new Uint8Array(width * height);
  decodeChannel(file, { id: 0, compression, dataOffset: 3, dataLength: data.length }, width, height, false, out, 0, 1, 'test');
  return Array.from(out);
}

describe('decoding channel data', () => {
  it('unpacks RLE rows as PackBits', () => {
    // Apple Technical Note TN1023 "Understanding PackBits" example (from memory): FE AA 02 80 00
    // 2A FD AA 03 80 00 2A 22 F7 AA unpacks to 24 bytes; the PSD stores one byte count per row first
    const packed = Buffer.from([0xfe, 0xaa, 0x02, 0x80, 0x00, 0x2a, 0xfd, 0xaa, 0x03, 0x80, 0x00, 0x2a, 0x22, 0xf7, 0xaa]);
    const row = Buffer.concat([Buffer.from([0, packed.length]), packed]);
    expect(decode(1, row, 24, 1)).toEqual([
      0xaa, 0xaa, 0xaa, 0x80, 0x00, 0x2a, 0xaa, 0xaa, 0xaa, 0xaa, 0x80, 0x00, 0x2a, 0x22,
      0xaa, 0xaa, 0xaa, 0xaa, 0xaa, 0xaa, 0xaa, 0xaa, 0xaa, 0xaa,
    ]);
  });

  it('cuts an RLE run that overflows its row instead of writing into the next one', () => {
    // two rows of 3: the first row's run claims 10 bytes
    const data = Buffer.from([0, 2, 0, 2, 0xf7, 0x11, 0xfe, 0x22]);
    expect(decode(1, data, 3, 2)).toEqual([0x11, 0x11, 0x11, 0x22, 0x22, 0x22]);
  });

  it('inflates zip channels and undoes zip prediction row by row', () => {
    // spec compression 3: each byte stored as the difference from its left neighbour, mod 256
    const deltas = Buffer.from([10, 5, 5, 250, 200, 1, 1, 1]);
    expect(decode(3, deflateSync(deltas), 4, 2)).toEqual([10, 15, 20, 14, 200, 201, 202, 203]);
    expect(decode(2, deflateSync(deltas), 4, 2)).toEqual(Array.from(deltas));
  });

  it('refuses raw data shorter than the layer', () => {
    expect(() => decode(0, Buffer.from([1, 2, 3]), 2, 2)).toThrow(/fewer pixels/);
  });
});

describe('layer masks', () => {
  it('multiplies the layer\'s alpha by its pixel mask, with the default colour outside the mask', async () => {
    const file = join(dir, 'mask.psd');
    // a 4 x 1 opaque grey layer; the mask covers x 1..2 with 255 and 51, outside it is 0
    writeFileSync(file, writeRawPsd({
      width: 4, height: 1,
      layers: [{
        top: 0, left: 0, bottom: 1, right: 4, name: 'Masked',
        mask: { top: 0, left: 1, bottom: 1, right: 3, defaultColor: 0 },
        channels: [0, 1, 2].map((id) => rawChannel(id, new Uint8Array([90, 90, 90, 90]))).concat([rawChannel(-2, new Uint8Array([255, 51]))]),
      }],
    }));
    const out = mkdtempSync(join(dir, 'out-'));
    const result = await unpackOriginal({ filePath: file, outDir: out, cut: 'layers' });
    // trimmed to the visible pixels: x 1 (alpha 255) and x 2 (alpha 255 x 51 / 255 = 51)
    expect(result.motifs[0]).toMatchObject({ left: 1, width: 2 });
    const png = await readPngRgba(join(out, result.motifs[0].pngFile));
    expect(Array.from(png.data)).toEqual([90, 90, 90, 255, 90, 90, 90, 51]);
  });
});

describe('header cases ag-psd alone would refuse or misread', () => {
  it('unpacks a layered file whose header declares more than 16 channels (the spec allows 56)', async () => {
    const file = join(dir, 'many-channels.psd');
    writeFileSync(file, writeRawPsd({
      width: 2, height: 1, channels: 20,
      layers: [{ top: 0, left: 0, bottom: 1, right: 2, name: 'Ink', channels: [0, 1, 2].map((id) => rawChannel(id, new Uint8Array([7, 9]))) }],
    }));
    const result = await unpackOriginal({ filePath: file, outDir: mkdtempSync(join(dir, 'out-')), cut: 'layers' });
    expect(result.motifs.map((m) => [m.name, m.width])).toEqual([['Ink', 2]]);
  });

  it('refuses a CMYK file with the mode named, before reading its layers', async () => {
    const file = join(dir, 'cmyk.psd');
    writeFileSync(file, writeRawPsd({ width: 2, height: 1, channels: 4, mode: 4, layers: [] }));
    await expect(unpackOriginal({ filePath: file, outDir: dir, cut: 'layers' })).rejects.toMatchObject({
      code: 'psd.unsupported_mode',
      message: 'CMYK PSD files are not supported (RGB and Grayscale are); convert the document to RGB colour and upload it again',
    });
  });
});
