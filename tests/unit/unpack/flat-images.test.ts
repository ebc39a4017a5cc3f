import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, describe, expect, it } from 'vitest';
import { UnpackError } from '../../../server/features/originals/unpack/unpack-error';
import { unpackOriginal } from '../../../server/features/originals/unpack/unpack-original';
import { readPngRgba } from './support/pixels';

const dir = mkdtempSync(join(tmpdir(), 'unpack-flat-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function rejection(filePath: string): Promise<string> {
  try {
    await unpackOriginal({ filePath, outDir: dir, cut: 'groups' });
    return 'ok';
  } catch (error) {
    expect(error).toBeInstanceOf(UnpackError);
    return (error as UnpackError).code;
  }
}

describe('flat image uploads', () => {
  it('turns a PNG into one motif named after the file, trimmed to its visible pixels', async () => {
    const file = join(dir, 'upload-1');
    // 30 x 20 transparent with an opaque 10 x 5 block at (4, 6)
    await sharp({ create: { width: 30, height: 20, channels: 4, background: { r: 0, g: 0, b: 0, alpha: 0 } } })
      .composite([{ input: { create: { width: 10, height: 5, channels: 4, background: { r: 20, g: 120, b: 200, alpha: 1 } } }, left: 4, top: 6 }])
      .png().toFile(file);
    const out = mkdtempSync(join(dir, 'out-'));
    const result = await unpackOriginal({ filePath: file, outDir: out, cut: 'groups', originalName: 'Sea glass sticker.png' });
    expect(result.document).toMatchObject({ width: 30, height: 20, layerCount: 0, colourMode: 'RGB', depth: 8 });
    expect(result.motifs).toHaveLength(1);
    expect(result.motifs[0]).toMatchObject({ name: 'Sea glass sticker', kind: 'image', left: 4, top: 6, width: 10, height: 5, suggestedTags: ['sea', 'glass', 'sticker'] });
    const png = await readPngRgba(join(out, result.motifs[0].pngFile));
    expect(Array.from(png.data.subarray(0, 4))).toEqual([20, 120, 200, 255]);
    const thumb = await sharp(join(out, result.motifs[0].thumbFile)).metadata();
    expect(thumb.format).toBe('webp');
  });

  it('reads JPEG and WebP uploads the same way', async () => {
    for (const format of ['jpeg', 'webp'] as const) {
      const file = join(dir, `photo.${format}`);
      await sharp({ create: { width: 400, height: 200, channels: 3, background: { r: 200, g: 60, b: 40 } } })[format]().toFile(file);
      const out = mkdtempSync(join(dir, 'out-'));
      const result = await unpackOriginal({ filePath: file, outDir: out, cut: 'groups', originalName: `Beach.${format}` });
      expect(result.motifs[0]).toMatchObject({ name: 'Beach', width: 400, height: 200 });
      // the thumbnail's longest side is 320 px
      expect((await sharp(join(out, result.motifs[0].thumbFile)).metadata()).width).toBe(320);
    }
  });

  it('refuses a damaged PNG and an image over the pixel budget', async () => {
    const broken = join(dir, 'broken.png');
    const png = await sharp({ create: { width: 50, height: 50, channels: 3, background: '#abcdef' } }).png().toBuffer();
    writeFileSync(broken, png.subarray(0, 60));
    expect(await rejection(broken)).toBe('image.corrupt');
    const big = join(dir, 'big.png');
    await sharp({ create: { width: 3000, height: 3000, channels: 3, background: '#ffffff' } }).png().toFile(big);
    await expect(unpackOriginal({ filePath: big, outDir: dir, cut: 'groups', limits: { maxDocumentPixels: 1_000_000 } })).rejects.toMatchObject({ code: 'image.too_large' });
  });
});
