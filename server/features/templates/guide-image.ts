import { readFile, rm } from 'node:fs/promises';
import sharp from 'sharp';
import { sniffFileType } from '../originals/unpack/sniff-file-type';
import { HttpError } from '../../lib/http-error';

// A printer's guide is a reference drawing; 4000 px on the long side is plenty to trace over.
export const GUIDE_MAX_SIDE_PX = 4000;
export const GUIDE_UPLOAD_LIMIT_BYTES = 25 * 1024 * 1024;
// Refuse images that would decode to more than this (a small file can claim huge dimensions).
const GUIDE_MAX_INPUT_PIXELS = 200_000_000;

export const guideImageKey = (studioId: string, templateId: string, stamp: string) => `templates/${studioId}/${templateId}/guide-${stamp}.webp`;

/**
 * Reads an uploaded guide image from disk and re-encodes it as lossless WebP, downscaled to fit
 * GUIDE_MAX_SIDE_PX. Re-encoding means what we store and serve is always a plain image we made.
 */
export async function prepareGuideImage(filePath: string): Promise<{ data: Buffer; width: number; height: number }> {
  try {
    const bytes = await readFile(filePath);
    const sniffed = sniffFileType(bytes.subarray(0, 4096));
    if (!['png', 'jpeg', 'webp'].includes(sniffed.kind)) {
      throw new HttpError(415, 'guide.unsupported_type', `This is ${sniffed.label}; a guide image must be a PNG, JPEG or WebP file.`);
    }
    try {
      const { data, info } = await sharp(bytes, { limitInputPixels: GUIDE_MAX_INPUT_PIXELS })
        .rotate()
        .resize({ width: GUIDE_MAX_SIDE_PX, height: GUIDE_MAX_SIDE_PX, fit: 'inside', withoutEnlargement: true })
        .webp({ lossless: true, effort: 2 })
        .toBuffer({ resolveWithObject: true });
      return { data, width: info.width, height: info.height };
    } catch (error) {
      throw new HttpError(400, 'guide.unreadable', `This image could not be read (${(error as Error).message.split('\n')[0]}); export it again as PNG.`);
    }
  } finally {
    await rm(filePath, { force: true });
  }
}
