import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { UnpackError } from '../../../server/features/originals/unpack/unpack-error';
import { unpackOriginal } from '../../../server/features/originals/unpack/unpack-original';
import { layer, solid } from './support/ag-psd-files';
import { rawChannel, writeRawPsd, zipChannel, type RawLayer } from './support/raw-psd';
import { writePsdBuffer } from 'ag-psd';

// Hostile inputs from the team's PSD notes: without our checks, ag-psd accepts a 900-byte file
// declaring one empty 20,000 x 20,000 layer (1.6 GiB resident) and inflates zip channels
// without bound.
const dir = mkdtempSync(join(tmpdir(), 'unpack-hostile-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

let count = 0;
function save(bytes: Buffer): string {
  const file = join(dir, `hostile-${count++}.psd`);
  writeFileSync(file, bytes);
  return file;
}

async function outcome(file: string, limits = {}): Promise<{ code: string; ms: number; rssGrowth: number }> {
  const rss = process.memoryUsage().rss;
  const started = performance.now();
  try {
    await unpackOriginal({ filePath: file, outDir: mkdtempSync(join(dir, 'out-')), cut: 'layers', limits });
    return { code: 'ok', ms: performance.now() - started, rssGrowth: process.memoryUsage().rss - rss };
  } catch (error) {
    expect(error).toBeInstanceOf(UnpackError);
    return { code: (error as UnpackError).code, ms: performance.now() - started, rssGrowth: process.memoryUsage().rss - rss };
  }
}

const rgb = (pixels: number, value = 0) => [0, 1, 2].map((id) => rawChannel(id, new Uint8Array(pixels).fill(value)));
const MiB = 1024 * 1024;

describe('hostile PSD files', () => {
  it('rejects a tiny file declaring a 20,000 x 20,000 empty layer before decoding anything', async () => {
    const huge: RawLayer = { top: 0, left: 0, bottom: 20_000, right: 20_000, name: 'Huge', channels: [0, 1, 2].map((id) => ({ id, compression: 1, data: Buffer.alloc(0) })) };
    const bytes = writeRawPsd({ width: 100, height: 100, layers: [huge] });
    expect(bytes.length).toBeLessThan(1024);
    const result = await outcome(save(bytes));
    expect(result.code).toBe('psd.layer_too_large');
    expect(result.ms).toBeLessThan(1000);
    expect(result.rssGrowth).toBeLessThan(100 * MiB);
  });

  it('rejects layers that add up to more than the budget', async () => {
    const layers: RawLayer[] = Array.from({ length: 4 }, (_, i) => ({ top: 0, left: 0, bottom: 100, right: 100, name: `L${i}`, channels: rgb(10_000) }));
    const file = save(writeRawPsd({ width: 100, height: 100, layers }));
    expect((await outcome(file, { maxTotalLayerPixels: 30_000 })).code).toBe('psd.layers_too_large');
    expect((await outcome(file, { maxTotalLayerPixels: 40_000 })).code).toBe('ok');
  });

  it('stops inflating a zip channel at the layer\'s size (zip bomb)', async () => {
    // 32 MiB of zeros deflate to about 32 KB; the layer declares 100 x 100 pixels
    const bomb = zipChannel(0, new Uint8Array(32 * MiB));
    expect(bomb.data.length).toBeLessThan(100_000);
    const bytes = writeRawPsd({ width: 100, height: 100, layers: [{ top: 0, left: 0, bottom: 100, right: 100, name: 'Bomb', channels: [bomb, ...rgb(10_000).slice(1)] }] });
    const result = await outcome(save(bytes));
    expect(result.code).toBe('psd.corrupt');
    expect(result.rssGrowth).toBeLessThan(24 * MiB);
    expect(result.ms).toBeLessThan(2000);
  });

  it('rejects channel data declared longer than the file, without reading past its end', async () => {
    const bytes = writeRawPsd({ width: 10, height: 10, layers: [{ top: 0, left: 0, bottom: 10, right: 10, name: 'Short', channels: rgb(100) }] });
    // spec layout: header 26, colour mode data 4, image resources 4, layer and mask length 4,
    // layer info length 4, layer count 2, rect 16, channel count 2, then (id 2, length 4) each
    const thirdChannelLength = 26 + 4 + 4 + 4 + 4 + 2 + 16 + 2 + 2 * 6 + 2;
    expect(bytes.readUInt32BE(thirdChannelLength)).toBe(102);
    bytes.writeUInt32BE(50_000_000, thirdChannelLength);
    const result = await outcome(save(bytes));
    expect(result.code).toBe('psd.truncated');
    expect(result.rssGrowth).toBeLessThan(40 * MiB);
  });

  it('rejects a file cut in half, and one that is all random bytes after the header', async () => {
    const psd = writePsdBuffer({ width: 64, height: 64, children: [layer('A', 0, 0, solid(64, 64, [1, 2, 3, 255])), layer('B', 5, 5, solid(20, 20, [9, 9, 9, 128]))] });
    expect(['psd.truncated', 'psd.corrupt']).toContain((await outcome(save(psd.subarray(0, psd.length >> 1)))).code);
    const noise = Buffer.concat([psd.subarray(0, 26), Buffer.from(Array.from({ length: 4000 }, (_, i) => (i * 7919) & 255))]);
    expect(['psd.truncated', 'psd.corrupt']).toContain((await outcome(save(noise))).code);
  });

  it('rejects a document over the pixel budget from its header', async () => {
    const bytes = writeRawPsd({ width: 30_000, height: 30_000, layers: [] });
    const result = await outcome(save(bytes));
    expect(result.code).toBe('psd.document_too_large');
    expect(result.rssGrowth).toBeLessThan(100 * MiB);
  });

  it('refuses a file over the size limit without reading it', async () => {
    const bytes = writeRawPsd({ width: 10, height: 10, layers: [{ top: 0, left: 0, bottom: 10, right: 10, channels: rgb(100) }] });
    expect((await outcome(save(bytes), { maxFileBytes: 100 })).code).toBe('upload.too_large');
  });
});
