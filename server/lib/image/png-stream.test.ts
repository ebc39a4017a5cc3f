import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { deflateSync } from 'node:zlib';
import { PNG } from 'pngjs';
import { describe, expect, it } from 'vitest';
import { pngChunkTypes } from './print-file-encode';
import { adler32, createPngStream, pixelsPerMetre } from './png-stream';

// Turned gradient with soft alpha: rows that differ, so a band mixed up or dropped would show.
function picture(width: number, height: number): Uint8Array {
  const data = new Uint8Array(width * height * 4);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const i = (y * width + x) * 4;
      data.set([(x * 3 + y) % 256, (y * 5) % 256, (x ^ y) % 256, x % 7 === 0 ? 0 : 128 + ((x + y) % 128)], i);
    }
  }
  return data;
}

async function streamed(data: Uint8Array, width: number, height: number, bandRows: number[]): Promise<Buffer> {
  const png = createPngStream({ width, height, dpi: 300 });
  let row = 0;
  for (const rows of bandRows) {
    png.writeRows(data.subarray(row * width * 4, (row + rows) * width * 4));
    row += rows;
  }
  return png.finish();
}

describe('PNG written band by band', () => {
  it('computes Adler-32 as zlib does, in one go or continued', () => {
    // Node's zlib (the reference implementation of RFC 1950) ends a zlib stream with the Adler-32
    // of its input, big-endian
    const zlibAdler = (b: Uint8Array) => {
      const z = deflateSync(b, { level: 1 });
      return z.readUInt32BE(z.length - 4);
    };
    const bytes = picture(641, 37); // 94,868 bytes: many 5552-byte blocks and an odd tail
    expect(adler32(bytes)).toBe(zlibAdler(bytes));
    expect(adler32(bytes.subarray(0, 5))).toBe(zlibAdler(bytes.subarray(0, 5)));
    expect(adler32(bytes.subarray(30_001), adler32(bytes.subarray(0, 30_001)))).toBe(zlibAdler(bytes));
    // RFC 1950: Adler-32 starts at 1, so the empty input's is 1
    expect(adler32(new Uint8Array(0))).toBe(1);
    expect(adler32(new Uint8Array(300_000).fill(255))).toBe(zlibAdler(new Uint8Array(300_000).fill(255)));
  });

  it('gives back the same pixels in pngjs and ImageMagick, at 300 DPI, tagged sRGB', async () => {
    const [width, height] = [333, 150];
    const data = picture(width, height);
    const buffer = await streamed(data, width, height, [64, 64, 22]);
    // chunk order per the PNG specification: sRGB and pHYs after IHDR, before the image data
    expect(pngChunkTypes(buffer)).toEqual(['IHDR', 'sRGB', 'pHYs', 'IDAT', 'IEND']);
    // pngjs, an independent decoder that checks every chunk's CRC; zlib checks the Adler-32
    const decoded = PNG.sync.read(buffer);
    expect([decoded.width, decoded.height]).toEqual([width, height]);
    expect(Buffer.compare(decoded.data, Buffer.from(data))).toBe(0);
    // W3C PNG spec, pHYs: 300 dpi = 11811 px/m, unit 1 (metre); whole chunk as in reference/png-phys.csv
    expect(pixelsPerMetre(300)).toBe(11811);
    const at = buffer.indexOf(Buffer.from('pHYs', 'latin1')) - 4;
    expect(buffer.subarray(at, at + 21).toString('hex')).toBe('000000097048597300002e2300002e230178a53f76');
    // ImageMagick, Debian's own build: its reading of size, resolution and every pixel
    const dir = mkdtempSync(path.join(tmpdir(), 'png-stream-'));
    const file = path.join(dir, 'print.png');
    writeFileSync(file, buffer);
    const out = execFileSync('/usr/bin/identify', ['-format', '%w %h %U %[channels]', file], { encoding: 'utf8' });
    expect(out.trim()).toBe(`${width} ${height} PixelsPerCentimeter srgba`);
    const rgba = execFileSync('/usr/bin/convert', [file, '-depth', '8', 'rgba:-'], { maxBuffer: 64 * 1024 * 1024 });
    expect(Buffer.compare(rgba, Buffer.from(data))).toBe(0);
  });

  it('is the same file whatever the bands', async () => {
    const [width, height] = [90, 40];
    const data = picture(width, height);
    const one = PNG.sync.read(await streamed(data, width, height, [40]));
    const many = PNG.sync.read(await streamed(data, width, height, [1, 7, 13, 19]));
    expect(Buffer.compare(one.data, many.data)).toBe(0);
    expect(Buffer.compare(many.data, Buffer.from(data))).toBe(0);
  });

  it('refuses rows that do not fit and a file with rows missing', async () => {
    const png = createPngStream({ width: 10, height: 4, dpi: 300 });
    expect(() => png.writeRows(new Uint8Array(10 * 4 * 5))).toThrow(/do not fit/);
    expect(() => png.writeRows(new Uint8Array(7))).toThrow(/do not fit/);
    png.writeRows(new Uint8Array(10 * 4 * 3));
    await expect(png.finish()).rejects.toThrow(/3 of its 4 rows/);
  });
});
