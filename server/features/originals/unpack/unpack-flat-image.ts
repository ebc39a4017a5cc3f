import sharp, { type Metadata, type OutputInfo } from 'sharp';
import type { RgbaImage } from '../../../lib/image/rgba-image';
import { buildMotif, motifBaseName, trimBox } from './build-motif';
import { cleanName, sourcePathOf } from './layer-names';
import { formatMegapixels } from './psd-header';
import { suggestTags } from './suggest-tags';
import { UnpackError } from './unpack-error';
import { nameFromFileName, type UnpackContext } from './unpack-psd';
import type { UnpackResult } from './unpack-result';

// A flat PNG, JPEG or WebP upload becomes one motif, with the same outputs as a layer.
export async function unpackFlatImage(file: Buffer, ctx: UnpackContext): Promise<UnpackResult> {
  const started = performance.now();
  const progress = ctx.onProgress ?? (() => {});
  progress({ phase: 'reading', percent: 0 });
  const metadata = await readMetadata(file);
  const width = metadata.width ?? 0;
  const height = metadata.height ?? 0;
  if (width * height > ctx.limits.maxDocumentPixels) {
    throw new UnpackError('image.too_large',
      `The image is ${width} x ${height} pixels, more than the ${formatMegapixels(ctx.limits.maxDocumentPixels)} this server accepts`);
  }
  const decoded = await decode(file, ctx.limits.maxDocumentPixels);
  const parseMs = performance.now() - started;
  progress({ phase: 'cutting', percent: 40 });
  const image: RgbaImage = {
    data: new Uint8Array(decoded.data.buffer, decoded.data.byteOffset, decoded.data.length),
    width: decoded.info.width, height: decoded.info.height, left: 0, top: 0,
  };
  const name = cleanName(ctx.originalName ? nameFromFileName(ctx.originalName) : 'Image', 'Image');
  const report: UnpackResult['report'] = { skipped: [], unsupported: [], notes: [] };
  if ((metadata.pages ?? 1) > 1) report.notes.push(`The image has ${metadata.pages} frames; only the first is imported`);
  const depth = metadata.depth === 'ushort' ? 16 : 8;
  if (depth === 16) report.notes.push('The 16-bit image was converted to 8 bits per channel');
  if (metadata.space === 'cmyk') report.notes.push('The CMYK image was converted to sRGB');
  const crop = trimBox(image);
  const cutMs = performance.now() - started - parseMs;
  progress({ phase: 'encoding', percent: 50 });
  const ppi = metadata.density && metadata.density > 0 ? metadata.density : undefined;
  const motifs = [];
  if (crop) {
    motifs.push(await buildMotif(image, crop, {
      name, sourcePath: sourcePathOf([name]), kind: 'image', hidden: false, opacity: 1, blendMode: 'normal', suggestedTags: suggestTags([name]),
    }, motifBaseName(0), { outDir: ctx.outDir, pngCompressionLevel: ctx.limits.pngCompressionLevel, ...(ppi ? { ppi } : {}) }));
  } else {
    report.skipped.push({ sourcePath: sourcePathOf([name]), reason: 'fully transparent image' });
  }
  progress({ phase: 'finishing', percent: 99 });
  return {
    document: { width, height, colourMode: colourModeName(metadata.space), depth, layerCount: 0, ...(ppi ? { ppi } : {}) },
    motifs,
    report,
    timings: { parseMs: Math.round(parseMs), cutMs: Math.round(cutMs), encodeMs: Math.round(performance.now() - started - parseMs - cutMs) },
  };
}

// in the words the PSD header uses, so both kinds of original read the same
function colourModeName(space: string | undefined): string {
  if (space === 'b-w' || space === 'grey16') return 'Grayscale';
  if (space === 'cmyk') return 'CMYK';
  return 'RGB';
}

async function readMetadata(file: Buffer): Promise<Metadata> {
  try {
    return await sharp(file).metadata();
  } catch {
    throw new UnpackError('image.corrupt', 'The image could not be read; it is damaged or truncated');
  }
}

async function decode(file: Buffer, maxPixels: number): Promise<{ data: Buffer; info: OutputInfo }> {
  try {
    // rotate() applies the EXIF orientation, so the motif looks the way the photo was taken
    return await sharp(file, { limitInputPixels: maxPixels, failOn: 'error' })
      .rotate()
      .toColourspace('srgb')
      .ensureAlpha()
      .raw({ depth: 'uchar' })
      .toBuffer({ resolveWithObject: true });
  } catch {
    throw new UnpackError('image.corrupt', 'The image could not be decoded; it is damaged or truncated');
  }
}
